namespace PathFinder.Tui.Analysis;

/// <summary>One step of a route: a measurement, the exact factor applied, and the resulting contribution.</summary>
/// <param name="MeasurementId">The measurement used.</param>
/// <param name="Factor">The exact rational factor as text, e.g. "-1", "1/2", "3".</param>
/// <param name="Equation">The measured equation after scaling, as text.</param>
/// <param name="TransformedValue">factor × value in the canonical unit; null when not computed.</param>
public sealed record RouteStep(string MeasurementId, string Factor, string Equation, double? TransformedValue);
