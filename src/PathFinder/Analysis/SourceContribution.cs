namespace PathFinder.Analysis;

/// <summary>The part of a network estimate's variance that comes from one source (one data file or lab).</summary>
/// <param name="Source">The source name.</param>
/// <param name="Measurements">How many of its measurements have a non-zero sensitivity.</param>
/// <param name="VarianceContribution">The sum of its measurements' variance contributions (unit squared).</param>
/// <param name="Share">VarianceContribution divided by the estimate's variance (0..1).</param>
public sealed record SourceContribution(string Source, int Measurements, double VarianceContribution, double Share);
