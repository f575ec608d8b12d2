using PathFinder.Chemistry;
using PathFinder.Quantities;

namespace PathFinder.Data;

/// <summary>Counts that describe a network at a glance: measurements, species, sources, properties, elements.</summary>
/// <param name="MeasurementCount">Usable measurements.</param>
/// <param name="SpeciesCount">Distinct species mentioned, including reference states.</param>
/// <param name="MeasurementsBySource">Source name to number of measurements, in order of first use.</param>
/// <param name="MeasurementsByProperty">Property to number of measurements.</param>
/// <param name="Elements">Element symbols present, alphabetical.</param>
/// <param name="ReferenceStatesUsed">Element reference species (and conventional zeros) the equations use.</param>
public sealed record NetworkSummary(
    int MeasurementCount,
    int SpeciesCount,
    IReadOnlyList<KeyValuePair<string, int>> MeasurementsBySource,
    IReadOnlyList<KeyValuePair<ThermoProperty, int>> MeasurementsByProperty,
    IReadOnlyList<string> Elements,
    IReadOnlyList<Species> ReferenceStatesUsed)
{
    /// <summary>Summarises a network.</summary>
    public static NetworkSummary Of(ReactionNetwork network)
    {
        ArgumentNullException.ThrowIfNull(network);
        var bySource = network.Sources
            .Select(source => new KeyValuePair<string, int>(source, network.Measurements.Count(measurement => measurement.Source == source)))
            .ToArray();
        var byProperty = network.Measurements
            .GroupBy(measurement => measurement.Property)
            .OrderBy(group => group.Key)
            .Select(group => new KeyValuePair<ThermoProperty, int>(group.Key, group.Count()))
            .ToArray();
        string[] elements = network.Species
            .SelectMany(species => species.Formula.Composition.Keys)
            .Distinct(StringComparer.Ordinal)
            .Order(StringComparer.Ordinal)
            .ToArray();
        Species[] references = network.Species
            .Where(ReferenceStates.HasZeroFormationProperties)
            .OrderBy(species => species.Name, StringComparer.Ordinal)
            .ToArray();
        return new NetworkSummary(network.Measurements.Count, network.Species.Count, bySource, byProperty, elements, references);
    }
}
