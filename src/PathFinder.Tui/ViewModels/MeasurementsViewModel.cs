namespace PathFinder.Tui.ViewModels;

/// <summary>The measurements table: filtering by text, sorting by any column, and the details of the selected row.</summary>
public sealed class MeasurementsViewModel
{
    private readonly ExplorerViewModel _owner;

    private readonly Dictionary<(int Column, bool Descending), MeasurementRow[]> _sorted = [];
    private MeasurementRow[] _all = [];
    private string? _filteredBy;
    private MeasurementRow[]? _filteredOrder;

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
        Apply();
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
        Apply();
    }

    /// <summary>Moves the sort to the next column (wrapping to data order).</summary>
    public void NextSortColumn()
    {
        SortColumn = SortColumn + 1 >= Headers.Count ? -1 : SortColumn + 1;
        SortDescending = false;
        Apply();
    }

    /// <summary>The position of the row with <paramref name="id"/> in <see cref="Rows"/>, or -1.</summary>
    public int IndexOf(string id)
    {
        for (int i = 0; i < Rows.Count; i++)
        {
            if (Rows[i].Measurement.Id == id)
            {
                return i;
            }
        }

        return -1;
    }

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
            $"{m.Id}  {Quantities.ThermoProperties.Code(m.Property)} = {Display.ValueWithUncertainty(m.Value, m.Uncertainty)} {Quantities.ThermoProperties.CanonicalUnit(m.Property)}  at {Display.Number(m.Temperature, 2)} K  from {m.Source}",
            $"  {m.Location}",
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
    public TableSnapshot Snapshot() => new("Measurements", Headers, Rows.Select(row => row.Cells).ToArray(), [2]);

    /// <summary>Rebuilds every row from the data, the curation and the analysis, then filters and sorts again.</summary>
    internal void Refresh() => SetAllRows(_owner.AllMeasurementRows().ToArray());

    /// <summary>Replaces every row (built off the UI thread after an analysis), then filters and sorts again.</summary>
    internal void SetAllRows(MeasurementRow[] rows)
    {
        _all = rows;
        _sorted.Clear();
        _filteredBy = null;
        Apply();
    }

    /// <summary>Rebuilds the one row of <paramref name="id"/> (after a curation decision), keeping every other row and the sort caches.</summary>
    internal void RefreshRow(string id)
    {
        int at = Array.FindIndex(_all, row => row.Measurement.Id == id);
        if (at < 0)
        {
            Refresh();
            return;
        }

        MeasurementRow updated = _owner.RowOf(_all[at].Measurement);
        var all = (MeasurementRow[])_all.Clone();
        all[at] = updated;
        _all = all;
        // The status column changes for this row: sorted orders by it must be rebuilt; the others only swap the row.
        foreach ((int Column, bool Descending) key in _sorted.Keys.ToArray())
        {
            if (key.Column is 1 or ResidualColumn)
            {
                _sorted.Remove(key);
            }
            else
            {
                _sorted[key] = _sorted[key].Select(row => ReferenceEquals(row.Measurement, updated.Measurement) ? updated : row).ToArray();
            }
        }

        _filteredBy = null;
        Apply();
    }

    /// <summary>Filters the sorted rows; a filter that extends the previous one only searches the rows already shown.</summary>
    private void Apply()
    {
        MeasurementRow[] ordered = Ordered();
        string filter = Filter.Trim().ToLowerInvariant();
        if (filter.Length == 0)
        {
            Rows = ordered;
            _filteredBy = null;
            return;
        }

        IReadOnlyList<MeasurementRow> candidates = _filteredBy is { } previous && ReferenceEquals(_filteredOrder, ordered) && filter.Contains(previous, StringComparison.Ordinal)
            ? Rows
            : ordered;
        var shown = new List<MeasurementRow>();
        foreach (MeasurementRow row in candidates)
        {
            if (row.Matches(filter))
            {
                shown.Add(row);
            }
        }

        Rows = shown;
        _filteredBy = filter;
        _filteredOrder = ordered;
    }

    /// <summary>Every row in the current sort order, sorted once per column and direction and cached until the rows change.</summary>
    private MeasurementRow[] Ordered()
    {
        if (SortColumn < 0)
        {
            return _all;
        }

        if (_sorted.TryGetValue((SortColumn, SortDescending), out MeasurementRow[]? cached))
        {
            return cached;
        }

        Comparison<MeasurementRow> compare = Comparer(SortColumn);
        int[] order = Enumerable.Range(0, _all.Length).ToArray();
        MeasurementRow[] all = _all;
        // Ties keep data order in both directions (a stable sort), so reversing is not just reading backwards.
        Array.Sort(order, SortDescending
            ? (a, b) => compare(all[b], all[a]) is var c && c != 0 ? c : a.CompareTo(b)
            : (a, b) => compare(all[a], all[b]) is var c && c != 0 ? c : a.CompareTo(b));
        MeasurementRow[] sorted = order.Select(i => all[i]).ToArray();
        _sorted[(SortColumn, SortDescending)] = sorted;
        return sorted;
    }

    private static Comparison<MeasurementRow> Comparer(int column) => column switch
    {
        0 => (a, b) => string.CompareOrdinal(a.Measurement.Id, b.Measurement.Id),
        1 => (a, b) => string.CompareOrdinal(a.StatusText, b.StatusText),
        ResidualColumn => (a, b) => Magnitude(a).CompareTo(Magnitude(b)),
        3 => (a, b) => string.CompareOrdinal(Quantities.ThermoProperties.Code(a.Measurement.Property), Quantities.ThermoProperties.Code(b.Measurement.Property)),
        ValueColumn => (a, b) => a.Measurement.Value.CompareTo(b.Measurement.Value),
        5 => (a, b) => string.CompareOrdinal(a.Measurement.Source, b.Measurement.Source),
        _ => (a, b) => string.CompareOrdinal(a.Cells[column], b.Cells[column]),
    };

    // Missing residuals sort below every real one.
    private static double Magnitude(MeasurementRow row) =>
        !row.IsExcluded && row.Assessment?.NormalizedResidual is { } r ? Math.Abs(r) : -1.0;
}
