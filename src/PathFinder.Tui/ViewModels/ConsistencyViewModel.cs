using PathFinder.Tui.Analysis;

namespace PathFinder.Tui.ViewModels;

/// <summary>The consistency screen: flagged cycles and suspects with leave-one-out predictions, and the link between them.</summary>
public sealed class ConsistencyViewModel
{
    private readonly ExplorerViewModel _owner;

    private (int Number, CycleReport Cycle)[]? _cycles;
    private INetworkAnalysis? _cyclesOf;
    private string? _cyclesFilter;

    internal ConsistencyViewModel(ExplorerViewModel owner) => _owner = owner;

    /// <summary>Headers of the suspects table.</summary>
    public static IReadOnlyList<string> SuspectHeaders { get; } = ["suspect", "r", "measured ± u", "rest predicts ± u", "source", "why"];

    /// <summary>Headers of the cycles table.</summary>
    public static IReadOnlyList<string> CycleHeaders { get; } = ["#", "flag", "closure ± u", "z", "measurements"];

    /// <summary>When set, only the cycles through this measurement are shown.</summary>
    public string? CycleFilter { get; private set; }

    /// <summary>The suspects, worst first.</summary>
    public IReadOnlyList<SuspectReport> Suspects => _owner.Analysis?.Suspects ?? [];

    /// <summary>The cycles shown (all, or those through <see cref="CycleFilter"/>), with their number in the full list.</summary>
    /// <remarks>The list is kept until the analysis or the filter changes, so the table is not rebuilt per keystroke.</remarks>
    public IReadOnlyList<(int Number, CycleReport Cycle)> Cycles
    {
        get
        {
            INetworkAnalysis? analysis = _owner.Analysis;
            if (_cycles is null || !ReferenceEquals(_cyclesOf, analysis) || _cyclesFilter != CycleFilter)
            {
                _cycles = (analysis?.Cycles ?? [])
                    .Select((cycle, i) => (Number: i + 1, Cycle: cycle))
                    .Where(pair => CycleFilter is null || pair.Cycle.MeasurementIds.Contains(CycleFilter, StringComparer.Ordinal))
                    .ToArray();
                _cyclesOf = analysis;
                _cyclesFilter = CycleFilter;
            }

            return _cycles;
        }
    }

    /// <summary>A one-line summary, e.g. "2 of 5 cycles flagged, 1 suspect" or that nothing was analysed.</summary>
    public string Summary
    {
        get
        {
            INetworkAnalysis? analysis = _owner.Analysis;
            if (analysis is null)
            {
                return "analysis not ready";
            }

            string cycles = $"{analysis.Cycles.Count(c => c.Flagged)} of {analysis.Cycles.Count} cycle(s) flagged, {analysis.Suspects.Count} suspect(s)";
            string filter = CycleFilter is null ? "" : $"; showing cycles through {CycleFilter}";
            return $"{cycles}{filter}; analysis: {analysis.Description}";
        }
    }

    /// <summary>Shows only the cycles through <paramref name="measurementId"/> (null shows all).</summary>
    public void ShowCyclesThrough(string? measurementId) => CycleFilter = measurementId;

    /// <summary>The cells of a suspect row.</summary>
    public IReadOnlyList<string> Cells(SuspectReport suspect)
    {
        ArgumentNullException.ThrowIfNull(suspect);
        Measurement? m = _owner.Data.Network.TryGetMeasurement(suspect.MeasurementId, out Measurement found) ? found : null;
        return
        [
            suspect.MeasurementId,
            Display.Z(suspect.NormalizedResidual),
            Display.ValueWithUncertainty(m?.Value, m?.Uncertainty),
            Display.ValueWithUncertainty(suspect.LeaveOneOutValue, suspect.LeaveOneOutUncertainty),
            m?.Source ?? Display.NotAvailable,
            suspect.Reason,
        ];
    }

    /// <summary>The cells of a cycle row ("FLAGGED" or "ok" in words).</summary>
    public static IReadOnlyList<string> Cells(int number, CycleReport cycle)
    {
        ArgumentNullException.ThrowIfNull(cycle);
        string members = string.Join(" ", cycle.MeasurementIds.Select((id, i) => i < cycle.Factors.Count ? $"{cycle.Factors[i]}×{id}" : id));
        return
        [
            number.ToString(System.Globalization.CultureInfo.InvariantCulture),
            cycle.Flagged ? "FLAGGED" : "ok",
            Display.ValueWithUncertainty(cycle.Residual, cycle.Uncertainty),
            Display.Z(cycle.Z),
            members,
        ];
    }

    /// <summary>The source of a suspect (for jumping to the sources screen), or null.</summary>
    public string? SourceOf(string measurementId) =>
        _owner.Data.Network.TryGetMeasurement(measurementId, out Measurement m) ? m.Source : null;

    /// <summary>The suspects table as shown (for export).</summary>
    public TableSnapshot Snapshot() => new("Suspects", SuspectHeaders, Suspects.Select(Cells).ToArray(), [1]);

    /// <summary>The cycles table as shown (for export).</summary>
    public TableSnapshot CycleSnapshot() => new("Cycles", CycleHeaders, Cycles.Select(pair => Cells(pair.Number, pair.Cycle)).ToArray(), [0, 3]);
}
