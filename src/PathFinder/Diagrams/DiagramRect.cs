namespace PathFinder.Diagrams;

/// <summary>An axis-aligned rectangle in SVG user units (y downwards).</summary>
/// <param name="Left">Smallest x.</param>
/// <param name="Top">Smallest y.</param>
/// <param name="Width">Extent along x (not negative).</param>
/// <param name="Height">Extent along y (not negative).</param>
public readonly record struct DiagramRect(double Left, double Top, double Width, double Height)
{
    /// <summary>Largest x.</summary>
    public double Right => Left + Width;

    /// <summary>Largest y.</summary>
    public double Bottom => Top + Height;

    /// <summary>The centre point.</summary>
    public DiagramPoint Center => new(Left + (Width / 2), Top + (Height / 2));

    /// <summary>Creates the rectangle spanning two corners given in any order.</summary>
    public static DiagramRect FromCorners(double x1, double y1, double x2, double y2) =>
        new(Math.Min(x1, x2), Math.Min(y1, y2), Math.Abs(x2 - x1), Math.Abs(y2 - y1));

    /// <summary>The smallest rectangle containing both.</summary>
    public DiagramRect Union(DiagramRect other) =>
        FromCorners(Math.Min(Left, other.Left), Math.Min(Top, other.Top), Math.Max(Right, other.Right), Math.Max(Bottom, other.Bottom));

    /// <summary>True when the interiors overlap by more than <paramref name="tolerance"/> in both directions.</summary>
    public bool Overlaps(DiagramRect other, double tolerance = 0.0) =>
        Left + tolerance < other.Right && other.Left + tolerance < Right &&
        Top + tolerance < other.Bottom && other.Top + tolerance < Bottom;

    /// <summary>True when the point lies inside or within <paramref name="tolerance"/> of the rectangle.</summary>
    public bool Contains(DiagramPoint p, double tolerance = 0.0) =>
        p.X >= Left - tolerance && p.X <= Right + tolerance && p.Y >= Top - tolerance && p.Y <= Bottom + tolerance;

    /// <summary>Distance from the point to the rectangle's outline (zero on the outline, positive inside and outside).</summary>
    public double DistanceToOutline(DiagramPoint p)
    {
        double dx = Math.Max(Math.Max(Left - p.X, p.X - Right), 0.0);
        double dy = Math.Max(Math.Max(Top - p.Y, p.Y - Bottom), 0.0);
        if (dx > 0.0 || dy > 0.0)
        {
            return Math.Sqrt((dx * dx) + (dy * dy));
        }

        return Math.Min(Math.Min(p.X - Left, Right - p.X), Math.Min(p.Y - Top, Bottom - p.Y));
    }
}
