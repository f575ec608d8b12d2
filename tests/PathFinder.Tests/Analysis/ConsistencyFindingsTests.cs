using PathFinder.Analysis;
using PathFinder.Data;
using PathFinder.Quantities;
using PathFinder.Synthetic;
using PathFinder.Tests.TestSupport;

namespace PathFinder.Tests.Analysis;

/// <summary>What a curator finds through the ties between ΔH, S° and ΔG, through sources, and through the slip behind each suspect.</summary>
public sealed class ConsistencyFindingsTests : IDisposable
{
    // Nitrogen oxides and water, NIST-JANAF Thermochemical Tables (1998) and CODATA Key Values (1989), from memory;
    // T15 plants a Gibbs-energy slip: ΔfG°(NO, g) written 88.60 where the tables give 86.60 (12σ at u = 0.17); L01 and
    // L02 are second determinations of ΔfH°(NO) and S°(NO) (invented, consistent with the tables): with one datum of
    // each kind, the data could not tell which of the three is wrong, only that they disagree.
    private const string NitrogenOxides =
        "id,equation,property,value,uncertainty,unit,temperature,source\n" +
        "T01,NO(g),dH,90.29,0.17,kJ/mol,,tables\n" +
        "L01,NO(g),dH,90.20,0.25,kJ/mol,,lab L\n" +
        "L02,NO(g),S,210.70,0.05,J/(mol·K),,lab L\n" +
        "T02,NO2(g),dH,33.10,0.80,kJ/mol,,tables\n" +
        "T04,NH3(g),dH,-45.94,0.35,kJ/mol,,tables\n" +
        "T05,H2O(g),dH,-241.826,0.040,kJ/mol,,tables\n" +
        "T07,N2(g),S,191.609,0.004,J/(mol·K),,tables\n" +
        "T08,O2(g),S,205.152,0.005,J/(mol·K),,tables\n" +
        "T09,H2(g),S,130.680,0.003,J/(mol·K),,tables\n" +
        "T10,NO(g),S,210.758,0.02,J/(mol·K),,tables\n" +
        "T11,NO2(g),S,240.04,0.10,J/(mol·K),,tables\n" +
        "T12,NH3(g),S,192.77,0.05,J/(mol·K),,tables\n" +
        "T15,NO(g),dG,88.60,0.17,kJ/mol,,tables\n" +
        "T16,NO2(g),dG,51.26,0.80,kJ/mol,,tables\n" +
        "T17,NH3(g),dG,-16.41,0.35,kJ/mol,,tables\n";

    // Combustion enthalpies to H2O(g) from key values (CODATA 1989: CO2 −393.51, H2O(g) −241.826, H2O(l) −285.830,
    // vaporization 44.004; NIST-JANAF 1998: CH4 −74.87, C2H6 −83.85, C2H4 52.40; all from memory); lab B's three
    // flame-calorimetry values all read 1.2 kJ/mol high (a planted calibration offset). Every B reaction makes H2O(g).
    private const string SharedWater =
        "id,equation,property,value,uncertainty,unit,temperature,source\n" +
        "K1,CO2(g),dH,-393.51,0.13,kJ/mol,,key values\n" +
        "K2,H2O(g),dH,-241.826,0.040,kJ/mol,,key values\n" +
        "K3,H2O(l),dH,-285.830,0.040,kJ/mol,,key values\n" +
        "K4,H2O(l) -> H2O(g),dH,44.004,0.020,kJ/mol,,key values\n" +
        "A1,CH4(g),dH,-74.87,0.30,kJ/mol,,lab A\n" +
        "A2,C2H6(g),dH,-83.85,0.30,kJ/mol,,lab A\n" +
        "A3,C2H4(g),dH,52.40,0.40,kJ/mol,,lab A\n" +
        "C1,C2H4(g) + H2(g) -> C2H6(g),dH,-136.25,0.30,kJ/mol,,lab C\n" +
        "B1,CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(g),dH,-801.09,0.20,kJ/mol,,lab B\n" +
        "B2,C2H6(g) + 7/2 O2(g) -> 2 CO2(g) + 3 H2O(g),dH,-1427.45,0.20,kJ/mol,,lab B\n" +
        "B3,C2H4(g) + 3 O2(g) -> 2 CO2(g) + 2 H2O(g),dH,-1321.87,0.20,kJ/mol,,lab B\n";

    /// <summary>Suspects and causes do not depend on the cycle list, so the generated cases search only short cycles.</summary>
    private static readonly ConsistencyOptions Quick = new() { MaxCycleSize = 3, MaxCycles = 10 };

    private readonly TempFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    [Fact]
    public void GibbsSlip_ThatOnlyTheTieToEnthalpyAndEntropyReveals_IsTheSuspect_AndSolveGivesTheTiedValue()
    {
        // Given the nitrogen-oxide data with ΔfG°(NO) 2 kJ/mol off (NIST-JANAF 1998, from memory)
        ReactionNetwork network = Read(NitrogenOxides);

        // When checked jointly
        ModelConsistency analysis = ConsistencyCheck.Run(network).Analysis!;

        // Then T15 is the one suspect, with a prediction at the table's 86.60 kJ/mol from ΔfH° and S°
        SuspectReport suspect = Assert.Single(analysis.Suspects);
        Assert.Equal("T15", suspect.Measurement.Id);
        Assert.InRange(suspect.NormalizedResidual, 8.0, 14.0);
        Assert.Equal(86.60, suspect.Predicted!.Value, 0.05);

        // and a failing cycle ties it to ΔfH°(NO) and the entropies (G = H − TS), z far beyond 2
        Assert.Contains(analysis.FlaggedCycles, cycle => cycle.IsMixed && cycle.Members.Any(member => member.Measurement.Id == "T15") && cycle.Members.Any(member => member.Measurement.Id == "T01"));

        // and solve's ΔfG°(NO) is the tied value, not the slip: one value, whichever table is printed
        SolveReport gibbs = new NetworkSolutions(network).Report(PropertyFamily.GibbsEnergy)!;
        Assert.Equal(86.60, gibbs.Species.Single(item => item.Species.Name == "NO(g)").Value, 0.05);
    }

    [Fact]
    public void SourceReadingHighOnEveryRow_IsNamedAsTheSource_NotTheKeyValueItsReactionsShare()
    {
        // Given the shared-water data where lab B reads 1.2 kJ/mol high on every row
        ReactionNetwork network = Read(SharedWater);

        // When checked
        ModelConsistency analysis = ConsistencyCheck.Run(network).Analysis!;

        // Then lab B comes first with an inferred offset of about +1.2 kJ/mol, and no measurement is a suspect:
        // in particular not ΔfH°(H2O, g), the key value every B reaction shares
        SourceCheck source = analysis.Sources[0];
        Assert.Equal("lab B", source.Source);
        SourceOffset offset = Assert.Single(source.Offsets);
        Assert.True(offset.IsInferred);
        Assert.Equal(1.2, offset.Value, 0.05);
        Assert.Equal(["B1", "B2", "B3"], offset.Rows);
        Assert.True(offset.ChiSquaredDrop >= offset.DisplacedChiSquared);
        Assert.Empty(analysis.Suspects);
        Assert.False(analysis.Consistent);
    }

    [Fact]
    public void SourceOffset_IsNotInferred_WhenAnUnrelatedGrossErrorIsTheBiggerProblem()
    {
        // Given the shared-water data with lab B corrected, and one unrelated gross error in lab A (ΔfH°(C2H4) off by 20σ)
        string data = SharedWater
            .Replace("-801.09", "-802.29", StringComparison.Ordinal)
            .Replace("-1427.45", "-1428.65", StringComparison.Ordinal)
            .Replace("-1321.87", "-1323.07", StringComparison.Ordinal)
            .Replace("C2H4(g),dH,52.40", "C2H4(g),dH,60.40", StringComparison.Ordinal);
        ReactionNetwork network = Read(data);

        // When checked
        ModelConsistency analysis = ConsistencyCheck.Run(network).Analysis!;

        // Then no source offset is inferred and the gross error is the suspect
        Assert.Empty(analysis.OffsetSources);
        Assert.Equal("A3", analysis.Suspects[0].Measurement.Id);
    }

    [Theory]
    [InlineData(SlipKind.Sign)]
    [InlineData(SlipKind.Calorie)]
    [InlineData(SlipKind.Factor)]
    [InlineData(SlipKind.PerParticle)]
    public void PlantedSlips_OnGeneratedNetworks_AreNamedRightAtLeastNineTimesInTen(SlipKind kind)
    {
        // Given generated ΔH networks (seeded), each with one well-checked measurement changed by a slip of this kind
        int named = 0;
        int planted = 0;
        foreach ((SyntheticNetwork synthetic, Measurement target, int trial) in Plantings(seed: 100 + (int)kind, count: 20))
        {
            // A unit or equation slip scales the stated uncertainty with the value (both were typed the same way).
            double v = target.Value;
            double factor = kind switch
            {
                SlipKind.Sign => -1.0,
                SlipKind.Calorie => trial % 2 == 0 ? 1.0 / PhysicalConstants.ThermochemicalCalorie : PhysicalConstants.ThermochemicalCalorie,
                SlipKind.Factor => new[] { 2.0, 3.0, 0.5, 1.0 / 3.0 }[trial % 4],
                _ => trial % 2 == 0 ? 1.0 / EnergyUnit.ElectronVolt.ToCanonical : EnergyUnit.ElectronVolt.ToCanonical,
            };
            double slipped = v * factor;
            ReactionNetwork network = Replace(synthetic.Network, target with { Value = slipped, Uncertainty = target.Uncertainty * Math.Abs(factor) });
            planted++;

            // When checked
            ModelConsistency analysis = ConsistencyCheck.Run(network, options: Quick).Analysis!;

            // Then the suspect it became names this kind of slip
            SuspectReport? suspect = analysis.Suspects.FirstOrDefault(item => item.Measurement.Id == target.Id);
            if (suspect?.LikelyCause?.Kind == kind)
            {
                named++;
            }

        }

        Assert.True(named >= 0.9 * planted, $"{named} of {planted} {kind} slips named");
    }

    [Fact]
    public void PlainOutliers_OnGeneratedNetworks_AreRarelyGivenASlip()
    {
        // Given generated networks each with one well-checked measurement moved by 5–50 combined standard uncertainties
        var random = new Random(7);
        int named = 0;
        int planted = 0;
        foreach ((SyntheticNetwork synthetic, Measurement target, int _) in Plantings(seed: 300, count: 40))
        {
            double shift = (random.Next(2) == 0 ? -1 : 1) * (5 + (45 * random.NextDouble())) * target.Uncertainty * Math.Sqrt(2);
            ReactionNetwork network = Replace(synthetic.Network, target with { Value = target.Value + shift });
            planted++;

            // When checked
            ModelConsistency analysis = ConsistencyCheck.Run(network, options: Quick).Analysis!;

            // Then a slip is named for at most 5 % of them (a gap may coincide with a slip's by chance)
            if (analysis.Suspects.FirstOrDefault(item => item.Measurement.Id == target.Id)?.LikelyCause is not null)
            {
                named++;
            }
        }

        Assert.True(named <= 0.05 * planted, $"{named} of {planted} plain outliers given a slip");
    }

    [Fact]
    public void WrongPhaseOfWater_IsNamedAsAPhaseSlip()
    {
        // Given methane combustion measured to liquid water (−890.36 kJ/mol from CODATA 1989 / NIST-JANAF 1998 ΔfH°, from
        // memory) but written with H2O(g), beside key values that fix both phases of water and a second ΔfH°(CH4)
        string data = (SharedWater + "D1,CH4(g),dH,-74.6,0.4,kJ/mol,,lab D\n").Replace("B2,", "X2,", StringComparison.Ordinal).Replace("B3,", "X3,", StringComparison.Ordinal)
            .Replace("-1427.45", "-1428.65", StringComparison.Ordinal).Replace("-1321.87", "-1323.07", StringComparison.Ordinal)
            .Replace("B1,CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(g),dH,-801.09", "B1,CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(g),dH,-890.30", StringComparison.Ordinal);
        ReactionNetwork network = Read(data);

        // When checked
        SuspectReport suspect = ConsistencyCheck.Run(network).Analysis!.Suspects.Single(item => item.Measurement.Id == "B1");

        // Then the slip named is the phase of water, undone by 2 × 44.0 kJ/mol
        Assert.Equal(SlipKind.Phase, suspect.LikelyCause?.Kind);
        Assert.Equal(-802.3, suspect.LikelyCause!.ExplainedValue, 0.1);
        Assert.Contains("H2O(g)", suspect.LikelyCause.Detail, StringComparison.Ordinal);
    }

    /// <summary>Generated networks, each with a measurement the rest check well (its leave-one-out uncertainty is under its own, and |value| ≥ 50 kJ/mol).</summary>
    private static IEnumerable<(SyntheticNetwork Network, Measurement Target, int Trial)> Plantings(int seed, int count)
    {
        for (int trial = 0; trial < count; trial++)
        {
            SyntheticNetwork synthetic = SyntheticNetworkGenerator.Generate(new SyntheticNetworkOptions { Seed = seed + trial, SpeciesCount = 30, MeasurementCount = 240, Locality = 6 });
            ThermoModel model = ThermoModel.Build(synthetic.Network);
            PathFinder.Solving.LeastSquaresSolution clean = NetworkSolver.Solve(model, adjust: false).Solution;
            int target = Enumerable.Range(0, model.Measurements.Count)
                .Where(i => clean.Observations[i].LeaveOneOutUncertainty is { } spread && spread < model.Measurements[i].Uncertainty
                    && Math.Abs(clean.Observations[i].NormalizedResidual ?? 9.0) < 2.0 && Math.Abs(model.Measurements[i].Value) >= 50)
                .DefaultIfEmpty(-1)
                .First();
            if (target >= 0)
            {
                yield return (synthetic, model.Measurements[target].Measurement, trial);
            }
        }
    }

    /// <summary>The network with one measurement replaced (same id), in the same order.</summary>
    private static ReactionNetwork Replace(ReactionNetwork network, Measurement replacement) =>
        new(network.Name, network.Measurements.Select(measurement => measurement.Id == replacement.Id ? replacement : measurement));

    private ReactionNetwork Read(string csv)
    {
        string file = _folder.Write($"n{Guid.NewGuid():N}.csv", csv);
        NetworkReadResult read = NetworkReader.Read(file);
        Assert.Empty(read.Errors);
        return read.Network;
    }
}
