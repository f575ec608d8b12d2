namespace PathFinder.Diagrams;

/// <summary>A drawn level of a level diagram, in SVG coordinates.</summary>
/// <param name="State">The state's label as given.</param>
/// <param name="Value">Cumulative value of the level (0 for the starting state).</param>
/// <param name="Y">Height of the level line (y grows downwards, so larger values have smaller y).</param>
/// <param name="Left">Left end of the level line.</param>
/// <param name="Right">Right end of the level line.</param>
public sealed record PlacedLevel(string State, double Value, double Y, double Left, double Right);
