using System.Globalization;
using PathFinder.Curation;

namespace PathFinder.Tui.ViewModels;

/// <summary>The curation screen: rows of the file that are not applied first, then every decision, newest first, marking those not saved yet.</summary>
public sealed class CurationLogViewModel
{
    private readonly ExplorerViewModel _owner;

    internal CurationLogViewModel(ExplorerViewModel owner) => _owner = owner;

    /// <summary>The column headers.</summary>
    public static IReadOnlyList<string> Headers { get; } = ["date", "action", "id", "reason", "saved"];

    /// <summary>The rows: unapplied file rows (as written), then the decisions, newest first.</summary>
    public IReadOnlyList<CurationLogRow> Rows =>
        _owner.UnappliedCurationRows.Select(row => new CurationLogRow(null, row))
            .Concat(_owner.Curation.Decisions.Reverse().Select(decision => new CurationLogRow(decision, null)))
            .ToArray();

    /// <summary>The cells of one row: "UNSAVED" marks decisions made since the last save, "CONFLICT" ids decided differently by someone else meanwhile, "NOT APPLIED" a row of the file that is no usable decision (its text as written and why).</summary>
    public IReadOnlyList<string> Cells(CurationLogRow row)
    {
        ArgumentNullException.ThrowIfNull(row);
        if (row.Decision is not { } decision)
        {
            UnappliedCurationRow unapplied = row.Unapplied!;
            string line = string.Create(CultureInfo.InvariantCulture, $"line {unapplied.Location.Line}");
            return ["", "NOT APPLIED", line, $"{unapplied.Text}  ({unapplied.Problem})", "kept as written"];
        }

        int index = IndexOf(decision);
        bool saved = index >= 0 && index < _owner.SavedCuration.Decisions.Count;
        string state = !saved ? "UNSAVED" : _owner.SaveConflicts.Contains(decision.MeasurementId, StringComparer.Ordinal) ? "CONFLICT" : "saved";
        return [decision.DateText, decision.ActionText, decision.MeasurementId, decision.Reason, state];
    }

    /// <summary>The table as shown (for export).</summary>
    public TableSnapshot Snapshot() => new("Curation", Headers, Rows.Select(Cells).ToArray());

    private int IndexOf(CurationDecision decision)
    {
        IReadOnlyList<CurationDecision> decisions = _owner.Curation.Decisions;
        for (int i = 0; i < decisions.Count; i++)
        {
            if (ReferenceEquals(decisions[i], decision))
            {
                return i;
            }
        }

        return -1;
    }
}
