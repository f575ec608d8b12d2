namespace PathFinder.Analysis;

/// <summary>What re-measuring one existing measurement more precisely would do to a target's uncertainty.</summary>
/// <param name="Index">The measurement's position in the model.</param>
/// <param name="Measurement">The measurement.</param>
/// <param name="CurrentUncertainty">The uncertainty used now (family unit).</param>
/// <param name="NewUncertainty">The uncertainty assumed for the new determination, which replaces the old one.</param>
/// <param name="TargetUncertainty">The target's standard uncertainty afterwards.</param>
/// <param name="VarianceReduction">The fraction of the target's variance removed (0..1).</param>
public sealed record RemeasurementSuggestion(
    int Index,
    PreparedMeasurement Measurement,
    double CurrentUncertainty,
    double NewUncertainty,
    double TargetUncertainty,
    double VarianceReduction);
