using PathFinder.Chemistry;
using PathFinder.Quantities;

namespace PathFinder;

/// <summary>A thermochemical network: species (nodes) and the measurements (edges) that connect them.</summary>
/// <remarks>Immutable; filtering returns a new network sharing the same species and measurement objects.</remarks>
public sealed class ReactionNetwork
{
    private readonly Dictionary<string, Measurement> _byId;
    private readonly Dictionary<Species, int> _speciesIndex;

    /// <summary>Creates a network from measurements; the species are those the equations mention, in order of first use.</summary>
    public ReactionNetwork(string name, IEnumerable<Measurement> measurements)
    {
        ArgumentNullException.ThrowIfNull(name);
        ArgumentNullException.ThrowIfNull(measurements);
        Name = name;
        Measurements = measurements.ToArray();
        _byId = new Dictionary<string, Measurement>(StringComparer.Ordinal);
        foreach (Measurement measurement in Measurements)
        {
            if (!_byId.TryAdd(measurement.Id, measurement))
            {
                throw new ArgumentException($"measurement id '{measurement.Id}' is used twice", nameof(measurements));
            }
        }

        var species = new List<Species>();
        _speciesIndex = new Dictionary<Species, int>();
        foreach (Measurement measurement in Measurements)
        {
            foreach (EquationTerm term in measurement.Equation.Terms)
            {
                if (_speciesIndex.TryAdd(term.Species, species.Count))
                {
                    species.Add(term.Species);
                }
            }
        }

        Species = species;
        Sources = Measurements.Select(measurement => measurement.Source).Distinct(StringComparer.Ordinal).ToArray();
    }

    /// <summary>A name for the network (its file or folder name).</summary>
    public string Name { get; }

    /// <summary>All measurements, in data order.</summary>
    public IReadOnlyList<Measurement> Measurements { get; }

    /// <summary>All species mentioned, in order of first use.</summary>
    public IReadOnlyList<Species> Species { get; }

    /// <summary>The distinct sources, in order of first use.</summary>
    public IReadOnlyList<string> Sources { get; }

    /// <summary>The properties present, in enum order.</summary>
    public IReadOnlyList<ThermoProperty> Properties =>
        Measurements.Select(measurement => measurement.Property).Distinct().Order().ToArray();

    /// <summary>Finds a measurement by id.</summary>
    public bool TryGetMeasurement(string id, out Measurement measurement) => _byId.TryGetValue(id, out measurement!);

    /// <summary>The measurement with <paramref name="id"/>; throws <see cref="KeyNotFoundException"/> if absent.</summary>
    public Measurement this[string id] => _byId[id];

    /// <summary>The position of a species in <see cref="Species"/>, or -1.</summary>
    public int IndexOf(Species species) => _speciesIndex.TryGetValue(species, out int index) ? index : -1;

    /// <summary>Finds a species by its key, its name as written, or its formula with state (e.g. <c>CH4(g)</c>).</summary>
    public Species? FindSpecies(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        Species? byName = Species.FirstOrDefault(species => species.Name == text || species.Key == text || species.Label == text);
        if (byName is not null)
        {
            return byName;
        }

        return SpeciesParser.Parse(text).TryGetValue(out Species? parsed) && _speciesIndex.ContainsKey(parsed)
            ? Species[_speciesIndex[parsed]]
            : null;
    }

    /// <summary>A network with only the measurements that satisfy <paramref name="keep"/>.</summary>
    public ReactionNetwork Where(Func<Measurement, bool> keep) => new(Name, Measurements.Where(keep));

    /// <summary>The measurements of one property.</summary>
    public IReadOnlyList<Measurement> MeasurementsOf(ThermoProperty property) =>
        Measurements.Where(measurement => measurement.Property == property).ToArray();
}
