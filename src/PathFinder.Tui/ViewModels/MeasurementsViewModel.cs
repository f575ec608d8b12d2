namespace PathFinder.Tui.ViewModels;

/// <summary>The measurements table: filtering by text, sorting by any column, and the details of the selected row.</summary>
public sealed class MeasurementsViewModel
{
    private readonly ExplorerViewModel _owner;

    internal MeasurementsViewModel(ExplorerViewModel owner) => _owner = owner;

    /// <summary>The index of the normalized residual column (sorted by magnitude, missing values last).</summary>
    public const int ResidualColumn = 2;

    /// <summary>The index of the value column (sorted numerically).</summary>
    public const int ValueColumn = 4;

    /// <summary>The column headers.</summary>
    public static IReadOnlyList<string> Headers { get; } = ["id", "status", "r", "prop", "value ± u", "source", "equation"];

    /// <summary>Text that every shown row must contain (in any cell, case-insensitive); empty shows all.</summary>
    public string Filter { get; private set; } = "";

    /// <summary>The column sorted by (index into <see cref="Headers"/>); -1 keeps data order.</summary>
    public int SortColumn { get; private set; } = -1;

    /// <summary>Whether the sort is descending.</summary>
    public bool SortDescending { get; private set; }

    /// <summary>The rows shown, filtered and sorted.</summary>
    public IReadOnlyList<MeasurementRow> Rows { get; private set; } = [];

    /// <summary>A one-line description of the sort, e.g. "sorted by r (descending)".</summary>
    public string SortText => SortColumn < 0 ? "data order" : $"sorted by {Headers[SortColumn]}{(SortDescending ? " (descending)" : "")}";

    /// <summary>Sets the filter text.</summary>
    public void SetFilter(string text)
    {
        Filter = text ?? "";
        Refresh();
    }

    /// <summary>Sorts by <paramref name="column"/>; sorting by the same column again reverses the order.</summary>
    public void SortBy(int column)
    {
        if (column < -1 || column >= Headers.Count)
        {
            throw new ArgumentOutOfRangeException(nameof(column));
        }

        SortDescending = column == SortColumn && !SortDescending;
        SortColumn = column;
        Refresh();
    }

    /// <summary>Moves the sort to the next column (wrapping to data order).</summary>
    public void NextSortColumn()
    {
        SortColumn = SortColumn + 1 >= Headers.Count ? -1 : SortColumn + 1;
        SortDescending = false;
        Refresh();
    }

    /// <summary>The position of the row with <paramref name="id"/> in <see cref="Rows"/>, or -1.</summary>
    public int IndexOf(string id) => Rows.ToList().FindIndex(row => row.Measurement.Id == id);

    /// <summary>Detail lines for a row: the equation as written, unit, temperature, location, notes, analysis, exclusion.</summary>
    public IReadOnlyList<string> Details(MeasurementRow? row)
    {
        if (row is null)
        {
            return ["no measurement selected"];
        }

        Measurement m = row.Measurement;
        var lines = new List<string>
        {
            $"{m.Id}  {Quantities.ThermoProperties.Code(m.Property)} = {Display.ValueWithUncertainty(m.Value, m.Uncertainty)} {Quantities.ThermoProperties.CanonicalUnit(m.Property)}  at {Display.Number(m.Temperature, 2)} K  [{m.Location}]",
            $"status {row.StatusText}; r {Display.Z(row.Assessment?.NormalizedResidual)}; rest of network predicts {Display.ValueWithUncertainty(row.Assessment?.LeaveOneOutValue, row.Assessment?.LeaveOneOutUncertainty)}",
        };
        if (row.ExclusionReason is not null)
        {
            lines.Add($"EXCLUDED: {row.ExclusionReason}");
        }

        foreach (KeyValuePair<string, string> note in m.Notes)
        {
            lines.Add($"{note.Key}: {note.Value}");
        }

        return lines;
    }

    /// <summary>The table as shown (for export).</summary>
    public TableSnapshot Snapshot() => new("Measurements", Headers, Rows.Select(row => row.Cells).ToArray());

    internal void Refresh()
    {
        IEnumerable<MeasurementRow> rows = _owner.AllMeasurementRows();
        if (Filter.Trim().Length > 0)
        {
            string filter = Filter.Trim();
            rows = rows.Where(row => row.Cells.Any(cell => cell.Contains(filter, StringComparison.OrdinalIgnoreCase))
                || row.Measurement.EquationText.Contains(filter, StringComparison.OrdinalIgnoreCase));
        }

        if (SortColumn >= 0)
        {
            Comparison<MeasurementRow> compare = Comparer(SortColumn);
            var list = rows.ToList();
            // A stable sort keeps data order among equal keys.
            list = SortDescending
                ? list.Select((row, i) => (row, i)).OrderBy(p => p.row, Comparer<MeasurementRow>.Create((a, b) => compare(b, a))).ThenBy(p => p.i).Select(p => p.row).ToList()
                : list.Select((row, i) => (row, i)).OrderBy(p => p.row, Comparer<MeasurementRow>.Create(compare)).ThenBy(p => p.i).Select(p => p.row).ToList();
            rows = list;
        }

        Rows = rows.ToArray();
    }

    private static Comparison<MeasurementRow> Comparer(int column) => column switch
    {
        ValueColumn => (a, b) => a.Measurement.Value.CompareTo(b.Measurement.Value),
        ResidualColumn => (a, b) => Magnitude(a).CompareTo(Magnitude(b)),
        _ => (a, b) => string.Compare(a.Cells[column], b.Cells[column], StringComparison.Ordinal),
    };

    // Missing residuals sort below every real one.
    private static double Magnitude(MeasurementRow row) =>
        !row.IsExcluded && row.Assessment?.NormalizedResidual is { } r ? Math.Abs(r) : -1.0;
}
