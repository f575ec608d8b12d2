using System.Text.Json;
using PathFinder.Cli.Tests.TestSupport;

namespace PathFinder.Cli.Tests.Commands;

public sealed class SolveCommandTemperatureTests
{
    [Fact]
    public void Solve_WithTemperatureMovesSpeciesAndNamesMissingHeatCapacities()
    {
        CliRun run = CliRun.Of("solve", RepoPaths.Demo("combustion-lab"), "--temperature", "500");

        Assert.Equal(0, run.ExitCode);
        Assert.Contains("ΔfH° at 500 K in kJ/mol", run.Out, StringComparison.Ordinal);
        Assert.Contains("Not moved, heat capacities missing", run.Out, StringComparison.Ordinal);
        Assert.Contains("C2H2(g) (needs C2H2(g))", run.Out, StringComparison.Ordinal);
    }

    [Fact]
    public void Solve_JsonAtTemperatureGivesCarbonDioxideNearJanaf()
    {
        CliRun run = CliRun.Of("solve", RepoPaths.Demo("combustion-lab"), "--temperature", "500", "--json");

        Assert.Equal(0, run.ExitCode);
        using JsonDocument document = JsonDocument.Parse(run.Out);
        JsonElement carbonDioxide = document.RootElement.GetProperty("atTemperature").GetProperty("species").EnumerateArray()
            .Single(item => item.GetProperty("name").GetString() == "CO2(g)");

        // ΔfH°(CO2, g, 500 K) = −393.67 kJ/mol (NIST-JANAF 1998, from memory); demo Cp for graphite is rough
        Assert.Equal(-393.67, carbonDioxide.GetProperty("value").GetDouble(), 0.3);
    }

    [Fact]
    public void Solve_GibbsAtTemperatureUsesEnthalpyAndEntropyData()
    {
        CliRun run = CliRun.Of("solve", RepoPaths.Demo("combustion-lab"), "--property", "dG", "--temperature", "800");

        Assert.Equal(0, run.ExitCode);
        Assert.Contains("ΔfG° at 800 K", run.Out, StringComparison.Ordinal);
        Assert.Contains("CO(g)", run.Out, StringComparison.Ordinal);
    }

    [Fact]
    public void Solve_BadTemperatureExitsTwo()
    {
        Assert.Equal(2, CliRun.Of("solve", RepoPaths.Demo("combustion-lab"), "--temperature", "-5").ExitCode);
    }

    [Fact]
    public void Routes_WithTemperatureGivesTheEquilibriumConstantOnTheDemo()
    {
        CliRun run = CliRun.Of("routes", RepoPaths.Demo("combustion-lab"), "--target", "CO(g) + 2 H2(g) -> CH3OH(g)", "--temperature", "500", "--json");

        Assert.Equal(0, run.ExitCode);
        using JsonDocument document = JsonDocument.Parse(run.Out);
        JsonElement atTemperature = document.RootElement.GetProperty("atTemperature");
        double enthalpy = atTemperature.GetProperty("enthalpy").GetProperty("value").GetDouble();
        double entropy = atTemperature.GetProperty("entropy").GetProperty("value").GetDouble();
        double gibbs = atTemperature.GetProperty("gibbs").GetProperty("value").GetDouble();
        double log10K = atTemperature.GetProperty("equilibriumConstant").GetProperty("log10K").GetDouble();

        // Then ΔrG° = ΔrH° − T·ΔrS° and log K = −ΔrG°/(R·T·ln 10) at 500 K, ΔrH° moved away from its 298.15 K value
        Assert.Equal(enthalpy - (500.0 * entropy / 1000.0), gibbs, 1e-9);
        Assert.Equal(-gibbs * 1000.0 / (PathFinder.Quantities.PhysicalConstants.GasConstant * 500.0 * Math.Log(10.0)), log10K, 1e-9);
        Assert.True(Math.Abs(enthalpy - document.RootElement.GetProperty("networkEstimate").GetProperty("value").GetDouble()) > 1.0);
    }
}
