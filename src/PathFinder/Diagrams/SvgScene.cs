using System.Text;

namespace PathFinder.Diagrams;

/// <summary>Collects drawing primitives with their bounds, then writes them shifted onto a fitted SVG canvas.</summary>
/// <remarks>Two passes keep every label on the canvas: first everything is placed in free coordinates and the
/// union of the (conservatively estimated) extents is known; then the document is written translated by a margin.</remarks>
internal sealed class SvgScene
{
    /// <summary>Largest <c>width</c> attribute written, in px (1600); wider drawings are scaled down for display only.</summary>
    public const double MaxDisplayWidth = 1600.0;

    private readonly List<Item> _items = [];

    /// <summary>Union of the extents of all primitives added so far, or null when empty.</summary>
    public DiagramRect? Bounds { get; private set; }

    public void Line(DiagramPoint a, DiagramPoint b, string stroke, double width, string? dash = null, string? cap = null)
    {
        Add(DiagramRect.FromCorners(a.X, a.Y, b.X, b.Y), (sb, dx, dy) =>
            sb.Append("<line x1=\"").Append(C(a.X + dx)).Append("\" y1=\"").Append(C(a.Y + dy))
              .Append("\" x2=\"").Append(C(b.X + dx)).Append("\" y2=\"").Append(C(b.Y + dy)).Append('"')
              .Append(Stroke(stroke, width, dash)).Append(cap is null ? string.Empty : $" stroke-linecap=\"{cap}\"").Append("/>\n"));
    }

    public void Path(IReadOnlyList<PathCommand> commands, string stroke, double width, string? dash = null)
    {
        if (commands.Count == 0)
        {
            return;
        }

        DiagramRect bounds = PointBounds(commands.SelectMany(c => c.Points));
        Add(bounds, (sb, dx, dy) =>
        {
            sb.Append("<path d=\"");
            foreach (PathCommand command in commands)
            {
                sb.Append(command.Letter);
                foreach (DiagramPoint p in command.Points)
                {
                    sb.Append(C(p.X + dx)).Append(',').Append(C(p.Y + dy)).Append(' ');
                }
            }

            sb.Length--;
            sb.Append("\" fill=\"none\"").Append(Stroke(stroke, width, dash)).Append(" stroke-linejoin=\"round\"/>\n");
        });
    }

    public void Rect(DiagramRect r, double radius, string fill, string stroke, double width, string? dash = null)
    {
        Add(r, (sb, dx, dy) =>
        {
            sb.Append("<rect x=\"").Append(C(r.Left + dx)).Append("\" y=\"").Append(C(r.Top + dy))
              .Append("\" width=\"").Append(C(r.Width)).Append("\" height=\"").Append(C(r.Height)).Append('"');
            if (radius > 0.0)
            {
                sb.Append(" rx=\"").Append(C(radius)).Append("\" ry=\"").Append(C(radius)).Append('"');
            }

            sb.Append(" fill=\"").Append(fill).Append('"').Append(Stroke(stroke, width, dash)).Append("/>\n");
        });
    }

    public void Polygon(IReadOnlyList<DiagramPoint> points, string fill, string stroke, double width, string? dash = null)
    {
        Add(PointBounds(points), (sb, dx, dy) =>
        {
            sb.Append("<polygon points=\"");
            sb.Append(string.Join(" ", points.Select(p => C(p.X + dx) + "," + C(p.Y + dy))));
            sb.Append("\" fill=\"").Append(fill).Append('"').Append(Stroke(stroke, width, dash)).Append(" stroke-linejoin=\"round\"/>\n");
        });
    }

    public void Circle(DiagramPoint c, double r, string fill, string stroke, double width)
    {
        Add(new DiagramRect(c.X - r, c.Y - r, 2 * r, 2 * r), (sb, dx, dy) =>
            sb.Append("<circle cx=\"").Append(C(c.X + dx)).Append("\" cy=\"").Append(C(c.Y + dy)).Append("\" r=\"").Append(C(r))
              .Append("\" fill=\"").Append(fill).Append('"').Append(Stroke(stroke, width, null)).Append("/>\n"));
    }

    /// <summary>Plain text; <paramref name="y"/> is the baseline. With <paramref name="vertical"/> the text reads bottom to top.</summary>
    public void Text(double x, double y, string text, double size, TextAnchor anchor, string fill, bool bold = false, bool italic = false, bool vertical = false)
    {
        Formula(x, y, [new FormulaToken(text, FormulaTextRole.Normal)], size, anchor, fill, bold, italic, vertical);
    }

    /// <summary>Formula text with subscripts and superscripts drawn by <c>dy</c> shifts (widely supported, unlike baseline-shift).</summary>
    public void Formula(double x, double y, IReadOnlyList<FormulaToken> tokens, double size, TextAnchor anchor, string fill, bool bold = false, bool italic = false, bool vertical = false)
    {
        if (tokens.Count == 0)
        {
            return;
        }

        double width = TextMetrics.FormulaWidth(tokens, size, bold);
        double start = anchor switch
        {
            TextAnchor.Start => 0.0,
            TextAnchor.Middle => -width / 2,
            _ => -width,
        };
        double ascent = size * (tokens.Any(t => t.Role == FormulaTextRole.Superscript) ? 1.15 : 0.85);
        double descent = size * (tokens.Any(t => t.Role == FormulaTextRole.Subscript) ? 0.45 : 0.25);
        DiagramRect bounds = vertical
            ? new DiagramRect(x - ascent, y - start - width, ascent + descent, width)
            : new DiagramRect(x + start, y - ascent, width, ascent + descent);
        Add(bounds, (sb, dx, dy) =>
        {
            string px = C(x + dx);
            string py = C(y + dy);
            sb.Append("<text x=\"").Append(px).Append("\" y=\"").Append(py).Append('"');
            if (anchor != TextAnchor.Start)
            {
                sb.Append(" text-anchor=\"").Append(anchor == TextAnchor.Middle ? "middle" : "end").Append('"');
            }

            sb.Append(" font-size=\"").Append(C(size)).Append("\" fill=\"").Append(fill).Append('"');
            if (bold)
            {
                sb.Append(" font-weight=\"bold\"");
            }

            if (italic)
            {
                sb.Append(" font-style=\"italic\"");
            }

            if (vertical)
            {
                sb.Append(" transform=\"rotate(-90 ").Append(px).Append(' ').Append(py).Append(")\"");
            }

            sb.Append('>');
            double shift = 0.0;
            foreach (FormulaToken token in tokens)
            {
                double wanted = token.Role switch
                {
                    FormulaTextRole.Subscript => size * 0.3,
                    FormulaTextRole.Superscript => -size * 0.42,
                    _ => 0.0,
                };
                if (token.Role == FormulaTextRole.Normal && Math.Abs(shift) < 1e-9)
                {
                    sb.Append(DiagramText.Escape(token.Text));
                    continue;
                }

                sb.Append("<tspan");
                if (Math.Abs(wanted - shift) > 1e-9)
                {
                    sb.Append(" dy=\"").Append(C(wanted - shift)).Append('"');
                }

                if (token.Role != FormulaTextRole.Normal)
                {
                    sb.Append(" font-size=\"").Append(C(size * TextMetrics.ScriptScale)).Append('"');
                }

                sb.Append('>').Append(DiagramText.Escape(token.Text)).Append("</tspan>");
                shift = wanted;
            }

            sb.Append("</text>\n");
        });
    }

    /// <summary>Moves the most recently added primitive to the back (drawn first, under everything else).</summary>
    public void SendLastToBack()
    {
        if (_items.Count > 1)
        {
            Item last = _items[^1];
            _items.RemoveAt(_items.Count - 1);
            _items.Insert(0, last);
        }
    }

    /// <summary>Writes the document: the scene is shifted by (<paramref name="dx"/>, <paramref name="dy"/>).</summary>
    public string ToSvg(double width, double height, double dx, double dy, string title, string description)
    {
        var sb = new StringBuilder();
        sb.Append("<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n");
        // Display size is capped so that huge drawings open at a usable zoom; the viewBox keeps full resolution.
        double display = Math.Min(1.0, MaxDisplayWidth / width);
        sb.Append("<svg xmlns=\"http://www.w3.org/2000/svg\" version=\"1.1\" width=\"").Append(C(Math.Round(width * display)))
          .Append("\" height=\"").Append(C(Math.Round(height * display))).Append("\" viewBox=\"0 0 ").Append(C(width)).Append(' ').Append(C(height))
          .Append("\" font-family=\"").Append(DiagramText.Escape(DiagramStyle.FontFamily)).Append("\">\n");
        sb.Append("<title>").Append(DiagramText.Escape(title)).Append("</title>\n");
        sb.Append("<desc>").Append(DiagramText.Escape(description)).Append("</desc>\n");
        sb.Append("<rect x=\"0\" y=\"0\" width=\"").Append(C(width)).Append("\" height=\"").Append(C(height)).Append("\" fill=\"#FFFFFF\"/>\n");
        foreach (Item item in _items)
        {
            item.Write(sb, dx, dy);
        }

        sb.Append("</svg>\n");
        return sb.ToString();
    }

    private void Add(DiagramRect bounds, Action<StringBuilder, double, double> write)
    {
        _items.Add(new Item(write));
        Bounds = Bounds is { } b ? b.Union(bounds) : bounds;
    }

    private static DiagramRect PointBounds(IEnumerable<DiagramPoint> points)
    {
        double minX = double.MaxValue, minY = double.MaxValue, maxX = double.MinValue, maxY = double.MinValue;
        foreach (DiagramPoint p in points)
        {
            minX = Math.Min(minX, p.X);
            minY = Math.Min(minY, p.Y);
            maxX = Math.Max(maxX, p.X);
            maxY = Math.Max(maxY, p.Y);
        }

        return DiagramRect.FromCorners(minX, minY, maxX, maxY);
    }

    private static string Stroke(string stroke, double width, string? dash)
    {
        if (stroke == "none")
        {
            return " stroke=\"none\"";
        }

        string s = $" stroke=\"{stroke}\" stroke-width=\"{C(width)}\"";
        return dash is null ? s : s + $" stroke-dasharray=\"{dash}\"";
    }

    private static string C(double value) => DiagramText.Coordinate(value);

    private sealed record Item(Action<StringBuilder, double, double> Write);
}
