using PathFinder.Curation;

namespace PathFinder.Tui.ViewModels;

/// <summary>The curation screen: every decision, newest first, marking those not saved yet.</summary>
public sealed class CurationLogViewModel
{
    private readonly ExplorerViewModel _owner;

    internal CurationLogViewModel(ExplorerViewModel owner) => _owner = owner;

    /// <summary>The column headers.</summary>
    public static IReadOnlyList<string> Headers { get; } = ["date", "action", "id", "reason", "saved"];

    /// <summary>The decisions, newest first.</summary>
    public IReadOnlyList<CurationDecision> Rows => _owner.Curation.Decisions.Reverse().ToArray();

    /// <summary>The cells of one row ("UNSAVED" marks decisions made since the last save).</summary>
    public IReadOnlyList<string> Cells(CurationDecision decision)
    {
        ArgumentNullException.ThrowIfNull(decision);
        int index = _owner.Curation.Decisions.ToList().IndexOf(decision);
        bool saved = index >= 0 && index < _owner.SavedCuration.Decisions.Count;
        return [decision.DateText, decision.ActionText, decision.MeasurementId, decision.Reason, saved ? "saved" : "UNSAVED"];
    }

    /// <summary>The table as shown (for export).</summary>
    public TableSnapshot Snapshot() => new("Curation", Headers, Rows.Select(Cells).ToArray());
}
