namespace PathFinder.Tui.ViewModels;

/// <summary>A table as shown on a screen: a title, column headers and rows of text (what export writes).</summary>
/// <param name="Title">The screen or table name.</param>
/// <param name="Headers">Column headers.</param>
/// <param name="Rows">Rows of cells, one cell per header.</param>
/// <param name="NumberColumns">
/// The columns that hold numbers (counts, z): CSV export writes their cells as numbers; every other cell is text, which
/// CSV export guards against formula evaluation. None when null.
/// </param>
public sealed record TableSnapshot(string Title, IReadOnlyList<string> Headers, IReadOnlyList<IReadOnlyList<string>> Rows, IReadOnlyList<int>? NumberColumns = null)
{
    /// <summary>Whether column <paramref name="column"/> holds numbers.</summary>
    public bool IsNumberColumn(int column) => NumberColumns is not null && NumberColumns.Contains(column);
}
