using PathFinder.Chemistry;
using PathFinder.Thermodynamics;

namespace PathFinder.Analysis;

/// <summary>One species' property at 298.15 K and at another temperature.</summary>
/// <param name="Species">The species.</param>
/// <param name="AtReference">The value at 298.15 K (family unit), or null when the data do not determine it.</param>
/// <param name="AtTemperature">The value at the table's temperature, or null (not determined, or heat capacities missing).</param>
/// <param name="MissingHeatCapacities">Species whose heat capacity the move needs and the data lack (the species, or elements of its formation).</param>
/// <param name="Notes">Extrapolated heat capacities and other remarks.</param>
public sealed record SpeciesAtTemperature(
    Species Species,
    UncertainValue? AtReference,
    UncertainValue? AtTemperature,
    IReadOnlyList<Species> MissingHeatCapacities,
    IReadOnlyList<string> Notes);
