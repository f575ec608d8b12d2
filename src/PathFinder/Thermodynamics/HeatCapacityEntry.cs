using PathFinder.Diagnostics;

namespace PathFinder.Thermodynamics;

/// <summary>The heat-capacity model read for one species of a heat-capacity table.</summary>
/// <param name="SpeciesText">The species exactly as written in the file (surrounding spaces removed); the caller maps it to a species.</param>
/// <param name="Model">The model: one range, or a <see cref="PiecewiseHeatCapacity"/> when the species has several rows.</param>
/// <param name="Location">Where the species' first row starts (its species cell).</param>
public sealed record HeatCapacityEntry(string SpeciesText, IHeatCapacity Model, SourceLocation Location);
