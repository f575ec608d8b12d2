using PathFinder.IO;
using Terminal.Gui.Views;

namespace PathFinder.Tui.Views;

/// <summary>A read-only table over a list of rows whose cells are formatted only when a row is drawn, then kept.</summary>
/// <remarks>
/// The table view asks only for the rows on screen, so a 30 000-row table costs a screenful of formatting per
/// draw, not 30 000 rows of strings per keystroke. The list must not change while the source is shown. Control
/// characters in cells (ids, sources, notes from the data) are shown as <c>\uXXXX</c>, never sent to the terminal.
/// </remarks>
/// <typeparam name="T">The row type.</typeparam>
internal sealed class RowsTableSource<T> : ITableSource
{
    private readonly Func<T, int, IReadOnlyList<string>> _cells;
    private readonly IReadOnlyList<string>?[] _formatted;

    /// <summary>Creates the source; <paramref name="cells"/> gets a row and its position.</summary>
    public RowsTableSource(IReadOnlyList<string> headers, IReadOnlyList<T> rows, Func<T, int, IReadOnlyList<string>> cells)
    {
        ColumnNames = headers.ToArray();
        RowList = rows;
        _cells = cells;
        _formatted = new IReadOnlyList<string>?[rows.Count];
    }

    /// <summary>The rows shown.</summary>
    public IReadOnlyList<T> RowList { get; }

    public string[] ColumnNames { get; }

    public int Columns => ColumnNames.Length;

    public int Rows => RowList.Count;

    public object this[int row, int col]
    {
        get
        {
            IReadOnlyList<string> cells = _formatted[row] ??= _cells(RowList[row], row).Select(cell => TerminalText.Visible(cell)).ToArray();
            return col < cells.Count ? cells[col] : "";
        }
    }
}
