namespace PathFinder.Diagrams;

/// <summary>A drawn enthalpy-level or cycle-closure diagram with its geometry.</summary>
/// <param name="Diagram">The SVG.</param>
/// <param name="Levels">Levels in route order (the first is the starting state at 0).</param>
/// <param name="Arrows">Step arrows in order, then the overall arrow (route) or the gap marker (cycle).</param>
/// <param name="Closes">For a cycle: whether |z| is within the threshold; null for a route.</param>
public sealed record LevelDiagram(SvgDiagram Diagram, IReadOnlyList<PlacedLevel> Levels, IReadOnlyList<PlacedArrow> Arrows, bool? Closes);
