namespace PathFinder.Cli.Output;

/// <summary>A file a command was asked to write, and whether a read-only file there may be replaced (<c>--force</c>).</summary>
/// <param name="Path">The path given.</param>
/// <param name="Force">Whether a read-only file may be replaced (it keeps its mode).</param>
public sealed record OutputFile(string Path, bool Force = false);
