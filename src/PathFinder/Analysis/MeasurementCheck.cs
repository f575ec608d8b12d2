namespace PathFinder.Analysis;

/// <summary>How one measurement agrees with the rest of the network.</summary>
/// <param name="Measurement">The prepared measurement.</param>
/// <param name="Fitted">The least-squares value of its reaction from the whole network (as given, no adjustment).</param>
/// <param name="Residual">Measured minus fitted.</param>
/// <param name="NormalizedResidual">Residual over its own standard deviation; null when the measurement is the only one fixing something (not checkable).</param>
/// <param name="Predicted">Leave-one-out: what the rest of the network says the value should be (after the suspect procedure); null when not checkable.</param>
/// <param name="PredictedUncertainty">Standard uncertainty of <paramref name="Predicted"/>.</param>
/// <param name="IsSuspect">Whether the suspect procedure concluded the measurement is inconsistent with the rest.</param>
/// <param name="FinalUncertainty">The uncertainty after the procedure's enlargements (equal to the measured one when untouched).</param>
public sealed record MeasurementCheck(
    PreparedMeasurement Measurement,
    double Fitted,
    double Residual,
    double? NormalizedResidual,
    double? Predicted,
    double? PredictedUncertainty,
    bool IsSuspect,
    double FinalUncertainty)
{
    /// <summary>Whether any other measurement checks this one.</summary>
    public bool IsCheckable => NormalizedResidual.HasValue;

    /// <summary>(measured − predicted) / √(u² + u_pred²): how far the measurement is from what the rest says, about N(0,1) for sound data; null when not checkable.</summary>
    /// <remarks>Uses the measured (not enlarged) uncertainty, so a suspect keeps its large value.</remarks>
    public double? PredictionZ => Predicted is { } predicted && PredictedUncertainty is { } spread
        ? (Measurement.Value - predicted) / Math.Sqrt((Measurement.Uncertainty * Measurement.Uncertainty) + (spread * spread))
        : null;

    /// <summary>A word for the status, readable without colour: ok, suspect, adjusted, unchecked.</summary>
    public string Status => IsSuspect ? "suspect"
        : FinalUncertainty > Measurement.Uncertainty * (1 + 1e-9) ? "adjusted"
        : IsCheckable ? "ok" : "unchecked";
}
