namespace PathFinder.Diagrams;

/// <summary>A point in SVG user units (x to the right, y downwards).</summary>
/// <param name="X">Horizontal position.</param>
/// <param name="Y">Vertical position, growing downwards.</param>
public readonly record struct DiagramPoint(double X, double Y);
