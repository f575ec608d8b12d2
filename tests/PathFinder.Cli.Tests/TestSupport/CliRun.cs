namespace PathFinder.Cli.Tests.TestSupport;

/// <summary>One run of the command line with captured output.</summary>
/// <param name="ExitCode">The exit code returned.</param>
/// <param name="Out">Everything written to standard output.</param>
/// <param name="Error">Everything written to standard error.</param>
public sealed record CliRun(int ExitCode, string Out, string Error)
{
    /// <summary>Runs <see cref="CliApp.Run"/> with string writers.</summary>
    public static CliRun Of(params string[] args)
    {
        using var output = new StringWriter();
        using var error = new StringWriter();
        int exitCode = CliApp.Run(args, output, error);
        return new CliRun(exitCode, output.ToString(), error.ToString());
    }
}
