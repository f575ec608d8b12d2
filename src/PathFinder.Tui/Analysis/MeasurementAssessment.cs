namespace PathFinder.Tui.Analysis;

/// <summary>The analysis of one measurement.</summary>
/// <param name="MeasurementId">The measurement.</param>
/// <param name="Status">The conclusion.</param>
/// <param name="NormalizedResidual">How far the measured value is from what the rest of the network predicts, in standard deviations ((v − prediction)/√(u² + u_pred²)); null when not computed or not checkable.</param>
/// <param name="LeaveOneOutValue">The value the rest of the network predicts for this measurement, canonical unit; null when not computed.</param>
/// <param name="LeaveOneOutUncertainty">The standard uncertainty of that prediction; null when not computed.</param>
public sealed record MeasurementAssessment(
    string MeasurementId,
    MeasurementStatus Status,
    double? NormalizedResidual = null,
    double? LeaveOneOutValue = null,
    double? LeaveOneOutUncertainty = null);
