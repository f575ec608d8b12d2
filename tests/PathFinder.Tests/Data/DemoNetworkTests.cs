using PathFinder.Data;
using PathFinder.Diagnostics;
using PathFinder.Quantities;
using PathFinder.Tests.TestSupport;

namespace PathFinder.Tests.Data;

/// <summary>The demo data in <c>networks-demo/</c> is documentation: each network validates as its README says.</summary>
public sealed class DemoNetworkTests
{
    [Fact]
    public void CombustionLab_IsValidWith46Measurements()
    {
        NetworkReadResult result = NetworkReader.Read(RepoPaths.Demo("combustion-lab"));

        // 14 + 9 + 7 + 8 + 8 rows in group-a.csv … group-e.csv
        Assert.Empty(result.Errors);
        Assert.Equal(46, result.Network.Measurements.Count);
        Assert.Equal(5, result.Files.Count);
        Assert.NotNull(result.HeatCapacityFile);
        Assert.Empty(result.Diagnostics);
        Assert.NotNull(result.SpeciesFile);
        Assert.Equal(["group-a", "group-b", "group-c", "group-d", "group-e"], result.Network.Sources);
        Assert.Equal(8, result.Network.Measurements.Count(measurement => measurement.Source == "group-e"));

        // sources.csv declares one systematic: group A's shared calorimeter calibration, 0.15 kJ/mol
        Assert.NotNull(result.SourcesFile);
        SourceSystematic declared = Assert.Single(result.SourceSystematics);
        Assert.Equal("group-a", declared.Source);
        Assert.Equal(0.15, declared.Systematic, 1e-12);
        Assert.Equal(EnergyUnit.KilojoulePerMole, declared.Unit);
    }

    [Fact]
    public void CombustionLab_GroupE_HoldsTheGibbsSeriesAndThePlantedSlip()
    {
        ReactionNetwork network = NetworkReader.Read(RepoPaths.Demo("combustion-lab")).Network;

        // E04 is ΔfG°(CO) copied from a kcal/mol column: −32.78 "kJ/mol" where the tables give about −137.2 kJ/mol
        Measurement slip = network["E04"];
        Assert.Equal(ThermoProperty.GibbsEnergy, slip.Property);
        Assert.Equal(-32.78, slip.Value, 12);
        Assert.Equal("CO(g)", slip.Equation.FormedSpecies?.Name);

        // E05–E08: log10 K of CO + 2 H2 → CH3OH(g) at 450, 500, 550 and 600 K, falling with temperature (exothermic)
        Measurement[] series = new[] { "E05", "E06", "E07", "E08" }.Select(id => network[id]).ToArray();
        Assert.All(series, measurement => Assert.Equal(ThermoProperty.Log10EquilibriumConstant, measurement.Property));
        Assert.Equal(4, series.Length);
        Assert.All(series.Zip(new[] { 450.0, 500.0, 550.0, 600.0 }), pair => Assert.Equal(pair.Second, pair.First.Temperature, 1e-9));
        Assert.True(series.Zip(series.Skip(1)).All(pair => pair.Second.Value < pair.First.Value));
    }

    [Fact]
    public void CombustionLab_UsesTheDeclaredIsomers()
    {
        ReactionNetwork network = NetworkReader.Read(RepoPaths.Demo("combustion-lab")).Network;

        Assert.Equal("DME(g)", network["A14"].Equation.Terms[0].Species.Name);
        Assert.Equal("dimethyl ether(g)", network["A14"].Equation.Terms[0].Species.Description);
        Assert.Equal("EtOH(l)", network["A10"].Equation.Terms[0].Species.Name);
        Assert.NotEqual(network["C04"].Equation.Terms.Single(term => term.Species.Label == "DME(g)").Species, network["B07"].Equation.Terms.Single(term => term.Species.Label == "EtOH(g)").Species);
    }

    [Fact]
    public void CombustionLab_ReadsTheEntropyRowInItsUnit()
    {
        Measurement entropy = NetworkReader.Read(RepoPaths.Demo("combustion-lab")).Network["C06"];

        Assert.Equal(ThermoProperty.Entropy, entropy.Property);
        Assert.Equal(EnergyUnit.JoulePerMoleKelvin, entropy.Unit);
        Assert.Equal(-219.2, entropy.Value, 12);
    }

    [Fact]
    public void BrineIons_IsValid()
    {
        NetworkReadResult result = NetworkReader.Read(RepoPaths.Demo("brine-ions.csv"));

        Assert.Empty(result.Errors);
        Assert.Equal(9, result.Network.Measurements.Count);
    }

    [Fact]
    public void NotebookWithTypos_HasOneErrorPerFaultyRow()
    {
        // Given the deliberately faulty notebook page
        string file = RepoPaths.Demo("notebook-with-typos.csv");

        // When validated
        NetworkReadResult result = NetworkReader.Read(file);

        // Then every data row (lines 4-13) has exactly one error of its kind, and nothing is usable
        Assert.Equal(
            [
                (4, "unbalanced-equation"),
                (5, "missing-arrow"),
                (6, "unknown-element"),
                (7, "bad-uncertainty"),
                (8, "bad-number"),
                (9, "unknown-unit"),
                (10, "bad-temperature"),
                (11, "duplicate-id"),
                (12, "ambiguous-charge"),
                (13, "missing-state"),
            ],
            result.Diagnostics.Select(diagnostic => (diagnostic.Location.Line, diagnostic.Code)));
        Assert.All(result.Diagnostics, diagnostic => Assert.Equal(Severity.Error, diagnostic.Severity));
        Assert.All(result.Diagnostics, diagnostic => Assert.Equal(file, diagnostic.Location.File));
        Assert.Empty(result.Network.Measurements);
    }

    [Fact]
    public void NotebookWithTypos_PointsAtTheFaultyText()
    {
        string file = RepoPaths.Demo("notebook-with-typos.csv");
        string[] lines = File.ReadAllLines(file);

        Diagnostic[] diagnostics = NetworkReader.Read(file).Diagnostics.ToArray();

        // The column is where the faulty text starts in the raw line
        Assert.Equal(lines[4].IndexOf("CO2(g)", StringComparison.Ordinal) + 1, diagnostics[1].Location.Column);
        Assert.Equal(lines[5].IndexOf("Xy2O", StringComparison.Ordinal) + 1, diagnostics[2].Location.Column);
        Assert.Equal(lines[7].IndexOf("abc", StringComparison.Ordinal) + 1, diagnostics[4].Location.Column);
        Assert.Equal(lines[8].IndexOf("kJ/fortnight", StringComparison.Ordinal) + 1, diagnostics[5].Location.Column);
        Assert.Equal(lines[9].IndexOf("-5", StringComparison.Ordinal) + 1, diagnostics[6].Location.Column);
        Assert.Equal(lines[11].IndexOf("3+", StringComparison.Ordinal) + 1, diagnostics[8].Location.Column);
    }

    [Fact]
    public void EveryDemoNetworkCanBeRead()
    {
        // Each network in networks-demo/ (a top-level CSV or a folder) reads without throwing
        string root = RepoPaths.Demo("");
        IEnumerable<string> networks = Directory.EnumerateFiles(root, "*.csv").Where(file => !NetworkFiles.IsAuxiliary(Path.GetFileName(file)))
            .Concat(Directory.EnumerateDirectories(root));

        foreach (string network in networks)
        {
            NetworkReadResult result = NetworkReader.Read(network);
            Assert.True(result.Files.Count > 0, network);
        }
    }
}
