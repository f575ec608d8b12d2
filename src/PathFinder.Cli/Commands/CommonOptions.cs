using System.CommandLine;

namespace PathFinder.Cli.Commands;

/// <summary>The arguments and options several commands share, so they read and behave the same everywhere.</summary>
public static class CommonOptions
{
    /// <summary>The network argument: a CSV file or a folder of them.</summary>
    public static Argument<string> Network() => new("network") { Description = "A CSV file or a folder of CSV files." };

    /// <summary><c>--target</c>: an equation, or one species for its formation.</summary>
    public static Option<string> Target() =>
        new("--target", "-t") { Description = "The target: a balanced equation, or one species for its formation.", Required = true };

    /// <summary><c>--property</c>: dH (default), dG, dS or dU.</summary>
    public static Option<string> Property() =>
        new("--property", "-p") { Description = "dH (default), dG, dS or dU.", DefaultValueFactory = _ => "dH" };

    /// <summary><c>--json</c>: machine-readable output.</summary>
    public static Option<bool> Json() => new("--json") { Description = "Write the result as JSON." };

    /// <summary><c>--skip-invalid</c>: analyse the valid rows when some rows have errors.</summary>
    public static Option<bool> SkipInvalid() => new("--skip-invalid") { Description = "Use the valid rows when some rows have errors." };
}
