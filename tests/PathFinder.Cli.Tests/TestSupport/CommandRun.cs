using System.CommandLine;

namespace PathFinder.Cli.Tests.TestSupport;

/// <summary>Runs one command outside <see cref="CliApp"/> (for commands not yet wired there), with the same error handling.</summary>
public static class CommandRun
{
    /// <summary>Parses and invokes <paramref name="args"/> against a root holding only the built command.</summary>
    public static CliRun Of(Func<CommandContext, Command> build, params string[] args)
    {
        ArgumentNullException.ThrowIfNull(build);
        using var output = new StringWriter();
        using var error = new StringWriter();
        var context = new CommandContext(output, error);
        var root = new RootCommand("test") { build(context) };
        ParseResult parse = root.Parse(args);
        int exitCode;
        if (parse.Errors.Count > 0)
        {
            exitCode = ExitCodes.InvalidInput;
        }
        else
        {
            try
            {
                exitCode = parse.Invoke(new InvocationConfiguration { Output = output, Error = error, EnableDefaultExceptionHandler = false });
            }
            catch (UserInputException exception)
            {
                error.WriteLine($"error: {exception.Message}");
                exitCode = ExitCodes.InvalidInput;
            }
        }

        return new CliRun(exitCode, output.ToString(), error.ToString());
    }
}
