using PathFinder.Cli.Tests.TestSupport;

namespace PathFinder.Cli.Tests;

public sealed class CliAppTests
{
    [Theory]
    [InlineData("validate", "networks-demo/brine-ions.csv", "--bogus")]
    [InlineData("frobnicate")]
    [InlineData("validate")]
    [InlineData()]
    public void Run_BadUsageExitsWithTwoAndNoStackTrace(params string[] args)
    {
        // Given a command line with an unknown option or command, or a missing argument
        CliRun run = CliRun.Of(args);

        // Then the exit code is 2 (invalid usage), with a one-line reason and no stack trace
        Assert.Equal(ExitCodes.InvalidInput, run.ExitCode);
        Assert.Contains("error:", run.Error, StringComparison.Ordinal);
        Assert.Contains("pathfinder --help", run.Error, StringComparison.Ordinal);
        Assert.DoesNotContain("   at ", run.Error, StringComparison.Ordinal);
        Assert.DoesNotContain("Exception", run.Error, StringComparison.Ordinal);
    }

    [Fact]
    public void Run_UnknownOptionIsNamed()
    {
        CliRun run = CliRun.Of("validate", RepoPaths.Demo("brine-ions.csv"), "--bogus");

        Assert.Contains("--bogus", run.Error, StringComparison.Ordinal);
        Assert.Equal("", run.Out);
    }

    [Fact]
    public void Run_HelpListsTheCommandsAndExitCodes()
    {
        CliRun run = CliRun.Of("--help");

        Assert.Equal(ExitCodes.Success, run.ExitCode);
        Assert.Contains("validate", run.Out, StringComparison.Ordinal);
        Assert.Contains("Exit codes: 0 = success", run.Out, StringComparison.Ordinal);
    }

    [Fact]
    public void ExitCodes_AreDistinctAndDocumented()
    {
        int[] codes = [ExitCodes.Success, ExitCodes.AnalysisProblem, ExitCodes.InvalidInput, ExitCodes.InternalError];

        Assert.Equal([0, 1, 2, 3], codes);
        Assert.All(codes, code => Assert.Contains($"{code} = ", ExitCodes.HelpText, StringComparison.Ordinal));
    }
}
