using System.CommandLine;
using PathFinder.Cli.Commands;
using PathFinder.Cli.Output;

namespace PathFinder.Cli;

/// <summary>Wires the commands together and turns every failure into a message and a documented exit code.</summary>
public static class CliApp
{
    /// <summary>Runs the command line and returns the process exit code.</summary>
    public static int Run(string[] args, TextWriter output, TextWriter error)
    {
        ArgumentNullException.ThrowIfNull(args);
        ArgumentNullException.ThrowIfNull(output);
        ArgumentNullException.ThrowIfNull(error);

        // Data reaches the terminal only through these: control characters in ids, sources or file names are shown, not run.
        using var visibleOutput = new VisibleTextWriter(output);
        using var visibleError = new VisibleTextWriter(error);
        output = visibleOutput;
        error = visibleError;
        var context = new CommandContext(output, error);
        var root = new RootCommand(
            "PathFinder: combine measured reaction enthalpies (and ΔG, ΔS, ΔU) through Hess's law; validate data, " +
            "find every route to a target, test cycle closure and solve the network.\n" + ExitCodes.HelpText)
        {
            new ValidateCommand().Build(context),
            new RoutesCommand().Build(context),
            new CheckCommand().Build(context),
            new SolveCommand().Build(context),
            new DrawCommand().Build(context),
            new ExploreCommand().Build(context),
            new TraceCommand().Build(context),
            new PlanCommand().Build(context),
            new GenerateCommand().Build(context),
        };

        ParseResult parse = root.Parse(args);
        if (parse.Errors.Count > 0)
        {
            foreach (System.CommandLine.Parsing.ParseError parseError in parse.Errors)
            {
                error.WriteLine($"error: {parseError.Message}");
            }

            error.WriteLine("Run 'pathfinder --help' for usage.");
            return ExitCodes.InvalidInput;
        }

        try
        {
            return parse.Invoke(new InvocationConfiguration { Output = output, Error = error, EnableDefaultExceptionHandler = false });
        }
        catch (UserInputException exception)
        {
            error.WriteLine($"error: {exception.Message}");
            return ExitCodes.InvalidInput;
        }
        catch (IOException exception)
        {
            error.WriteLine($"error: {exception.Message}");
            return ExitCodes.InvalidInput;
        }
        catch (UnauthorizedAccessException exception)
        {
            error.WriteLine($"error: {exception.Message}");
            return ExitCodes.InvalidInput;
        }
#pragma warning disable CA1031 // The last line of defence: no stack trace ever reaches the user.
        catch (Exception exception)
#pragma warning restore CA1031
        {
            error.WriteLine($"internal error: {exception.GetType().Name}: {exception.Message}");
            error.WriteLine("This is a defect in PathFinder; please report it with the command and the data that caused it.");
            return ExitCodes.InternalError;
        }
    }
}
