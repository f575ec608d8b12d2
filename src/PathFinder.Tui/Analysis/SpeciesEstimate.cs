using PathFinder.Chemistry;
using PathFinder.Quantities;

namespace PathFinder.Tui.Analysis;

/// <summary>The network's best estimate of one property of one species (e.g. its standard enthalpy of formation).</summary>
/// <param name="Species">The species.</param>
/// <param name="Property">The property estimated (a formation property).</param>
/// <param name="Value">The best estimate in the canonical unit; null when not computed or not determined.</param>
/// <param name="Uncertainty">Its standard uncertainty; null when not computed.</param>
/// <param name="MeasurementCount">How many measurements involve the species.</param>
public sealed record SpeciesEstimate(Species Species, ThermoProperty Property, double? Value, double? Uncertainty, int MeasurementCount);
