using PathFinder.Diagnostics;
using PathFinder.Tui.Analysis;

namespace PathFinder.Tui.ViewModels;

/// <summary>The sources screen: one row per source and the diagnostics of the selected one.</summary>
public sealed class SourcesViewModel
{
    private readonly ExplorerViewModel _owner;

    internal SourcesViewModel(ExplorerViewModel owner) => _owner = owner;

    /// <summary>The column headers.</summary>
    public static IReadOnlyList<string> Headers { get; } = ["source", "used", "excluded", "suspects", "rms r", "warnings"];

    /// <summary>The source reports shown.</summary>
    public IReadOnlyList<SourceReport> Rows => _owner.Analysis?.Sources ?? [];

    /// <summary>The cells of one row.</summary>
    public IReadOnlyList<string> Cells(SourceReport report)
    {
        ArgumentNullException.ThrowIfNull(report);
        int excluded = _owner.Curated.Excluded.Count(e => e.Measurement.Source == report.Source);
        return
        [
            report.Source,
            Display.Count(report.MeasurementCount),
            Display.Count(excluded),
            Display.Count(report.SuspectCount),
            Display.Number(report.RmsNormalizedResidual, 2),
            Display.Count(report.Diagnostics.Count),
        ];
    }

    /// <summary>The position of <paramref name="source"/> in <see cref="Rows"/>, or -1.</summary>
    public int IndexOf(string source) => Rows.ToList().FindIndex(row => row.Source == source);

    /// <summary>Detail lines for a source: its excluded measurements and its data diagnostics.</summary>
    public IReadOnlyList<string> Details(SourceReport? report)
    {
        if (report is null)
        {
            return ["no source selected"];
        }

        var lines = new List<string>();
        foreach (Curation.ExcludedMeasurement excluded in _owner.Curated.Excluded.Where(e => e.Measurement.Source == report.Source))
        {
            lines.Add($"excluded {excluded.Measurement.Id}: {excluded.Decision.Reason}");
        }

        foreach (Diagnostic diagnostic in report.Diagnostics)
        {
            lines.Add(diagnostic.ToString());
        }

        if (lines.Count == 0)
        {
            lines.Add($"{report.Source}: no data warnings and no exclusions");
        }

        return lines;
    }

    /// <summary>The table as shown (for export).</summary>
    public TableSnapshot Snapshot() => new("Sources", Headers, Rows.Select(Cells).ToArray(), [1, 2, 3, 4, 5]);
}
