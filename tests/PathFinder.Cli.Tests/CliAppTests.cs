using PathFinder.Cli.Tests.TestSupport;
using PathFinder.Tests.TestSupport;

namespace PathFinder.Cli.Tests;

public sealed class CliAppTests : IDisposable
{
    private readonly TempFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    [Theory]
    [InlineData("validate")]
    [InlineData("check")]
    [InlineData("solve")]
    [InlineData("solve", "--format", "csv")]
    [InlineData("solve", "--format", "markdown")]
    [InlineData("solve", "--json")]
    [InlineData("check", "--json")]
    [InlineData("trace", "--target", "CO2(g)")]
    [InlineData("routes", "--target", "CO2(g)")]
    public void Run_NeverSendsAControlCharacterFromTheDataToTheTerminal(params string[] command)
    {
        // Given a network whose source holds a title change and a screen clear (ESC ] 0 ; ... BEL, ESC [ 2 J)
        string network = HostileNetwork.Write(_folder);

        // When any command prints it
        CliRun run = CliRun.Of([command[0], network, .. command[1..]]);

        // Then the sequence is shown as text and nothing but line breaks and tabs is a control character
        Assert.True(run.ExitCode is 0 or 1, run.Error);
        Assert.DoesNotContain(run.Out + run.Error, c => char.IsControl(c) && c is not ('\n' or '\t'));
        if (command[0] is "check" && command.Length == 1)
        {
            Assert.Contains("\\u001B]0;pwned\\u0007\\u001B[2Jlab", run.Out, StringComparison.Ordinal);
        }
    }

    [Fact]
    public void Run_ShowsControlCharactersInAFileNameInMessages()
    {
        // Given a network path whose name holds an escape sequence
        string network = Path.Combine(_folder.Path, "x\u001b[2J.csv");

        // When it is validated
        CliRun run = CliRun.Of("validate", network);

        // Then the message shows the sequence
        Assert.Equal(ExitCodes.InvalidInput, run.ExitCode);
        Assert.Contains("x\\u001B[2J.csv", run.Out + run.Error, StringComparison.Ordinal);
        Assert.DoesNotContain('\u001b', run.Out + run.Error);
    }

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
