namespace PathFinder.Analysis;

/// <summary>A measurement the suspect procedure found inconsistent with the rest, with what the rest says instead and the slip that probably caused it.</summary>
/// <param name="Measurement">The measurement.</param>
/// <param name="NormalizedResidual">Its |normalized residual| when the procedure first picked it (signed).</param>
/// <param name="Predicted">What the rest of the network says the value should be (leave-one-out, after the procedure).</param>
/// <param name="PredictedUncertainty">Standard uncertainty of the prediction.</param>
/// <param name="Inflation">How much its uncertainty had to be enlarged in total.</param>
/// <param name="LikelyCause">The slip that explains the gap (within 2 combined standard uncertainties while the value as given does not), or null.</param>
public sealed record SuspectReport(PreparedMeasurement Measurement, double NormalizedResidual, double? Predicted, double? PredictedUncertainty, double Inflation, LikelyCause? LikelyCause = null)
{
    /// <summary>The measured value (as prepared).</summary>
    public double Measured => Measurement.Value;
}
