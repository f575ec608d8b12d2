namespace PathFinder.Diagrams;

/// <summary>Where a network edge was drawn, in the SVG's coordinates.</summary>
/// <param name="From">Source node id.</param>
/// <param name="To">Target node id.</param>
/// <param name="Start">First point of the curve (on the source outline).</param>
/// <param name="Tip">Tip of the arrowhead (on the target outline).</param>
/// <param name="LabelBox">Box of the factor label, or null when none is drawn.</param>
/// <param name="Highlighted">Whether it was drawn as part of the route.</param>
public sealed record PlacedEdge(string From, string To, DiagramPoint Start, DiagramPoint Tip, DiagramRect? LabelBox, bool Highlighted);
