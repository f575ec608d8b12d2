using PathFinder.Diagnostics;

namespace PathFinder.Curation;

/// <summary>What reading a curation file produced: the decisions that could be read and every problem found.</summary>
/// <param name="Set">The decisions read (rows with errors are left out).</param>
/// <param name="Diagnostics">Errors and warnings with file:line:column.</param>
public sealed record CurationReadResult(CurationSet Set, IReadOnlyList<Diagnostic> Diagnostics)
{
    /// <summary>Whether any error was found.</summary>
    public bool HasErrors => Diagnostics.Any(diagnostic => diagnostic.Severity == Severity.Error);
}
