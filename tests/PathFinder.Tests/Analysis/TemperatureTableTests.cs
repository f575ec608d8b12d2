using PathFinder.Analysis;
using PathFinder.Chemistry;
using PathFinder.Data;
using PathFinder.Tests.TestSupport;
using PathFinder.Thermodynamics;

namespace PathFinder.Tests.Analysis;

/// <summary>Water formation moved in temperature through a network with ΔH, S° and Cp data, against NIST-JANAF.</summary>
public sealed class TemperatureTableTests : IDisposable
{
    /// <summary>ΔfH°(H2O, g) = −241.826 kJ/mol (CODATA Key Values, Cox, Wagman, Medvedev 1989, from memory);
    /// S°(H2O, g) = 188.835, S°(H2, g) = 130.680, S°(O2, g) = 205.152 J/(mol·K) (same source, from memory).</summary>
    public const string Water =
        "id,equation,property,value,uncertainty,unit,temperature\n" +
        "W1,H2O(g),dH,-241.826,0.040,kJ/mol,\n" +
        "W2,H2O(g),S,188.835,0.010,J/(mol·K),\n" +
        "W3,H2(g),S,130.680,0.003,J/(mol·K),\n" +
        "W4,O2(g),S,205.152,0.005,J/(mol·K),\n";

    /// <summary>Gas-phase Shomate coefficients published by NIST as fits to NIST-JANAF 1998, quoted from memory
    /// (the same sets as tests/PathFinder.Tests/Thermodynamics/ReferenceHeatCapacities.cs); the H2O(g) set is fitted
    /// from 500 K and is extrapolated below.</summary>
    public const string ShomateSets =
        "species,form,tmin,tmax,c1,c2,c3,c4,c5,c6,c7,c8\n" +
        "H2(g),shomate,298,1000,33.066178,-11.363417,11.432816,-2.772874,-0.158558,-9.980797,172.707974,0\n" +
        "O2(g),shomate,100,700,31.32234,-20.23531,57.86644,-36.50624,-0.007374,-8.903471,246.7945,0\n" +
        "O2(g),shomate,700,2000,30.03235,8.772972,-3.988133,0.788313,-0.741599,-11.32468,236.1663,0\n" +
        "H2O(g),shomate,500,1700,30.09200,6.832514,6.793435,-2.534480,0.082139,-250.8810,223.3967,-241.8264\n";

    private readonly TempFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    private NetworkSolutions Solutions()
    {
        NetworkReadResult read = AnalysisNetworks.Read(_folder, Water, ShomateSets);
        return new NetworkSolutions(read.Network, read.HeatCapacities);
    }

    private static SpeciesAtTemperature Row(TemperatureTable? table, string name) =>
        Assert.Single(table!.Species, row => row.Species.Name == name);

    [Fact]
    public void Enthalpy_WaterVapourAt1000K_MatchesJanaf()
    {
        // When ΔfH°(H2O, g) is moved from 298.15 K to 1000 K with the formation reaction's ΔfCp
        TemperatureTable? table = TemperatureTable.Evaluate(Solutions(), PropertyFamily.Enthalpy, 1000.0);

        // Then ΔfH°(1000 K) = −247.857 kJ/mol (NIST-JANAF Thermochemical Tables 4th ed. 1998, from memory)
        SpeciesAtTemperature water = Row(table, "H2O(g)");
        Assert.Equal(-241.826, water.AtReference!.Value.Value, 1e-9);
        Assert.Equal(-247.857, water.AtTemperature!.Value.Value, 0.1);
        Assert.Equal(0.040, water.AtTemperature!.Value.StandardUncertainty, 1e-9);
        Assert.Contains(water.Notes, note => note.Contains("H2O(g)", StringComparison.Ordinal) && note.Contains("extrapolated", StringComparison.Ordinal));
    }

    [Fact]
    public void Entropy_WaterVapourAt1000K_MatchesJanaf()
    {
        TemperatureTable? table = TemperatureTable.Evaluate(Solutions(), PropertyFamily.Entropy, 1000.0);

        // Then S°(1000 K): H2O(g) 232.738, H2(g) 166.216, O2(g) 243.578 J/(mol·K) (NIST-JANAF 1998, from memory)
        Assert.Equal(232.738, Row(table, "H2O(g)").AtTemperature!.Value.Value, 0.15);
        Assert.Equal(166.216, Row(table, "H2(g)").AtTemperature!.Value.Value, 0.05);
        Assert.Equal(243.578, Row(table, "O2(g)").AtTemperature!.Value.Value, 0.05);
    }

    [Theory]
    [InlineData(298.15, -228.582)] // NIST-JANAF 1998 ΔfG°(H2O, g), from memory
    [InlineData(1000.0, -192.590)] // NIST-JANAF 1998 ΔfG°(H2O, g), from memory
    public void Gibbs_WaterVapour_MatchesJanaf(double temperature, double janaf)
    {
        TemperatureTable? table = TemperatureTable.Evaluate(Solutions(), PropertyFamily.GibbsEnergy, temperature);

        Assert.Equal(janaf, Row(table, "H2O(g)").AtTemperature!.Value.Value, 0.15);
    }

    [Theory]
    [InlineData(298.15, 40.048)] // NIST-JANAF 1998 log Kf of H2O(g), from memory
    [InlineData(1000.0, 10.062)] // NIST-JANAF 1998 log Kf of H2O(g), from memory
    public void EquilibriumConstant_WaterFormation_MatchesJanafLogKf(double temperature, double logKf)
    {
        // Given the formation of water vapour as a target reaction
        NetworkSolutions solutions = Solutions();
        ChemicalEquation target = ChemicalEquation.Parse("H2(g) + 1/2 O2(g) -> H2O(g)");

        // When evaluated at the temperature from ΔH, S° and Cp
        TargetConditions conditions = TargetConditions.Evaluate(solutions, target, temperature);

        // Then log10 K equals the tabulated log Kf
        EquilibriumConstant k = Assert.IsType<EquilibriumConstant>(conditions.EquilibriumConstant);
        Assert.Equal(logKf, k.Log10K, 0.01);
    }

    [Fact]
    public void Enthalpy_SpeciesWithoutHeatCapacityIsNamed()
    {
        // Given the same data but no Cp for O2(g)
        string noOxygen = string.Join("\n", ShomateSets.Split('\n').Where(line => !line.StartsWith("O2(g)", StringComparison.Ordinal)));
        NetworkReadResult read = AnalysisNetworks.Read(_folder, Water, noOxygen);

        TemperatureTable? table = TemperatureTable.Evaluate(new NetworkSolutions(read.Network, read.HeatCapacities), PropertyFamily.Enthalpy, 800.0);

        // Then water is not moved, and the element that lacks Cp is named
        SpeciesAtTemperature water = Row(table, "H2O(g)");
        Assert.Null(water.AtTemperature);
        Assert.Equal(["O2(g)"], water.MissingHeatCapacities.Select(species => species.Name));
        Assert.Single(table!.LackingHeatCapacities);
    }
}
