using System.Globalization;
using System.Text;
using MathNet.Numerics.LinearAlgebra;
using PathFinder.Analysis;
using PathFinder.Chemistry;
using PathFinder.Data;
using PathFinder.Quantities;
using PathFinder.Solving;
using PathFinder.Tests.TestSupport;
using PathFinder.Thermodynamics;

namespace PathFinder.Tests.Analysis;

/// <summary>The joint model of ΔfH° and S°: derived ΔfG° against handbook tables, second- and third-law data, and dense references.</summary>
public sealed class JointModelTests : IDisposable
{
    // R from CODATA 2018 (exact: N_A·k).
    private const double R = PhysicalConstants.GasConstant;

    private readonly TempFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    // NIST-JANAF Thermochemical Tables, 4th ed. (1998), 298.15 K, from memory: ΔfH° (kJ/mol), S° (J/(mol·K)), ΔfG° (kJ/mol).
    // Elements: S°(H2, g) 130.680, S°(O2, g) 205.147, S°(N2, g) 191.609, S°(C, graphite) 5.740.
    [Theory]
    [InlineData("H2O(g)", -241.826, 188.834, -228.582)]
    [InlineData("NH3(g)", -45.898, 192.774, -16.367)]
    [InlineData("NO(g)", 90.291, 210.758, 86.600)]
    [InlineData("CO2(g)", -393.522, 213.795, -394.389)]
    public void GibbsView_FromFormationEnthalpyAndEntropies_EqualsTheTabulatedFormationGibbsEnergy(string species, double enthalpy, double entropy, double tabulatedGibbs)
    {
        // Given ΔfH° and S° of the species and S° of every element (NIST-JANAF 1998, from memory)
        var csv = new StringBuilder("id,equation,property,value,uncertainty,unit\n");
        csv.AppendLine(CultureInfo.InvariantCulture, $"h,{species},dH,{enthalpy},0.1,kJ/mol");
        csv.AppendLine(CultureInfo.InvariantCulture, $"s,{species},S,{entropy},0.01,J/(mol·K)");
        csv.AppendLine("e1,H2(g),S,130.680,0.01,J/(mol·K)");
        csv.AppendLine("e2,O2(g),S,205.147,0.01,J/(mol·K)");
        csv.AppendLine("e3,N2(g),S,191.609,0.01,J/(mol·K)");
        csv.AppendLine("e4,\"C(cr,graphite)\",S,5.740,0.01,J/(mol·K)");
        var solutions = new NetworkSolutions(Read(csv.ToString()), adjust: false);

        // When ΔfG° is read off the one solution
        SolveReport gibbs = solutions.Report(PropertyFamily.GibbsEnergy)!;
        SpeciesEstimate estimate = gibbs.Species.Single(item => item.Species.Name == species);

        // Then it equals the table's ΔfG° within its rounding (the tables round each column to 0.001 kJ/mol or J/(mol·K))
        Assert.Equal(tabulatedGibbs, estimate.Value, 0.005);

        // and its uncertainty combines u(ΔfH°) = 0.1 and T·u(ΔfS°), u(ΔfS°) = 0.01·√(Σν²) over the formation reaction's terms
        double sumOfSquares = ChemicalEquation.Formation(Species.Parse(species)).Terms.Sum(term => term.Coefficient.ToDouble() * term.Coefficient.ToDouble());
        Assert.Equal(Math.Sqrt((0.1 * 0.1) + Math.Pow(298.15 * 0.01 * Math.Sqrt(sumOfSquares) / 1000.0, 2)), estimate.Uncertainty, 1e-9);
    }

    [Fact]
    public void ThirdLaw_OneEquilibriumConstantWithEntropies_GivesTheFormationEnthalpy()
    {
        // Given S° of N2, O2 and NO (NIST-JANAF 1998, from memory) and ln K of ½N2 + ½O2 → NO at 298.15 K made from the
        // table's ΔfG°(NO) = 86.600 kJ/mol: ln K = −ΔrG°/(RT)
        double lnK = -86600.0 / (R * 298.15);
        string csv =
            "id,equation,property,value,uncertainty,unit\n" +
            "s1,N2(g),S,191.609,0.004,J/(mol·K)\n" +
            "s2,O2(g),S,205.147,0.005,J/(mol·K)\n" +
            "s3,NO(g),S,210.758,0.01,J/(mol·K)\n" +
            string.Create(CultureInfo.InvariantCulture, $"k1,1/2 N2(g) + 1/2 O2(g) -> NO(g),lnK,{lnK:R},0.01,\n");
        var solutions = new NetworkSolutions(Read(csv), adjust: false);

        // When solved
        SpeciesEstimate no = solutions.Report(PropertyFamily.Enthalpy)!.Species.Single(item => item.Species.Name == "NO(g)");

        // Then ΔfH°(NO) = ΔfG° + T·ΔfS° is the table's 90.291 kJ/mol (third law), with u from RT·u(ln K) = 0.0248 and T·u(ΔfS°)
        Assert.Equal(90.291, no.Value, 0.002);
        Assert.Equal(Math.Sqrt(Math.Pow(R * 298.15 * 0.01 / 1000, 2) + Math.Pow(298.15 * Math.Sqrt(0.01 * 0.01 + 0.25 * (0.004 * 0.004 + 0.005 * 0.005)) / 1000, 2)), no.Uncertainty, 1e-6);
    }

    [Fact]
    public void SecondLaw_EquilibriumConstantsAtSeveralTemperatures_GiveReactionEnthalpyAndEntropy()
    {
        // Given log₁₀ K of A → B at four temperatures made from ΔrH° = 50 kJ/mol and ΔrS° = 80 J/(mol·K) with ΔrCp = 0
        // (van 't Hoff: ln K = −ΔrH°/(RT) + ΔrS°/R; textbook relation), and no entropy or enthalpy data at all
        var csv = new StringBuilder("id,equation,property,value,uncertainty,unit,temperature\n");
        foreach (double t in new[] { 400.0, 500.0, 600.0, 700.0 })
        {
            double log10K = ((-50000.0 / (R * t)) + (80.0 / R)) / Math.Log(10.0);
            csv.AppendLine(string.Create(CultureInfo.InvariantCulture, $"k{t},C2H4(g) + H2(g) -> C2H6(g),log10K,{log10K:R},0.001,1,{t}"));
        }

        var solutions = new NetworkSolutions(Read(csv.ToString()), adjust: false);
        ChemicalEquation reaction = ChemicalEquation.Parse("C2H4(g) + H2(g) -> C2H6(g)");

        // When solved
        UncertainValue? enthalpy = solutions.Estimate(PropertyFamily.Enthalpy, reaction);
        UncertainValue? entropy = solutions.Estimate(PropertyFamily.Entropy, reaction);

        // Then both come back (second law), while each species' own ΔfH° and S° stay undetermined
        Assert.NotNull(enthalpy);
        Assert.NotNull(entropy);
        Assert.Equal(50.0, enthalpy.Value.Value, 1e-6);
        Assert.Equal(80.0, entropy.Value.Value, 1e-6);
        Assert.All(solutions.Report(PropertyFamily.Enthalpy)!.Species, estimate => Assert.False(estimate.IsDetermined));
    }

    [Fact]
    public void GibbsDatum_AtAnotherTemperatureWithoutHeatCapacities_IsRelatedWithZeroReactionHeatCapacity()
    {
        // Given ΔH and ΔS of a reaction at 298.15 K and its ΔG measured at 500 K, consistent with ΔrCp = 0
        string csv =
            "id,equation,property,value,uncertainty,unit,temperature\n" +
            "h,C2H4(g) + H2(g) -> C2H6(g),dH,-136.9,0.3,kJ/mol,\n" +
            "s,C2H4(g) + H2(g) -> C2H6(g),dS,-120.6,0.5,J/(mol·K),\n" +
            "g,C2H4(g) + H2(g) -> C2H6(g),dG,-76.6,0.3,kJ/mol,500\n";
        ThermoModel model = ThermoModel.Build(Read(csv));

        // When checked
        ModelConsistency analysis = ConsistencyCheck.Analyse(model);

        // Then the three form one cycle ΔG(500) − ΔH + 0.5·ΔS = 0 (−76.6 + 136.9 − 60.3 = 0), which closes, and ΔG's row says ΔrCp = 0
        CycleCheck cycle = Assert.Single(analysis.Cycles);
        Assert.True(cycle.IsMixed);
        Assert.Equal("kJ/mol", cycle.Unit);
        Assert.Equal(0.0, cycle.Residual, 1e-9);
        Assert.Contains(model.Measurements.Single(item => item.Id == "g").Adjustments, text => text.Contains("ΔrCp = 0", StringComparison.Ordinal));
    }

    [Fact]
    public void UntiedFamilies_GiveTheSameValuesAsSeparateSolvesOfEachFamily()
    {
        // Given ΔH and S° data on hydrocarbons and ΔG data on nitrogen species (values invented), which no datum ties:
        // no ΔG or K row involves a species with ΔH or S° data
        string csv =
            "id,equation,property,value,uncertainty,unit\n" +
            "h1,CO2(g),dH,-393.5,0.2,kJ/mol\n" +
            "h2,H2O(l),dH,-285.8,0.1,kJ/mol\n" +
            "h3,CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l),dH,-890.4,0.5,kJ/mol\n" +
            "h4,CH4(g),dH,-74.6,0.4,kJ/mol\n" +
            "h5,2 CH4(g) -> C2H6(g) + H2(g),dH,65.1,0.6,kJ/mol\n" +
            "h6,C2H6(g) + 7/2 O2(g) -> 2 CO2(g) + 3 H2O(l),dH,-1560.9,0.7,kJ/mol\n" +
            "s1,CH4(g),S,186.3,0.3,J/(mol·K)\n" +
            "s2,C2H6(g),S,229.2,0.5,J/(mol·K)\n" +
            "s3,CH4(g),S,186.0,0.4,J/(mol·K)\n" +
            "g1,NO(g),dG,86.6,0.2,kJ/mol\n" +
            "g2,NO2(g),dG,51.3,0.3,kJ/mol\n" +
            "g3,2 NO(g) + O2(g) -> 2 NO2(g),dG,-70.4,0.5,kJ/mol\n" +
            "g4,NH3(g),dG,-16.4,0.3,kJ/mol\n" +
            "g5,4 NH3(g) + 5 O2(g) -> 4 NO(g) + 6 H2O(g),dG,-959.0,2.0,kJ/mol\n" +
            "g6,H2O(g),dG,-228.6,0.1,kJ/mol\n";
        ReactionNetwork network = Read(csv);
        var solutions = new NetworkSolutions(network, adjust: false);

        foreach (PropertyFamily family in new[] { PropertyFamily.Enthalpy, PropertyFamily.Entropy, PropertyFamily.GibbsEnergy })
        {
            // When each family is also solved on its own, as before the joint model (one unknown per species and family)
            PropertyModel alone = PropertyModel.Build(network, family);
            LeastSquaresSolution separate = WeightedLeastSquares.Solve(alone.ToObservationSystem());
            SolveReport joint = solutions.Report(family)!;

            // Then every species value and uncertainty of the family agrees to rounding
            for (int j = 0; j < alone.Unknowns.Count; j++)
            {
                SpeciesEstimate estimate = joint.Species.Single(item => item.Species.Equals(alone.Unknowns[j]));
                Assert.Equal(separate.Values[j], estimate.Value, 1e-9);
                Assert.Equal(separate.StandardUncertainties[j], estimate.Uncertainty, 1e-9);
            }
        }
    }

    [Fact]
    public void Electron_InEntropyTerms_CountsAsHalfHydrogen()
    {
        // Given ΔS of H+(aq) + e- → ½ H2(g), which is zero by convention, and nothing else
        string csv =
            "id,equation,property,value,uncertainty,unit\n" +
            "s,H+(aq) + e- -> 1/2 H2(g),dS,0,0.1,J/(mol·K)\n" +
            "h,H2(g),S,130.68,0.01,J/(mol·K)\n";

        // When modelled
        ThermoModel model = ThermoModel.Build(Read(csv));

        // Then the convention row is zero (left out with a warning) and no S°(e-) unknown exists
        Assert.Single(model.Measurements);
        Assert.Contains(model.Warnings, warning => warning.Code == "conventional-only");
        Assert.Equal(-1, model.IndexOf(ReferenceStates.Electron, UnknownKind.Entropy));
    }

    [Theory]
    [InlineData(11)]
    [InlineData(23)]
    [InlineData(37)]
    public void JointSolution_OnRandomMixedData_EqualsAnIndependentDenseQrLeastSquares(int seed)
    {
        // Given a random network of ΔH, ΔU, S°, ΔS, ΔG (at several temperatures), ln K and log₁₀ K data over a few species
        var random = new Random(seed);
        string[] species = ["CH4(g)", "C2H6(g)", "C2H4(g)", "CO(g)", "CO2(g)", "H2O(g)", "CH3OH(g)", "C2H2(g)"];
        string[] elements = ["H2(g)", "O2(g)", "\"C(cr,graphite)\""];
        var csv = new StringBuilder("id,equation,property,value,uncertainty,unit,temperature\n");
        int id = 0;
        foreach (string s in species)
        {
            csv.AppendLine(Row(ref id, s, "dH", random, 100));
            csv.AppendLine(Row(ref id, s, "S", random, 100));
        }

        foreach (string element in elements)
        {
            csv.AppendLine(Row(ref id, element, "S", random, 50));
        }

        string[] reactions =
        [
            "C2H4(g) + H2(g) -> C2H6(g)", "CH4(g) + H2O(g) -> CO(g) + 3 H2(g)", "CO(g) + H2O(g) -> CO2(g) + H2(g)",
            "CO(g) + 2 H2(g) -> CH3OH(g)", "C2H2(g) + H2(g) -> C2H4(g)", "2 CH4(g) -> C2H6(g) + H2(g)",
        ];
        string[] properties = ["dH", "dU", "dS", "dG", "lnK", "log10K"];
        for (int k = 0; k < 24; k++)
        {
            csv.AppendLine(Row(ref id, reactions[random.Next(reactions.Length)], properties[random.Next(properties.Length)], random, 60));
        }

        ReactionNetwork network = Read(csv.ToString());
        ThermoModel model = ThermoModel.Build(network);

        // When solved as given
        LeastSquaresSolution solution = NetworkSolver.Solve(model, adjust: false).Solution;

        // Then every ΔfH° and S° equals a weighted QR solve (MathNet) of rows built here from the equations alone:
        // ΔH, ΔU→ΔH: Σν·ΔfH°; S°: S°; ΔS: Σν·S°; ΔG, K: Σν·ΔfH° − (T/1000)·Σν·S° with ΔG = −RT·ln K
        var columns = new List<(string Species, bool Entropy)>();
        int Column(string name, bool entropy)
        {
            int at = columns.IndexOf((name, entropy));
            if (at < 0)
            {
                columns.Add((name, entropy));
                at = columns.Count - 1;
            }

            return at;
        }

        var rows = new List<Dictionary<int, double>>();
        var values = new List<double>();
        var weights = new List<double>();
        foreach (Measurement measurement in network.Measurements)
        {
            var row = new Dictionary<int, double>();
            bool energy = measurement.Property is not (ThermoProperty.AbsoluteEntropy or ThermoProperty.Entropy);
            bool gibbs = measurement.Property is ThermoProperty.GibbsEnergy || measurement.Property.IsEquilibriumConstant();
            double value = measurement.Value;
            double u = measurement.Uncertainty;
            double t = measurement.Temperature;
            if (measurement.Property == ThermoProperty.InternalEnergy)
            {
                value += measurement.Equation.GasMoleChange().ToDouble() * R * t / 1000.0;
            }
            else if (measurement.Property.IsEquilibriumConstant())
            {
                double scale = measurement.Property == ThermoProperty.Log10EquilibriumConstant ? Math.Log(10.0) : 1.0;
                value = -R * t * measurement.Value * scale / 1000.0;
                u = R * t * measurement.Uncertainty * scale / 1000.0;
            }

            foreach (EquationTerm term in measurement.Equation.Terms)
            {
                double nu = term.Coefficient.ToDouble();
                if (energy && !ReferenceStates.HasZeroFormationProperties(term.Species))
                {
                    int c = Column(term.Species.Name, entropy: false);
                    row[c] = row.GetValueOrDefault(c) + nu;
                }

                if (!energy || gibbs)
                {
                    int c = Column(term.Species.Name, entropy: true);
                    row[c] = row.GetValueOrDefault(c) + (gibbs ? -t / 1000.0 * nu : nu);
                }
            }

            rows.Add(row);
            values.Add(value);
            weights.Add(1.0 / (u * u));
        }

        Matrix<double> a = Matrix<double>.Build.Dense(rows.Count, columns.Count);
        Vector<double> b = Vector<double>.Build.Dense(rows.Count);
        for (int i = 0; i < rows.Count; i++)
        {
            double sw = Math.Sqrt(weights[i]);
            foreach ((int c, double coefficient) in rows[i])
            {
                a[i, c] = sw * coefficient;
            }

            b[i] = sw * values[i];
        }

        Vector<double> reference = a.QR().Solve(b);
        Assert.Equal(columns.Count, model.Unknowns.Count);
        for (int c = 0; c < columns.Count; c++)
        {
            (string name, bool entropy) = columns[c];
            int unknown = model.IndexOf(network.FindSpecies(name.Trim('"'))!, entropy ? UnknownKind.Entropy : UnknownKind.FormationEnthalpy);
            Assert.True(solution.IsDetermined(unknown));
            Assert.Equal(reference[c], solution.Values[unknown], Math.Max(1e-9 * Math.Abs(reference[c]), 1e-9));
        }
    }

    [Fact]
    public void DeclaredSourceSystematic_EqualsGeneralizedLeastSquaresWithTheBlockCovariance()
    {
        // Given six ΔH data of three species from two labs, lab B declaring a systematic standard uncertainty of 0.8 kJ/mol
        // (values invented; B reads about 1 kJ/mol high)
        string data =
            "id,equation,property,value,uncertainty,unit,source\n" +
            "a1,CO2(g),dH,-393.5,0.2,kJ/mol,A\n" +
            "a2,H2O(l),dH,-285.8,0.1,kJ/mol,A\n" +
            "a3,CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l),dH,-890.5,0.4,kJ/mol,A\n" +
            "b1,CO2(g),dH,-392.4,0.2,kJ/mol,B\n" +
            "b2,CH4(g),dH,-73.9,0.3,kJ/mol,B\n" +
            "b3,H2O(l),dH,-284.9,0.2,kJ/mol,B\n";
        string file = _folder.Write("labs.csv", data);
        _folder.Write("labs.sources.csv", "source,systematic,unit\nB,0.8,kJ/mol\n");
        NetworkReadResult read = NetworkReader.Read(file);
        Assert.Empty(read.Errors);
        Assert.Single(read.SourceSystematics);

        // When solved jointly (the offset an unknown with prior 0 ± 0.8)
        var solutions = new NetworkSolutions(read.Network, adjust: false, systematics: read.SourceSystematics);
        SolveReport report = solutions.Report(PropertyFamily.Enthalpy)!;

        // Then values and covariances equal dense GLS with V = diag(u²) + 0.8²·g·gᵀ (g marks lab B's rows): x = (AᵀV⁻¹A)⁻¹AᵀV⁻¹b
        string[] names = ["CO2(g)", "H2O(l)", "CH4(g)"];
        double[,] design =
        {
            { 1, 0, 0 }, { 0, 1, 0 }, { 1, 2, -1 },
            { 1, 0, 0 }, { 0, 0, 1 }, { 0, 1, 0 },
        };
        double[] b = [-393.5, -285.8, -890.5, -392.4, -73.9, -284.9];
        double[] u = [0.2, 0.1, 0.4, 0.2, 0.3, 0.2];
        bool[] fromB = [false, false, false, true, true, true];
        Matrix<double> a = Matrix<double>.Build.DenseOfArray(design);
        Matrix<double> v = Matrix<double>.Build.Dense(6, 6, (i, j) => (i == j ? u[i] * u[i] : 0.0) + (fromB[i] && fromB[j] ? 0.64 : 0.0));
        Matrix<double> vInverse = v.Inverse();
        Matrix<double> covariance = (a.Transpose() * vInverse * a).Inverse();
        Vector<double> x = covariance * a.Transpose() * vInverse * Vector<double>.Build.DenseOfArray(b);
        for (int k = 0; k < names.Length; k++)
        {
            SpeciesEstimate estimate = report.Species.Single(item => item.Species.Name == names[k]);
            Assert.Equal(x[k], estimate.Value, 1e-9);
            Assert.Equal(Math.Sqrt(covariance[k, k]), estimate.Uncertainty, 1e-9);
        }

        int co2 = report.Model.IndexOf(report.Species[0].Species, UnknownKind.FormationEnthalpy);
        int water = report.Model.IndexOf(report.Species.Single(item => item.Species.Name == "H2O(l)").Species, UnknownKind.FormationEnthalpy);
        Assert.Equal(covariance[0, 1], report.Solution.Covariance(co2, water), 1e-9);

        // and the check reports lab B's fitted offset, positive (it reads high)
        ModelConsistency analysis = ConsistencyCheck.Run(read.Network, systematics: read.SourceSystematics, options: new ConsistencyOptions { RunSuspectProcedure = false }).Analysis!;
        SourceOffset offset = Assert.Single(analysis.Sources.Single(source => source.Source == "B").Offsets);
        Assert.False(offset.IsInferred);
        Assert.Equal(0.8, offset.Declared);
        Assert.InRange(offset.Value, 0.3, 1.3);
    }

    private static string Row(ref int id, string equation, string property, Random random, double scale)
    {
        id++;
        double value = (random.NextDouble() - 0.5) * 2 * scale;
        double uncertainty = 0.1 + random.NextDouble();
        double temperature = property is "dG" or "lnK" or "log10K" ? 298.15 + (100 * random.Next(0, 5)) : 298.15;
        string unit = property switch
        {
            "S" or "dS" => "J/(mol·K)",
            "lnK" or "log10K" => "",
            _ => "kJ/mol",
        };
        if (property is "lnK" or "log10K")
        {
            value /= 10;
            uncertainty /= 10;
        }

        return string.Create(CultureInfo.InvariantCulture, $"x{id},{(equation.Contains(',', StringComparison.Ordinal) && !equation.StartsWith('"') ? "\"" + equation + "\"" : equation)},{property},{value:R},{uncertainty:R},{unit},{temperature:R}");
    }

    private ReactionNetwork Read(string csv)
    {
        string file = _folder.Write($"n{Guid.NewGuid():N}.csv", csv);
        NetworkReadResult read = NetworkReader.Read(file);
        Assert.Empty(read.Errors);
        return read.Network;
    }
}
