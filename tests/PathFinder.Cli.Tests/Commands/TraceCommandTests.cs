using System.Text.Json;
using PathFinder.Cli.Commands;
using PathFinder.Cli.Tests.TestSupport;

namespace PathFinder.Cli.Tests.Commands;

public sealed class TraceCommandTests
{
    private static CliRun Trace(params string[] args) => CliRun.Of(["trace", .. args]);

    [Fact]
    public void Trace_DemoTargetListsSourcesAndMeasurementsAndExitsZero()
    {
        CliRun run = Trace(RepoPaths.Demo("combustion-lab"), "--target", "DME(g)", "--top", "3");

        Assert.Equal(0, run.ExitCode);
        Assert.Contains("Network estimate", run.Out, StringComparison.Ordinal);
        Assert.Contains("Sources by share of the variance:", run.Out, StringComparison.Ordinal);
        Assert.Contains("Measurements by share of the variance (3 of", run.Out, StringComparison.Ordinal);
        Assert.Contains("A14", run.Out, StringComparison.Ordinal);
    }

    [Fact]
    public void Trace_JsonSharesAddUpToOne()
    {
        CliRun run = Trace(RepoPaths.Demo("combustion-lab"), "--target", "CO(g) + 2 H2(g) -> CH3OH(g)", "--json", "--top", "100");

        Assert.Equal(0, run.ExitCode);
        using JsonDocument document = JsonDocument.Parse(run.Out);
        JsonElement root = document.RootElement;
        Assert.True(root.GetProperty("determined").GetBoolean());
        // the measurements' shares and the declared systematic's (group-a, sources.csv) add up to the whole variance
        JsonElement[] parts = [.. root.GetProperty("measurements").EnumerateArray(), .. root.GetProperty("systematics").EnumerateArray()];
        Assert.Single(root.GetProperty("systematics").EnumerateArray());
        double total = parts.Sum(item => item.GetProperty("share").GetDouble());
        Assert.Equal(1.0, total, 1e-9);
        double variance = parts.Sum(item => item.GetProperty("varianceContribution").GetDouble());
        Assert.Equal(Math.Pow(root.GetProperty("uncertainty").GetDouble(), 2), variance, 1e-9);
    }

    [Fact]
    public void Trace_UndeterminedTargetExitsOne()
    {
        CliRun run = Trace(RepoPaths.Demo("combustion-lab"), "--target", "C4H10(g)");

        Assert.Equal(1, run.ExitCode);
        Assert.Contains("not determined", run.Error, StringComparison.Ordinal);
        Assert.Contains("C4H10(g)", run.Error, StringComparison.Ordinal);
    }

    [Fact]
    public void Trace_BadInputExitsTwo()
    {
        Assert.Equal(2, Trace(RepoPaths.Demo("combustion-lab"), "--target", "CH4(g) -> CO2(g)").ExitCode);
        Assert.Equal(2, Trace(RepoPaths.Demo("combustion-lab"), "--target", "CH4(g)", "--property", "dX").ExitCode);
        Assert.Equal(2, Trace(RepoPaths.Demo("combustion-lab"), "--target", "CH4(g)", "--top", "0").ExitCode);
    }
}
