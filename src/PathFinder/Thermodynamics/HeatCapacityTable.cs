using PathFinder.Diagnostics;

namespace PathFinder.Thermodynamics;

/// <summary>What <see cref="HeatCapacityTableReader"/> read from a heat-capacity table: a model per species text plus every problem found.</summary>
/// <remarks>A species whose rows carry any error has no entry; its errors are in <see cref="Diagnostics"/>.</remarks>
public sealed class HeatCapacityTable
{
    private readonly Dictionary<string, HeatCapacityEntry> _bySpecies;

    /// <summary>Creates the result.</summary>
    /// <param name="entries">The usable species, in order of first appearance.</param>
    /// <param name="diagnostics">All errors and warnings, in file order.</param>
    public HeatCapacityTable(IReadOnlyList<HeatCapacityEntry> entries, IReadOnlyList<Diagnostic> diagnostics)
    {
        ArgumentNullException.ThrowIfNull(entries);
        ArgumentNullException.ThrowIfNull(diagnostics);
        Entries = entries;
        Diagnostics = diagnostics;
        _bySpecies = new Dictionary<string, HeatCapacityEntry>(StringComparer.Ordinal);
        foreach (HeatCapacityEntry entry in entries)
        {
            _bySpecies.TryAdd(entry.SpeciesText, entry);
        }
    }

    /// <summary>The usable species with their models, in order of first appearance in the file.</summary>
    public IReadOnlyList<HeatCapacityEntry> Entries { get; }

    /// <summary>All errors and warnings, in file order.</summary>
    public IReadOnlyList<Diagnostic> Diagnostics { get; }

    /// <summary>Whether any diagnostic is an error.</summary>
    public bool HasErrors => Diagnostics.Any(d => d.Severity == Severity.Error);

    /// <summary>The model for <paramref name="speciesText"/> (ordinal match on the text as written), if it was read without errors.</summary>
    /// <param name="speciesText">The species text as written in the file.</param>
    /// <param name="model">The model, when found.</param>
    public bool TryGetModel(string speciesText, [System.Diagnostics.CodeAnalysis.NotNullWhen(true)] out IHeatCapacity? model)
    {
        ArgumentNullException.ThrowIfNull(speciesText);
        if (_bySpecies.TryGetValue(speciesText.Trim(), out HeatCapacityEntry? entry))
        {
            model = entry.Model;
            return true;
        }

        model = null;
        return false;
    }
}
