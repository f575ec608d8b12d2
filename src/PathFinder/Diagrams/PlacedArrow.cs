namespace PathFinder.Diagrams;

/// <summary>A drawn vertical arrow of a level diagram, in SVG coordinates.</summary>
/// <param name="Kind">Step, overall or gap.</param>
/// <param name="Start">Tail of the arrow.</param>
/// <param name="End">Head of the arrow.</param>
/// <param name="Text">Its label lines joined by a space.</param>
public sealed record PlacedArrow(LevelArrowKind Kind, DiagramPoint Start, DiagramPoint End, string Text);
