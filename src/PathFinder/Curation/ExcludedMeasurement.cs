namespace PathFinder.Curation;

/// <summary>A measurement left out by curation, with the decision that left it out.</summary>
/// <param name="Measurement">The measurement.</param>
/// <param name="Decision">The exclusion in force (its reason and date).</param>
public sealed record ExcludedMeasurement(Measurement Measurement, CurationDecision Decision);
