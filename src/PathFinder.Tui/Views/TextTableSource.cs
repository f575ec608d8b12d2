using Terminal.Gui.Views;

namespace PathFinder.Tui.Views;

/// <summary>A read-only table source over rows of text.</summary>
internal sealed class TextTableSource : ITableSource
{
    private readonly IReadOnlyList<IReadOnlyList<string>> _rows;

    public TextTableSource(IReadOnlyList<string> headers, IReadOnlyList<IReadOnlyList<string>> rows)
    {
        ColumnNames = headers.ToArray();
        _rows = rows;
    }

    public string[] ColumnNames { get; }

    public int Columns => ColumnNames.Length;

    public int Rows => _rows.Count;

    public object this[int row, int col] => col < _rows[row].Count ? _rows[row][col] : "";
}
