namespace PathFinder.Analysis;

/// <summary>A measurement the suspect procedure found inconsistent with the rest, with what the rest says instead.</summary>
/// <param name="Measurement">The measurement.</param>
/// <param name="NormalizedResidual">Its |normalized residual| when the procedure first picked it (signed).</param>
/// <param name="Predicted">What the rest of the network says the value should be (leave-one-out, after the procedure).</param>
/// <param name="PredictedUncertainty">Standard uncertainty of the prediction.</param>
/// <param name="Inflation">How much its uncertainty had to be enlarged in total.</param>
public sealed record SuspectReport(PreparedMeasurement Measurement, double NormalizedResidual, double? Predicted, double? PredictedUncertainty, double Inflation)
{
    /// <summary>The measured value (as prepared).</summary>
    public double Measured => Measurement.Value;
}
