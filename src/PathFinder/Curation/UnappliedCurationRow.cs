using PathFinder.Diagnostics;

namespace PathFinder.Curation;

/// <summary>A row of the curation file that is not a usable decision: kept in the file as written, shown, and not applied.</summary>
/// <param name="Location">Where the row starts.</param>
/// <param name="Text">The line as written (without its line break).</param>
/// <param name="Problem">Why it is not applied.</param>
public sealed record UnappliedCurationRow(SourceLocation Location, string Text, string Problem);
