namespace PathFinder.Diagrams;

/// <summary>What a node of a network diagram stands for; each kind has its own shape.</summary>
public enum NetworkNodeKind
{
    /// <summary>A chemical species in a state (pill-shaped box; the label is formula markup).</summary>
    Species,

    /// <summary>A measured reaction (square-cornered box; the label is plain text such as a measurement id).</summary>
    Measurement,

    /// <summary>The target reaction whose value is sought (hexagon; plain-text label).</summary>
    Target,
}
