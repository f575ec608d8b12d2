using System.Globalization;
using Fractions;
using MathNet.Numerics.LinearAlgebra;
using PathFinder.Analysis;
using PathFinder.Chemistry;
using PathFinder.Data;
using PathFinder.Quantities;
using PathFinder.Solving;
using PathFinder.Synthetic;
using PathFinder.Tests.TestSupport;

namespace PathFinder.Tests.Analysis;

public sealed class ConsistencyCheckTests : IDisposable
{
    private readonly TempFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    [Fact]
    public void Run_ConsistentHandbookNetwork_HasNoSuspectsAndNoFailingCycle()
    {
        // Given 11 measurements built from CODATA Key Values (Cox, Wagman, Medvedev 1989; from memory) with their uncertainties
        ReactionNetwork network = HandbookData.Read(_folder, HandbookData.ConsistentEnthalpyCsv());

        // When checked
        ConsistencyReport report = ConsistencyCheck.Run(network);

        // Then it is consistent: no suspect, no flagged cycle, every checkable measurement well inside 2σ
        Assert.True(report.Consistent);
        ModelConsistency enthalpy = Assert.IsType<ModelConsistency>(report.Analysis);
        Assert.Empty(enthalpy.Suspects);
        Assert.Empty(enthalpy.FlaggedCycles);
        Assert.NotEmpty(enthalpy.Cycles);
        Assert.All(enthalpy.Measurements.Where(check => check.IsCheckable), check => Assert.InRange(check.NormalizedResidual!.Value, -0.5, 0.5));
        Assert.All(enthalpy.Measurements, check => Assert.NotEqual("suspect", check.Status));

        // and the formation-only measurements of HCl and NH3 are unchecked (nothing else bears on them)
        Assert.Equal("unchecked", enthalpy.Measurements.Single(check => check.Measurement.Id == "F5").Status);
    }

    [Fact]
    public void Solve_ConsistentHandbookNetwork_ReturnsTheTabulatedFormationEnthalpies()
    {
        // Given the consistent handbook network (CODATA Key Values 1989, from memory)
        ReactionNetwork network = HandbookData.Read(_folder, HandbookData.ConsistentEnthalpyCsv());

        // When solved
        SolveReport report = NetworkSolver.Report(NetworkSolver.Solve(ThermoModel.Build(network)), PropertyFamily.Enthalpy)!;

        // Then every species comes back at its tabulated ΔfH° within the tabulated uncertainty, and no tighter than the data allow
        (string Name, Tabulated Value)[] expected =
        [
            ("CO2(g)", HandbookData.CarbonDioxide),
            ("H2O(l)", HandbookData.LiquidWater),
            ("H2O(g)", HandbookData.WaterVapour),
            ("CO(g)", HandbookData.CarbonMonoxide),
            ("HCl(g)", HandbookData.HydrogenChloride),
            ("NH3(g)", HandbookData.Ammonia),
        ];
        Assert.Equal(expected.Length, report.Species.Count);
        Assert.Empty(report.Undetermined);
        Assert.Empty(report.Suspects);
        foreach ((string name, Tabulated value) in expected)
        {
            SpeciesEstimate estimate = report.Species.Single(item => item.Species.Name == name);
            Assert.InRange(estimate.Value, value.Value - value.Uncertainty, value.Value + value.Uncertainty);
            Assert.InRange(estimate.Uncertainty, 0.0, value.Uncertainty + 1e-12);
        }
    }

    [Theory]
    [InlineData("F4", 12.0)]
    [InlineData("R3", -12.0)]
    [InlineData("R4", 15.0)]
    public void Run_OneValueShiftedByManySigma_IsTheFirstSuspect_WithAPredictionNearTheTrueValue(string shiftedId, double sigmas)
    {
        // Given the handbook network (CODATA 1989, from memory) with one measurement moved by many standard uncertainties
        ReactionNetwork network = HandbookData.Read(_folder, HandbookData.ConsistentEnthalpyCsv(shiftedId, sigmas));
        ReactionNetwork clean = HandbookData.Read(_folder, HandbookData.ConsistentEnthalpyCsv(), "clean.csv");
        double trueValue = clean[shiftedId].Value;

        // When checked
        ConsistencyReport report = ConsistencyCheck.Run(network);

        // Then the network is inconsistent and the shifted measurement is the first suspect
        Assert.False(report.Consistent);
        ModelConsistency enthalpy = Assert.IsType<ModelConsistency>(report.Analysis);
        SuspectReport first = enthalpy.Suspects[0];
        Assert.Equal(shiftedId, first.Measurement.Id);
        Assert.Equal(Math.Sign(sigmas), Math.Sign(first.NormalizedResidual));
        Assert.Equal(network[shiftedId].Value, first.Measured, 1e-12);

        // and what the rest of the network predicts is the true (tabulated) value within its uncertainty
        Assert.NotNull(first.Predicted);
        Assert.NotNull(first.PredictedUncertainty);
        Assert.InRange(first.Predicted.Value, trueValue - (2 * first.PredictedUncertainty.Value) - 0.002, trueValue + (2 * first.PredictedUncertainty.Value) + 0.002);

        // and at least one cycle through it fails to close, none without it fails
        Assert.Contains(enthalpy.FlaggedCycles, cycle => cycle.Members.Any(member => member.Measurement.Id == shiftedId));
        Assert.All(enthalpy.FlaggedCycles, cycle => Assert.Contains(cycle.Members, member => member.Measurement.Id == shiftedId));
    }

    [Fact]
    public void Analyse_IndependentCycles_EqualMeasurementsMinusRank_OnTheDemo()
    {
        // Given the combustion-lab demo
        NetworkReadResult read = NetworkReader.Read(RepoPaths.Demo("combustion-lab"));

        ThermoModel model = ThermoModel.Build(read.Network, read.HeatCapacities, read.SourceSystematics);

        // When its joint model (every ΔH, S°, ΔS, ΔG and K datum together) is analysed
        ModelConsistency consistency = ConsistencyCheck.Analyse(model);

        // Then the independent cycle count is m − rank, the rank taken from a dense SVD (MathNet) as reference
        Assert.Equal(model.Measurements.Count - DenseRank(model), consistency.IndependentCycles);
        Assert.Equal(consistency.AsGiven.Rank, DenseMatrix(consistency.Model.ToObservationSystem()).Rank());
    }

    [Theory]
    [InlineData(3, 20, 60)]
    [InlineData(8, 40, 90)]
    public void Analyse_IndependentCycles_EqualMeasurementsMinusRank_OnSyntheticNetworks(int seed, int species, int measurements)
    {
        // Given a generated network
        SyntheticNetwork synthetic = SyntheticNetworkGenerator.Generate(new SyntheticNetworkOptions { Seed = seed, SpeciesCount = species, MeasurementCount = measurements, Locality = 5 });
        ThermoModel model = ThermoModel.Build(synthetic.Network);

        // When analysed
        ModelConsistency consistency = ConsistencyCheck.Analyse(model);

        // Then cycles = m − rank, with the rank of the dense matrix (MathNet SVD) as reference
        Assert.Equal(model.Measurements.Count - DenseRank(model), consistency.IndependentCycles);
    }

    [Fact]
    public void Solve_SpeciesValues_EqualADenseNormalEquationsReference()
    {
        // Given a small network built through ThermoModel (the handbook data with R2 moved by 1.5σ so residuals are not zero)
        ReactionNetwork network = HandbookData.Read(_folder, HandbookData.ConsistentEnthalpyCsv("R2", 1.5));
        ThermoModel model = ThermoModel.Build(network);

        // When solved as given
        SolveReport report = NetworkSolver.Report(NetworkSolver.Solve(model, adjust: false), PropertyFamily.Enthalpy)!;

        // Then values and uncertainties equal x = (AᵀWA)⁻¹AᵀWb and √diag((AᵀWA)⁻¹) from MathNet dense algebra,
        // A being the joint model's observation rows
        Matrix<double> a = DenseMatrix(model.ToObservationSystem());
        Vector<double> b = Vector<double>.Build.Dense(model.Measurements.Select(item => item.Value).ToArray());
        Vector<double> w = Vector<double>.Build.Dense(model.Measurements.Select(item => 1.0 / (item.Uncertainty * item.Uncertainty)).ToArray());
        Matrix<double> weighted = Matrix<double>.Build.DenseOfDiagonalVector(w);
        Matrix<double> normal = a.Transpose() * weighted * a;
        Matrix<double> covariance = normal.Inverse();
        Vector<double> x = covariance * (a.Transpose() * weighted * b);
        for (int i = 0; i < model.Unknowns.Count; i++)
        {
            Assert.Equal(x[i], report.Species[i].Value, 1e-8);
            Assert.Equal(Math.Sqrt(covariance[i, i]), report.Species[i].Uncertainty, 1e-10);
        }

        // and χ² = Σ wᵢ·rᵢ² of the same reference
        Vector<double> residual = b - (a * x);
        Assert.Equal(residual.PointwiseMultiply(residual).DotProduct(w), report.Solution.ChiSquared, 1e-7);
    }

    [Fact]
    public void Run_GibbsTripleOfWaterFormation_IsAMixedCycle_ThatClosesWhenConsistent_AndIsFlaggedWhenNot()
    {
        // Given ΔfH°(H2O, l) and S° of H2O(l), H2(g), O2(g) (CODATA Key Values 1989, from memory):
        // ΔfS° = 69.95 − 130.680 − ½·205.152 = −163.306 J/(mol·K), ΔfG° = ΔfH° − T·ΔfS° = −237.140 kJ/mol,
        // which matches the familiar tabulated ΔfG°(H2O, l) ≈ −237.13 kJ/mol (NBS tables 1982, from memory)
        double entropy = HandbookData.LiquidWaterEntropy.Value - HandbookData.HydrogenEntropy.Value - (0.5 * HandbookData.OxygenEntropy.Value);
        Assert.Equal(-163.306, entropy, 1e-9);
        double gibbs = -237.14;
        ReactionNetwork good = Triple(gibbs, "2 H2(g) + O2(g) -> 2 H2O(l)", 2.0, "good.csv");
        ReactionNetwork bad = Triple(gibbs + 5.0, "H2(g) + 1/2 O2(g) -> H2O(l)", 1.0, "bad.csv");

        // When checked
        ConsistencyReport goodReport = ConsistencyCheck.Run(good);
        ConsistencyReport badReport = ConsistencyCheck.Run(bad);

        // Then in each the ΔH, ΔS and ΔG rows of the reaction form one mixed cycle of the joint model, ΔG − ΔH + T·ΔS = 0
        // at T = 298.15 K (the ΔS factor is −T/1000 of the ΔH factor, kJ against J); the consistent triple closes
        // (ΔG given for twice the reaction gets half the factor), the shifted one is flagged
        CycleCheck agrees = Assert.Single(Assert.IsType<ModelConsistency>(goodReport.Analysis).Cycles);
        Assert.True(agrees.IsMixed);
        Assert.Equal("kJ/mol", agrees.Unit);
        Assert.False(agrees.Flagged);
        Assert.Equal(-0.5, (Factor(agrees, "G") / Factor(agrees, "H")).ToDouble(), 1e-12);
        Assert.Equal(-298.15 / 1000.0, (Factor(agrees, "S") / Factor(agrees, "H")).ToDouble(), 1e-12);
        Assert.InRange(agrees.Residual / Factor(agrees, "H").ToDouble(), -0.01, 0.01);
        CycleCheck fails = Assert.Single(Assert.IsType<ModelConsistency>(badReport.Analysis).Cycles);
        Assert.True(fails.IsMixed);
        Assert.True(fails.Flagged);
        Assert.Equal(-298.15 / 1000.0, (Factor(fails, "S") / Factor(fails, "H")).ToDouble(), 1e-12);

        // and the closure per reaction as the ΔG row writes it, ΔG − (ΔH − T·ΔS), is the 5 kJ/mol shift
        Assert.Equal(5.0, fails.Residual / Factor(fails, "G").ToDouble(), 0.01);
        Assert.Equal(fails.Residual / fails.Uncertainty, fails.Z, 1e-9);
        Assert.False(badReport.Consistent);
        Assert.True(goodReport.Consistent);
    }

    private static Fraction Factor(CycleCheck cycle, string id) => cycle.Members.Single(member => member.Measurement.Id == id).Factor;

    private ReactionNetwork Triple(double gibbs, string gibbsEquation, double gibbsScale, string name)
    {
        string csv = HandbookData.Header + "\n"
            + $"H,H2(g) + 1/2 O2(g) -> H2O(l),dH,{HandbookData.LiquidWater.Value.ToString("R", CultureInfo.InvariantCulture)},0.04,kJ/mol,,table\n"
            + "S,H2(g) + 1/2 O2(g) -> H2O(l),dS,-163.306,0.031,J/(mol·K),,table\n"
            + $"G,{gibbsEquation},dG,{(gibbs * gibbsScale).ToString("R", CultureInfo.InvariantCulture)},{(0.05 * gibbsScale).ToString("R", CultureInfo.InvariantCulture)},kJ/mol,,table\n";
        return HandbookData.Read(_folder, csv, name);
    }

    [Fact]
    public void Run_SourceWithEveryValueShifted_GetsAnInferredOffset_InsteadOfSuspects()
    {
        // Given ten species each measured once by five sources, with source "E" reading 2σ high every time
        // (a synthetic case: invented values; noise-free so the expected z follows in closed form)
        string[] formulas = ["CH4(g)", "C2H6(g)", "C3H8(g)", "C2H4(g)", "C3H6(g)", "C2H2(g)", "CH3OH(g)", "HCHO(g)", "C4H10(g)", "NH3(g)"];
        const double u = 0.5;
        var rows = new List<string>();
        for (int s = 0; s < formulas.Length; s++)
        {
            double truth = -20.0 - (10.0 * s);
            foreach (string source in new[] { "A", "B", "C", "D", "E" })
            {
                double value = source == "E" ? truth + (2 * u) : truth;
                rows.Add(string.Create(CultureInfo.InvariantCulture, $"{source}{s},{formulas[s]},dH,{value:R},{u:R},kJ/mol,,{source}"));
            }
        }

        ReactionNetwork network = HandbookData.ReadRows(_folder, rows.ToArray());

        // When checked
        ConsistencyReport report = ConsistencyCheck.Run(network);
        ModelConsistency analysis = Assert.IsType<ModelConsistency>(report.Analysis);

        // Then no single measurement is a suspect, but E is flagged first, with a common offset inferred for it (before
        // any suspect): each E value is 2u from the mean of the other four, so the offset is +2u = +1 kJ/mol with
        // variance u²/8, i.e. z = √10 · 2/√(1 + 1/4) = √32, and fitting it lowers χ² by z² = 32
        Assert.Empty(analysis.Suspects);
        Assert.False(report.Consistent);
        SourceCheck shifted = analysis.Sources[0];
        Assert.Equal("E", shifted.Source);
        Assert.True(shifted.SystematicOffset);
        Assert.True(shifted.HasInferredOffset);
        Assert.Equal(["E"], analysis.OffsetSources.Select(source => source.Source));
        Assert.Equal(10, shifted.Checkable);
        SourceOffset offset = Assert.Single(shifted.Offsets);
        Assert.True(offset.IsEnergy);
        Assert.Equal(10, offset.Rows.Count);
        Assert.Equal(2 * u, offset.Value, 1e-9);
        Assert.Equal(u / Math.Sqrt(8), offset.Uncertainty, 1e-9);
        Assert.Equal(Math.Sqrt(10) * 2 / Math.Sqrt(1.25), offset.Z, 1e-6);
        Assert.Equal(32.0, offset.ChiSquaredDrop, 1e-6);
        Assert.True(offset.DisplacedChiSquared <= offset.ChiSquaredDrop);

        // and with E's offset fitted the data close exactly: E's own rows and the sound sources, which without the
        // offset sat at −√10 · 0.5/√1.25 each, now sit at 0 and none is flagged
        Assert.Equal(0.0, shifted.OffsetZ, 1e-6);
        Assert.All(analysis.Sources.Skip(1), source =>
        {
            Assert.False(source.SystematicOffset, source.Source);
            Assert.Empty(source.Offsets);
            Assert.Equal(0.0, source.OffsetZ, 1e-6);
        });
    }

    [Fact]
    public void Solve_IsomerPairMeasuredOnlyAgainstEachOther_IsUndeterminedAndGetsNoNumber()
    {
        // Given two declared isomers of C4H10 linked only by an isomerization (invented value), beside handbook data
        _folder.Write("species.csv", "key,formula,state,name\nnBu(g),C4H10,g,butane(g)\niBu(g),C4H10,g,isobutane(g)\n");
        string csv = HandbookData.ConsistentEnthalpyCsv() + "I1,nBu(g) -> iBu(g),dH,-8.0,0.5,kJ/mol,,invented\n";
        _folder.Write("network.csv", csv);
        NetworkReadResult read = NetworkReader.Read(_folder.Path);
        Assert.Empty(read.Errors);
        ThermoModel model = ThermoModel.Build(read.Network);

        // When solved and checked
        SolveReport solved = NetworkSolver.Report(NetworkSolver.Solve(model), PropertyFamily.Enthalpy)!;
        ModelConsistency checkedFamily = ConsistencyCheck.Analyse(model);

        // Then both isomers are listed as undetermined, with no number, and only their difference is known
        Assert.Equal(["iBu(g)", "nBu(g)"], solved.Undetermined.Select(estimate => estimate.Species.Name).Order(StringComparer.Ordinal));
        Assert.All(solved.Undetermined, estimate =>
        {
            Assert.False(estimate.IsDetermined);
            Assert.True(double.IsNaN(estimate.Value));
            Assert.True(double.IsNaN(estimate.Uncertainty));
        });
        string group = Assert.Single(solved.RelativeGroups);
        Assert.Contains("nBu(g)", group, StringComparison.Ordinal);
        Assert.Contains("iBu(g)", group, StringComparison.Ordinal);
        Assert.Contains("8", group, StringComparison.Ordinal);
        Assert.Equal(6, solved.Species.Count(estimate => estimate.IsDetermined));
        Assert.Equal("unchecked", checkedFamily.Measurements.Single(check => check.Measurement.Id == "I1").Status);
    }

    [Fact]
    public void Build_InternalEnergyOfBenzoicAcidCombustion_IsConvertedWithMinusHalfRT()
    {
        // Given the bomb-calorimetry combustion of benzoic acid, C7H6O2(cr) + 15/2 O2 -> 7 CO2 + 3 H2O(l):
        // Δn(gas) = 7 − 15/2 = −1/2 (the worked example of constant-volume calorimetry; ΔcU ≈ −3226.9 kJ/mol and
        // ΔcH° ≈ −3228 kJ/mol, from memory)
        ReactionNetwork network = HandbookData.ReadRows(_folder, "U1,C7H6O2(cr) + 15/2 O2(g) -> 7 CO2(g) + 3 H2O(l),dU,-3226.9,0.4,kJ/mol,,bomb");

        // When prepared for the joint model
        PreparedMeasurement prepared = Assert.Single(ThermoModel.Build(network).Measurements);

        // Then ΔH = ΔU + Δn·R·T with R = 8.314462618 J/(mol·K) (CODATA 2018, exact in the 2019 SI): −1.2395 kJ/mol
        double correction = -0.5 * 8.314462618 * 298.15 / 1000.0;
        Assert.Equal(-3226.9 + correction, prepared.Value, 1e-9);
        Assert.InRange(prepared.Value, -3229.0, -3227.0);
        Assert.Equal(0.4, prepared.Uncertainty, 1e-12);
        Assert.Equal("ΔU → ΔH: -1.239 kJ/mol (Δn(gas) = -1/2, T = 298.15 K)", Assert.Single(prepared.Adjustments));
    }

    [Fact]
    public void Build_InternalEnergyOfWaterFormation_ConvertsToTheTabulatedEnthalpy()
    {
        // Given ΔfU(H2O, l) = ΔfH° − Δn·R·T = −285.830 + 3/2·R·T = −282.112 kJ/mol (CODATA 1989 ΔfH°, from memory; Δn(gas) = −3/2)
        ReactionNetwork network = HandbookData.ReadRows(_folder, "U2,H2(g) + 1/2 O2(g) -> H2O(l),dU,-282.112,0.04,kJ/mol,,bomb");

        // When prepared
        PreparedMeasurement prepared = Assert.Single(ThermoModel.Build(network).Measurements);

        // Then ΔH is the tabulated ΔfH°(H2O, l) = −285.830 within rounding
        Assert.Equal(HandbookData.LiquidWater.Value, prepared.Value, 0.002);
        Assert.Contains("Δn(gas) = -3/2", Assert.Single(prepared.Adjustments), StringComparison.Ordinal);
        Assert.Contains("-3.718 kJ/mol", prepared.Adjustments[0], StringComparison.Ordinal);
    }

    [Fact]
    public void Run_Demo_FlagsItsTwoPlantedSlips_AndFitsTheDeclaredSystematic()
    {
        // Given the combustion-lab demo: group-c's notes say C03 carries a slipped ΔH, group-e's that E04 (ΔfG° of CO)
        // was copied from a kcal/mol column, and sources.csv declares a systematic for group-a
        NetworkReadResult read = NetworkReader.Read(RepoPaths.Demo("combustion-lab"));

        // When checked as the CLI does
        ConsistencyReport report = ConsistencyCheck.Run(read.Network, read.HeatCapacities, systematics: read.SourceSystematics);

        // Then it is inconsistent with exactly those two suspects, E04 first (a ΔG slip only the tie to ΔfH° and S° can
        // see), named as a calorie slip, and C03 as an enthalpy suspect with no slip of a known kind
        Assert.False(report.Consistent);
        ModelConsistency analysis = Assert.IsType<ModelConsistency>(report.Analysis);
        Assert.Equal(["E04", "C03"], analysis.Suspects.Select(suspect => suspect.Measurement.Id));
        Assert.Equal(SlipKind.Calorie, analysis.Suspects[0].LikelyCause?.Kind);
        Assert.Equal(ThermoProperty.Enthalpy, analysis.Suspects[1].Measurement.Measurement.Property);
        Assert.Null(analysis.Suspects[1].LikelyCause);

        // and group-a's declared offset is fitted within its declared 0.15 kJ/mol, while no offset is inferred
        SourceOffset offset = Assert.Single(analysis.Sources.Single(source => source.Source == "group-a").Offsets);
        Assert.Equal(0.15, offset.Declared);
        Assert.InRange(Math.Abs(offset.Z), 0.0, 2.0);
        Assert.Empty(analysis.OffsetSources);
    }

    private static Matrix<double> DenseMatrix(ThermoModel model)
    {
        Matrix<double> a = Matrix<double>.Build.Dense(model.Measurements.Count, model.Unknowns.Count);
        for (int i = 0; i < model.Vectors.Count; i++)
        {
            int[] indices = model.Vectors[i].Indices.ToArray();
            Fraction[] values = model.Vectors[i].Values.ToArray();
            for (int k = 0; k < indices.Length; k++)
            {
                a[i, indices[k]] = values[k].ToDouble();
            }
        }

        return a;
    }

    private static Matrix<double> DenseMatrix(ObservationSystem system)
    {
        Matrix<double> a = Matrix<double>.Build.Dense(system.ObservationCount, system.UnknownCount);
        for (int i = 0; i < system.ObservationCount; i++)
        {
            SparseRow row = system.Observations[i].Row;
            for (int k = 0; k < row.Count; k++)
            {
                a[i, row.Indices[k]] = row.Coefficients[k];
            }
        }

        return a;
    }

    private static int DenseRank(ThermoModel model) => model.Measurements.Count == 0 ? 0 : DenseMatrix(model).Rank();
}
