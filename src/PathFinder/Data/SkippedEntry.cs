namespace PathFinder.Data;

/// <summary>An entry of a network folder that is not read, with the reason, so that no file is left out without a word.</summary>
/// <param name="Path">The entry's path.</param>
/// <param name="Reason">Why it is not read, in the user's words.</param>
/// <param name="Hint">What to do to have it read, when it should be; may be empty.</param>
public sealed record SkippedEntry(string Path, string Reason, string Hint = "");
