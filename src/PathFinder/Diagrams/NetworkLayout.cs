namespace PathFinder.Diagrams;

/// <summary>The geometry of a drawn network diagram, for checks and for placing overlays.</summary>
/// <param name="Nodes">Node boxes in input order.</param>
/// <param name="Edges">Edge end points in input order.</param>
/// <param name="Legend">Box of the legend, or null when hidden.</param>
public sealed record NetworkLayout(IReadOnlyList<PlacedNode> Nodes, IReadOnlyList<PlacedEdge> Edges, DiagramRect? Legend);
