namespace PathFinder.Diagnostics;

/// <summary>A place in an input file: path, 1-based line and 1-based column (0 when not known).</summary>
/// <param name="File">The path as the user gave it (or a file name).</param>
/// <param name="Line">1-based line number; 0 when the problem concerns the whole file.</param>
/// <param name="Column">1-based column (character position in the line); 0 when not known.</param>
/// <param name="Field">The CSV column name concerned, when there is one.</param>
public readonly record struct SourceLocation(string File, int Line = 0, int Column = 0, string? Field = null)
{
    /// <summary>Formats as <c>file:line:column</c>, dropping parts that are not known.</summary>
    public override string ToString()
    {
        if (Line <= 0)
        {
            return File;
        }

        return Column > 0 ? $"{File}:{Line}:{Column}" : $"{File}:{Line}";
    }

    /// <summary>The same place moved right by <paramref name="offset"/> characters (for positions inside a field).</summary>
    public SourceLocation Shift(int offset) => Column > 0 ? this with { Column = Column + offset } : this;
}
