using PathFinder.Curation;

namespace PathFinder.Tui.ViewModels;

/// <summary>One row of the curation screen: a decision, or a row of the file that is not applied (exactly one is set).</summary>
/// <param name="Decision">The decision, or null.</param>
/// <param name="Unapplied">The row kept as written but not applied, or null.</param>
public sealed record CurationLogRow(CurationDecision? Decision, UnappliedCurationRow? Unapplied);
