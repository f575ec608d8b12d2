using PathFinder.Chemistry;

namespace PathFinder.Graph;

/// <summary>A vertex of the network graph: a species, or a measurement (a reaction node).</summary>
/// <remarks>Equality is by key (<c>s:</c> + species key, or <c>m:</c> + measurement id), so vertices can be rebuilt freely.</remarks>
public sealed class NetworkVertex : IEquatable<NetworkVertex>
{
    private NetworkVertex(string key, Species? species, Measurement? measurement)
    {
        Key = key;
        Species = species;
        Measurement = measurement;
    }

    /// <summary>The identity key.</summary>
    public string Key { get; }

    /// <summary>The species, for a species vertex.</summary>
    public Species? Species { get; }

    /// <summary>The measurement, for a measurement vertex.</summary>
    public Measurement? Measurement { get; }

    /// <summary>Whether this is a species vertex.</summary>
    public bool IsSpecies => Species is not null;

    /// <summary>A species vertex.</summary>
    public static NetworkVertex Of(Species species)
    {
        ArgumentNullException.ThrowIfNull(species);
        return new NetworkVertex("s:" + species.Key, species, null);
    }

    /// <summary>A measurement vertex.</summary>
    public static NetworkVertex Of(Measurement measurement)
    {
        ArgumentNullException.ThrowIfNull(measurement);
        return new NetworkVertex("m:" + measurement.Id, null, measurement);
    }

    /// <inheritdoc/>
    public bool Equals(NetworkVertex? other) => other is not null && Key == other.Key;

    /// <inheritdoc/>
    public override bool Equals(object? obj) => Equals(obj as NetworkVertex);

    /// <inheritdoc/>
    public override int GetHashCode() => StringComparer.Ordinal.GetHashCode(Key);

    /// <inheritdoc/>
    public override string ToString() => Species?.Name ?? Measurement!.Id;
}
