using PathFinder.Cli.Tests.TestSupport;

namespace PathFinder.Cli.Tests.Output;

/// <summary>Every numeric option outside its documented range exits 2 with a message giving the range, before any work.</summary>
public sealed class OptionRangesTests
{
    private static readonly string Demo = RepoPaths.Demo("combustion-lab");

    [Theory]
    [InlineData("routes", "--time-budget", "1e308")]
    [InlineData("routes", "--time-budget", "0")]
    [InlineData("routes", "--max-steps", "0")]
    [InlineData("routes", "--max-steps", "100000")]
    [InlineData("routes", "--top", "0")]
    [InlineData("routes", "--top", "2147483647")]
    [InlineData("routes", "--explain", "-5")]
    [InlineData("routes", "--temperature", "0")]
    [InlineData("routes", "--temperature", "-5")]
    [InlineData("routes", "--temperature", "NaN")]
    [InlineData("routes", "--temperature", "1e308")]
    [InlineData("routes", "--temperature", "0.5")]
    [InlineData("solve", "--temperature", "1e-300")]
    [InlineData("solve", "--threshold", "1e308")]
    [InlineData("solve", "--threshold", "0")]
    [InlineData("check", "--threshold", "-1")]
    [InlineData("check", "--inflation", "1")]
    [InlineData("check", "--inflation", "1e308")]
    [InlineData("check", "--max-cycle", "0")]
    [InlineData("check", "--max-cycle", "1000")]
    [InlineData("check", "--show-cycles", "-1")]
    [InlineData("trace", "--top", "0")]
    [InlineData("trace", "--top", "2147483647")]
    [InlineData("plan", "--factor", "0")]
    [InlineData("plan", "--factor", "1e308")]
    [InlineData("plan", "--uncertainty", "-1")]
    [InlineData("plan", "--uncertainty", "1e308")]
    [InlineData("plan", "--candidate-uncertainty", "1e-300")]
    [InlineData("plan", "--depth", "2147483647")]
    [InlineData("plan", "--top", "0")]
    [InlineData("draw", "--depth", "2147483647")]
    [InlineData("draw", "--depth", "0")]
    [InlineData("draw", "--max-nodes", "0")]
    [InlineData("draw", "--max-steps", "100000")]
    public void OptionOutOfRange_ExitsTwoWithTheRange(string command, string option, string value)
    {
        // Given a valid command on the demo network
        string[] args = command switch
        {
            "routes" or "trace" or "plan" => [command, Demo, "--target", "CH4(g)", option, value],
            "draw" => [command, Demo, "--species", "CH4(g)", "-o", Path.Combine(Path.GetTempPath(), "never-written.svg"), option, value],
            _ => [command, Demo, option, value],
        };

        // When one option is out of range
        CliRun run = CliRun.Of(args);

        // Then exit 2, one message naming the option and its range, no output and no stack trace
        Assert.Equal(ExitCodes.InvalidInput, run.ExitCode);
        Assert.StartsWith($"error: {option} must be", run.Error, StringComparison.Ordinal);
        Assert.Matches(@"from|above", run.Error);
        Assert.DoesNotContain("   at ", run.Error, StringComparison.Ordinal);
        Assert.Equal("", run.Out);
    }

    [Fact]
    public void DrawCycleBelowOne_ExitsTwo()
    {
        CliRun run = CliRun.Of("draw", Demo, "--cycle", "-3", "-o", Path.Combine(Path.GetTempPath(), "never-written.svg"));

        Assert.Equal(ExitCodes.InvalidInput, run.ExitCode);
        Assert.Contains("--cycle must be a whole number from 1", run.Error, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("routes", "--temperature", "1")]
    [InlineData("routes", "--temperature", "10000")]
    [InlineData("routes", "--max-steps", "64")]
    [InlineData("check", "--inflation", "100")]
    public void OptionAtTheEdgeOfItsRange_IsAccepted(string command, string option, string value)
    {
        string[] args = command == "routes" ? [command, Demo, "--target", "CH4(g)", option, value, "--time-budget", "2"] : [command, Demo, option, value];

        CliRun run = CliRun.Of(args);

        Assert.NotEqual(ExitCodes.InvalidInput, run.ExitCode);
        Assert.NotEqual(ExitCodes.InternalError, run.ExitCode);
    }
}
