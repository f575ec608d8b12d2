using PathFinder.Diagnostics;

namespace PathFinder.Curation;

/// <summary>What reading a curation file produced: the decisions that could be read, the rows that could not, and every problem found.</summary>
/// <param name="Set">The decisions read (rows that are not usable decisions are left out of it, see <see cref="Unapplied"/>).</param>
/// <param name="Diagnostics">Errors and warnings with file:line:column.</param>
public sealed record CurationReadResult(CurationSet Set, IReadOnlyList<Diagnostic> Diagnostics)
{
    /// <summary>Rows kept in the file as written but not applied (unknown action, no id, an exclusion without reason).</summary>
    public IReadOnlyList<UnappliedCurationRow> Unapplied { get; init; } = [];

    /// <summary>A SHA-256 of the file's bytes as read (hex), or null when there was no file; tells a save whether someone else wrote it since.</summary>
    public string? Fingerprint { get; init; }

    /// <summary>The layout of the file read (header order, separator, line ends), or null when it has no header.</summary>
    internal CurationLayout? Layout { get; init; }

    /// <summary>Whether any error was found (the file as a whole cannot be used: unreadable, or a column missing).</summary>
    /// <remarks>A row that is not a usable decision is a warning, not an error: it is kept and shown, and the other rows apply.</remarks>
    public bool HasErrors => Diagnostics.Any(diagnostic => diagnostic.Severity == Severity.Error);
}
