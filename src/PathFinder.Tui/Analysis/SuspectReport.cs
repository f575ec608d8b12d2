namespace PathFinder.Tui.Analysis;

/// <summary>A measurement suspected of being wrong and what the rest of the network says it should be.</summary>
/// <param name="MeasurementId">The suspect.</param>
/// <param name="NormalizedResidual">Its normalized residual (dimensionless).</param>
/// <param name="LeaveOneOutValue">The value predicted without it, canonical unit; null when it cannot be predicted.</param>
/// <param name="LeaveOneOutUncertainty">The standard uncertainty of that prediction.</param>
/// <param name="Reason">A short explanation (e.g. "closes 2 flagged cycles").</param>
public sealed record SuspectReport(
    string MeasurementId,
    double? NormalizedResidual,
    double? LeaveOneOutValue,
    double? LeaveOneOutUncertainty,
    string Reason);
