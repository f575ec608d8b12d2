namespace PathFinder.Diagrams;

/// <summary>One SVG path command (<c>M</c>, <c>L</c> or <c>C</c>) with its points.</summary>
/// <param name="Letter">The command letter.</param>
/// <param name="Points">One point for M and L, three for C.</param>
internal sealed record PathCommand(char Letter, IReadOnlyList<DiagramPoint> Points)
{
    public static PathCommand MoveTo(DiagramPoint p) => new('M', [p]);

    public static PathCommand LineTo(DiagramPoint p) => new('L', [p]);

    public static PathCommand CubicTo(DiagramPoint c1, DiagramPoint c2, DiagramPoint end) => new('C', [c1, c2, end]);
}
