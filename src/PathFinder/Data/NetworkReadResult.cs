using PathFinder.Chemistry;
using PathFinder.Diagnostics;
using PathFinder.Thermodynamics;

namespace PathFinder.Data;

/// <summary>What reading a network produced: the usable measurements and every problem found.</summary>
/// <param name="Network">The network of measurements that passed validation (rows with errors are left out).</param>
/// <param name="Diagnostics">Errors and warnings, in file and line order.</param>
/// <param name="Files">The measurement files read.</param>
/// <param name="SpeciesFile">The species declaration file used, if any.</param>
/// <param name="HeatCapacityFile">The heat-capacity file beside the network, if any.</param>
/// <param name="HeatCapacities">Heat-capacity models by species, from <paramref name="HeatCapacityFile"/>.</param>
public sealed record NetworkReadResult(
    ReactionNetwork Network,
    IReadOnlyList<Diagnostic> Diagnostics,
    IReadOnlyList<string> Files,
    string? SpeciesFile,
    string? HeatCapacityFile,
    IReadOnlyDictionary<Species, IHeatCapacity> HeatCapacities)
{
    /// <summary>Whether any error was found.</summary>
    public bool HasErrors => Diagnostics.Any(diagnostic => diagnostic.Severity == Severity.Error);

    /// <summary>The errors.</summary>
    public IEnumerable<Diagnostic> Errors => Diagnostics.Where(diagnostic => diagnostic.Severity == Severity.Error);

    /// <summary>The warnings.</summary>
    public IEnumerable<Diagnostic> Warnings => Diagnostics.Where(diagnostic => diagnostic.Severity == Severity.Warning);
}
