using PathFinder.Data;
using PathFinder.Diagnostics;

namespace PathFinder.Cli.Output;

/// <summary>Loads a network for an analysis command: stops with exit code 2 on data errors unless told to skip bad rows.</summary>
/// <remarks>Of the warnings, only those about valid rows that no analysis uses are shown (on standard error); <c>validate</c> shows them all.</remarks>
public static class NetworkLoading
{
    /// <summary>Reads the network; returns null (and the exit code) when the command must stop.</summary>
    /// <param name="path">The network file or folder.</param>
    /// <param name="context">Where to write messages.</param>
    /// <param name="skipInvalid">Proceed with the valid rows when some rows have errors.</param>
    /// <param name="exitCode">The exit code to return when null is returned.</param>
    public static NetworkReadResult? Load(string path, CommandContext context, bool skipInvalid, out int exitCode)
    {
        ArgumentNullException.ThrowIfNull(context);
        NetworkReadResult result = NetworkReader.Read(path);
        exitCode = ExitCodes.Success;
        foreach (Diagnostic unused in result.UnusedRows)
        {
            context.Error.WriteLine(unused.ToString());
        }

        if (!result.HasErrors)
        {
            return result;
        }

        int errors = result.Errors.Count();
        if (skipInvalid && result.Network.Measurements.Count > 0)
        {
            context.Error.WriteLine($"warning: {errors} row(s) with errors were left out (--skip-invalid); run 'pathfinder validate {path}' to see them.");
            return result;
        }

        foreach (Diagnostic diagnostic in result.Errors)
        {
            context.Error.WriteLine(diagnostic.ToString());
        }

        context.Error.WriteLine($"{errors} error(s) in the data: nothing was computed. Fix them, or pass --skip-invalid to use the valid rows only.");
        exitCode = ExitCodes.InvalidInput;
        return null;
    }
}
