namespace PathFinder.Diagrams;

/// <summary>Where a network node was drawn, in the SVG's coordinates.</summary>
/// <param name="Id">The node's id.</param>
/// <param name="Kind">The node's kind (decides the outline shape within <paramref name="Box"/>).</param>
/// <param name="Box">Bounding box of the node's outline.</param>
public sealed record PlacedNode(string Id, NetworkNodeKind Kind, DiagramRect Box);
