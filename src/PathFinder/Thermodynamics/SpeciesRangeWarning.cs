namespace PathFinder.Thermodynamics;

/// <summary>A range warning attached to the species whose heat-capacity data were extrapolated.</summary>
/// <typeparam name="TKey">The caller's opaque species identifier.</typeparam>
/// <param name="Species">The species concerned.</param>
/// <param name="Warning">The interval requested and the model's valid range.</param>
public sealed record SpeciesRangeWarning<TKey>(TKey Species, TemperatureRangeWarning Warning);
