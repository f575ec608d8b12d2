namespace PathFinder.Diagrams;

/// <summary>A node of a network diagram.</summary>
/// <param name="Id">Unique key used by edges (not drawn).</param>
/// <param name="Kind">Species, measurement or target.</param>
/// <param name="Label">Main text; formula markup for species (<c>SO4^2-(aq)</c>), plain text otherwise (<c>m3</c>).</param>
/// <param name="SubLabel">Optional second, smaller line such as <c>ΔH = −890.3 ± 0.4 kJ/mol</c>; plain text.</param>
/// <param name="Flags">Highlighted, suspect and/or excluded.</param>
public sealed record NetworkNode(string Id, NetworkNodeKind Kind, string Label, string? SubLabel = null, NetworkNodeFlags Flags = NetworkNodeFlags.None)
{
    /// <summary>Creates a species node whose id is its label.</summary>
    public static NetworkNode Species(string formula, NetworkNodeFlags flags = NetworkNodeFlags.None) =>
        new(formula, NetworkNodeKind.Species, formula, null, flags);

    /// <summary>Creates a measurement node whose id is its label.</summary>
    public static NetworkNode Measurement(string id, string? subLabel = null, NetworkNodeFlags flags = NetworkNodeFlags.None) =>
        new(id, NetworkNodeKind.Measurement, id, subLabel, flags);

    /// <summary>Creates a target node whose id is its label.</summary>
    public static NetworkNode Target(string id, string? subLabel = null, NetworkNodeFlags flags = NetworkNodeFlags.None) =>
        new(id, NetworkNodeKind.Target, id, subLabel, flags);

    /// <summary>True when <paramref name="flag"/> is set.</summary>
    public bool Has(NetworkNodeFlags flag) => (Flags & flag) == flag;
}
