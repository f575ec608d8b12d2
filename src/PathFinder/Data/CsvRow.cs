using PathFinder.Diagnostics;

namespace PathFinder.Data;

/// <summary>One data row of a CSV file with the location of each field.</summary>
/// <param name="File">The file path as given.</param>
/// <param name="Line">1-based line where the row starts.</param>
/// <param name="Fields">The field texts.</param>
/// <param name="Columns">1-based character column where each field's content starts.</param>
public sealed record CsvRow(string File, int Line, IReadOnlyList<string> Fields, IReadOnlyList<int> Columns)
{
    /// <summary>The location of field <paramref name="index"/> (or of the row, when the field is missing).</summary>
    public SourceLocation LocationOf(int index, string? field = null) =>
        index >= 0 && index < Columns.Count
            ? new SourceLocation(File, Line, Columns[index], field)
            : new SourceLocation(File, Line, Columns.Count > 0 ? Columns[^1] : 1, field);

    /// <summary>The field text, trimmed, or empty when the row is shorter.</summary>
    public string FieldOrEmpty(int index) => index >= 0 && index < Fields.Count ? Fields[index].Trim() : "";
}
