using PathFinder.Diagnostics;

namespace PathFinder.Tui.Analysis;

/// <summary>What the analysis says about one source (group, paper, notebook).</summary>
/// <param name="Source">The source name.</param>
/// <param name="MeasurementCount">Its measurements used in the analysis.</param>
/// <param name="SuspectCount">How many of them are suspects; null when not analysed.</param>
/// <param name="RmsNormalizedResidual">Root mean square of their normalized residuals; null when not computed.</param>
/// <param name="Diagnostics">Data problems found in its rows (warnings from reading).</param>
public sealed record SourceReport(
    string Source,
    int MeasurementCount,
    int? SuspectCount,
    double? RmsNormalizedResidual,
    IReadOnlyList<Diagnostic> Diagnostics);
