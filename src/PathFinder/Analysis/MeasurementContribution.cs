namespace PathFinder.Analysis;

/// <summary>How one measurement bears on a network estimate: its sensitivity and its share of the estimate's variance.</summary>
/// <param name="Index">The measurement's position in the model (<see cref="ThermoModel.Measurements"/>).</param>
/// <param name="Measurement">The measurement as prepared for the analysis.</param>
/// <param name="Sensitivity">∂(estimate)/∂vᵢ, dimensionless: how much the estimate moves per unit change of the value.</param>
/// <param name="UsedUncertainty">The standard uncertainty the solve used (after the suspect procedure, if it ran), in the row's unit.</param>
/// <param name="VarianceContribution">sᵢ²·uᵢ², this measurement's part of the estimate's variance (unit squared).</param>
/// <param name="Share">VarianceContribution divided by the estimate's variance (0..1; the shares add up to 1).</param>
public sealed record MeasurementContribution(
    int Index,
    PreparedMeasurement Measurement,
    double Sensitivity,
    double UsedUncertainty,
    double VarianceContribution,
    double Share);
