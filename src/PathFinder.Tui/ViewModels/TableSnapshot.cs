namespace PathFinder.Tui.ViewModels;

/// <summary>A table as shown on a screen: a title, column headers and rows of text (what export writes).</summary>
/// <param name="Title">The screen or table name.</param>
/// <param name="Headers">Column headers.</param>
/// <param name="Rows">Rows of cells, one cell per header.</param>
public sealed record TableSnapshot(string Title, IReadOnlyList<string> Headers, IReadOnlyList<IReadOnlyList<string>> Rows);
