namespace PathFinder.Cli;

/// <summary>Where a command writes: normal output and messages (injected, so tests capture both).</summary>
/// <param name="Out">Results: text tables or JSON.</param>
/// <param name="Error">Diagnostics and error messages.</param>
public sealed record CommandContext(TextWriter Out, TextWriter Error);
