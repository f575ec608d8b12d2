namespace PathFinder.Diagrams;

/// <summary>Input model of a network diagram: species, measurements and the target, joined by reactant and product edges.</summary>
/// <param name="Title">Heading printed above the drawing.</param>
/// <param name="Nodes">Nodes with unique ids; drawn in a deterministic layered layout.</param>
/// <param name="Edges">Edges between node ids; parallel edges are allowed.</param>
public sealed record NetworkDiagram(string Title, IReadOnlyList<NetworkNode> Nodes, IReadOnlyList<NetworkEdge> Edges);
