using System.Text.Json;
using PathFinder.Cli.Commands;
using PathFinder.Cli.Tests.TestSupport;

namespace PathFinder.Cli.Tests.Commands;

public sealed class PlanCommandTests
{
    private static CliRun Plan(params string[] args) => CliRun.Of(["plan", .. args]);

    [Fact]
    public void Plan_DemoTargetRanksRemeasurementsAndCandidates()
    {
        CliRun run = Plan(RepoPaths.Demo("combustion-lab"), "--target", "DME(g)", "--top", "4", "--candidate", "2 CH3OH(g) -> DME(g) + H2O(g)", "--candidate", "CH3OH(g) -> HCHO(g) + H2(g)");

        Assert.Equal(0, run.ExitCode);
        Assert.Contains("Re-measure an existing measurement (re-measured with u × 0.50)", run.Out, StringComparison.Ordinal);
        Assert.Contains("Measure a new reaction", run.Out, StringComparison.Ordinal);
    }

    [Fact]
    public void Plan_JsonListsGivenCandidatesSortedByResultingUncertainty()
    {
        CliRun run = Plan(RepoPaths.Demo("combustion-lab"), "--target", "DME(g)", "--no-generate", "--json", "--candidate-uncertainty", "0.2", "--uncertainty", "0.1",
            "--candidate", "2 CH3OH(g) -> DME(g) + H2O(g)", "--candidate", "CH3OH(g) -> HCHO(g) + H2(g)");

        Assert.Equal(0, run.ExitCode);
        using JsonDocument document = JsonDocument.Parse(run.Out);
        JsonElement[] candidates = document.RootElement.GetProperty("candidates").EnumerateArray().ToArray();
        Assert.Equal(2, candidates.Length);
        Assert.All(candidates, item => Assert.Equal("given", item.GetProperty("origin").GetString()));
        Assert.True(candidates[0].GetProperty("targetUncertainty").GetDouble() <= candidates[1].GetProperty("targetUncertainty").GetDouble());
        Assert.All(document.RootElement.GetProperty("remeasurements").EnumerateArray(), item => Assert.Equal(0.1, item.GetProperty("newUncertainty").GetDouble(), 12));
    }

    [Fact]
    public void Plan_UndeterminedTargetExitsOne()
    {
        Assert.Equal(1, Plan(RepoPaths.Demo("combustion-lab"), "--target", "C4H10(g)").ExitCode);
    }

    [Fact]
    public void Plan_BadInputExitsTwo()
    {
        Assert.Equal(2, Plan(RepoPaths.Demo("combustion-lab"), "--target", "DME(g)", "--factor", "0").ExitCode);
        Assert.Equal(2, Plan(RepoPaths.Demo("combustion-lab"), "--target", "DME(g)", "--candidate", "CH4(g) -> CO2(g)").ExitCode);
        Assert.Equal(2, Plan(RepoPaths.Demo("combustion-lab"), "--target", "DME(g)", "--candidate-uncertainty", "-1").ExitCode);
    }
}
