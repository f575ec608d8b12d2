using Microsoft.Msagl.Core;
using Microsoft.Msagl.Core.Geometry;
using Microsoft.Msagl.Core.Geometry.Curves;
using Microsoft.Msagl.Core.Layout;
using Microsoft.Msagl.Layout.Layered;
using Microsoft.Msagl.Miscellaneous;

namespace PathFinder.Diagrams;

/// <summary>Draws a <see cref="NetworkDiagram"/> as SVG with MSAGL's layered (Sugiyama) layout.</summary>
/// <remarks>
/// Species are pill-shaped, measurements square-cornered boxes, the target a hexagon. A highlighted route is drawn with
/// thick blue lines and tinted fills; suspect nodes get a dashed vermillion outline and a "!" badge; excluded nodes a
/// dotted grey outline, grey text and an "excluded" tag. A legend explains all of it. Networks larger than
/// <see cref="NetworkDiagramOptions.MaxNodes"/> are refused (see <see cref="NetworkDiagramResult.RefusalMessage"/>).
/// Above 150 nodes the layers are ordered with 2 median passes instead of MSAGL's 24, which halves the layout time of
/// large neighbourhoods at the cost of a few more edge crossings. The layout is deterministic: the same diagram gives
/// the same SVG on every run (MSAGL's ordering uses a fixed random seed).
/// </remarks>
public static class NetworkDiagramRenderer
{
    private const double PadX = 10.0;
    private const double PadY = 6.0;
    private const double BadgeRoom = 18.0;
    private const double ArrowLength = 9.0;

    /// <summary>Above this many nodes the layout orders layers with fewer passes (faster, a few more crossings).</summary>
    internal const int FastOrderingAbove = 150;

    /// <summary>Lays out and draws the network; refuses (without laying out) when it has more nodes than allowed.</summary>
    /// <exception cref="ArgumentException">Duplicate node ids or edges naming unknown nodes.</exception>
    /// <exception cref="OperationCanceledException">When <paramref name="cancellationToken"/> fires during layout.</exception>
    public static NetworkDiagramResult Render(NetworkDiagram diagram, NetworkDiagramOptions? options = null, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(diagram);
        options ??= new NetworkDiagramOptions();
        var index = new Dictionary<string, int>(StringComparer.Ordinal);
        for (int i = 0; i < diagram.Nodes.Count; i++)
        {
            if (!index.TryAdd(diagram.Nodes[i].Id, i))
            {
                throw new ArgumentException($"Node id '{diagram.Nodes[i].Id}' is used twice.", nameof(diagram));
            }
        }

        foreach (NetworkEdge edge in diagram.Edges)
        {
            if (!index.ContainsKey(edge.From) || !index.ContainsKey(edge.To))
            {
                throw new ArgumentException($"Edge {edge.From} → {edge.To} names a node that is not in the diagram.", nameof(diagram));
            }
        }

        if (diagram.Nodes.Count > options.MaxNodes)
        {
            return NetworkDiagramResult.Refused(
                $"The network has {diagram.Nodes.Count} nodes; diagrams are limited to {options.MaxNodes} nodes " +
                "(beyond that the layout takes seconds and the picture is unreadable). Draw a narrower focus instead: " +
                "one route to the target, one cycle, or the depth-1 neighbourhood of a species.");
        }

        cancellationToken.ThrowIfCancellationRequested();
        var contents = diagram.Nodes.Select(NodeContent.For).ToList();
        var graph = new GeometryGraph();
        var msaglNodes = new List<Node>(diagram.Nodes.Count);
        for (int i = 0; i < diagram.Nodes.Count; i++)
        {
            var node = new Node(Outline(diagram.Nodes[i].Kind, contents[i].Width, contents[i].Height), i);
            graph.Nodes.Add(node);
            msaglNodes.Add(node);
        }

        var msaglEdges = new List<Edge>(diagram.Edges.Count);
        foreach (NetworkEdge edge in diagram.Edges)
        {
            Node source = msaglNodes[index[edge.From]];
            Node target = msaglNodes[index[edge.To]];
            string? label = edge.VisibleLabel;
            Edge e = label is null
                ? new Edge(source, target)
                : new Edge(source, target, TextMetrics.Width(label, DiagramStyle.SmallSize) + 8.0, DiagramStyle.SmallSize + 6.0, 1.0);
            e.EdgeGeometry.TargetArrowhead = new Arrowhead { Length = ArrowLength };
            graph.Edges.Add(e);
            msaglEdges.Add(e);
        }

        var scene = new SvgScene();
        var placedNodes = new List<PlacedNode>();
        var placedEdges = new List<PlacedEdge>();
        double drawingWidth = 0.0;
        double drawingHeight = 0.0;
        if (diagram.Nodes.Count == 0)
        {
            scene.Text(0.0, 20.0, "No nodes to draw.", DiagramStyle.LabelSize, TextAnchor.Start, DiagramStyle.Muted, italic: true);
            drawingHeight = 28.0;
            drawingWidth = TextMetrics.Width("No nodes to draw.", DiagramStyle.LabelSize);
        }
        else
        {
            RunLayout(graph, options, cancellationToken);
            graph.UpdateBoundingBox();
            Rectangle bb = graph.BoundingBox;
            DiagramPoint Map(Point p) => new(p.X - bb.Left, bb.Top - p.Y);
            drawingWidth = bb.Width;
            drawingHeight = bb.Height;

            for (int i = 0; i < diagram.Edges.Count; i++)
            {
                NetworkEdge edge = diagram.Edges[i];
                NetworkNode from = diagram.Nodes[index[edge.From]];
                NetworkNode to = diagram.Nodes[index[edge.To]];
                bool highlighted = edge.Highlighted ?? (from.Has(NetworkNodeFlags.Highlighted) && to.Has(NetworkNodeFlags.Highlighted));
                bool faded = from.Has(NetworkNodeFlags.Excluded) || to.Has(NetworkNodeFlags.Excluded);
                placedEdges.Add(DrawEdge(scene, msaglEdges[i], edge, highlighted, faded, Map));
            }

            for (int i = 0; i < diagram.Nodes.Count; i++)
            {
                DiagramPoint c = Map(msaglNodes[i].Center);
                NodeContent content = contents[i];
                var box = new DiagramRect(c.X - (content.Width / 2), c.Y - (content.Height / 2), content.Width, content.Height);
                DrawNode(scene, diagram.Nodes[i], content, box);
                placedNodes.Add(new PlacedNode(diagram.Nodes[i].Id, diagram.Nodes[i].Kind, box));
            }

            for (int i = 0; i < placedEdges.Count; i++)
            {
                DrawEdgeLabel(scene, placedEdges[i], diagram.Edges[i]);
            }
        }

        // Title above, legend and caption below the drawing.
        double contentWidth = Math.Max(drawingWidth, 560.0);
        scene.Text(0.0, -22.0, diagram.Title, DiagramStyle.TitleSize, TextAnchor.Start, DiagramStyle.Ink, bold: true);
        double y = drawingHeight + 22.0;
        DiagramRect? legend = null;
        if (options.ShowLegend)
        {
            legend = DrawLegend(scene, 0.0, y, contentWidth);
            y = legend.Value.Bottom + 8.0;
        }

        scene.Text(0.0, y + DiagramStyle.CaptionSize, options.Caption, DiagramStyle.CaptionSize, TextAnchor.Start, DiagramStyle.Muted, italic: true);

        DiagramRect bounds = scene.Bounds!.Value;
        double dx = DiagramStyle.Margin - bounds.Left;
        double dy = DiagramStyle.Margin - bounds.Top;
        double width = Math.Ceiling(bounds.Width + (2 * DiagramStyle.Margin));
        double height = Math.Ceiling(bounds.Height + (2 * DiagramStyle.Margin));
        string svg = scene.ToSvg(width, height, dx, dy, diagram.Title, options.Caption);

        DiagramRect Shift(DiagramRect r) => r with { Left = r.Left + dx, Top = r.Top + dy };
        DiagramPoint ShiftPoint(DiagramPoint p) => new(p.X + dx, p.Y + dy);
        var layout = new NetworkLayout(
            placedNodes.Select(n => n with { Box = Shift(n.Box) }).ToList(),
            placedEdges.Select(e => e with { Start = ShiftPoint(e.Start), Tip = ShiftPoint(e.Tip), LabelBox = e.LabelBox is { } l ? Shift(l) : null }).ToList(),
            legend is { } lg ? Shift(lg) : null);
        return NetworkDiagramResult.Rendered(new SvgDiagram(svg, width, height), layout);
    }

    private static void RunLayout(GeometryGraph graph, NetworkDiagramOptions options, CancellationToken cancellationToken)
    {
        var settings = new SugiyamaLayoutSettings
        {
            NodeSeparation = options.NodeSeparation,
            LayerSeparation = options.LayerSeparation,
        };
        settings.EdgeRoutingSettings.EdgeRoutingMode = Microsoft.Msagl.Core.Routing.EdgeRoutingMode.SugiyamaSplines;
        if (graph.Nodes.Count > FastOrderingAbove)
        {
            // Crossing reduction dominates the layered layout's time; two median passes instead of 24 keep a
            // 300-node neighbourhood near 1 s (see DiagramBenchmark). Such drawings are overviews, not figures.
            settings.MaxNumberOfPassesInOrdering = 2;
        }

        if (options.Direction == LayoutDirection.LeftToRight)
        {
            settings.Transformation = PlaneTransformation.Rotation(Math.PI / 2);
        }

        var cancel = new CancelToken();
        using (cancellationToken.Register(() => cancel.Canceled = true))
        {
            LayoutHelpers.CalculateLayout(graph, settings, cancel);
        }

        cancellationToken.ThrowIfCancellationRequested();
    }

    private static ICurve Outline(NetworkNodeKind kind, double w, double h)
    {
        var origin = new Point(0.0, 0.0);
        switch (kind)
        {
            case NetworkNodeKind.Species:
                double r = (h / 2) - 0.01;
                return CurveFactory.CreateRectangleWithRoundedCorners(w, h, r, r, origin);
            case NetworkNodeKind.Target:
                var polyline = new Polyline { Closed = true };
                foreach (DiagramPoint p in Hexagon(new DiagramRect(-w / 2, -h / 2, w, h)))
                {
                    polyline.AddPoint(new Point(p.X, p.Y));
                }

                return polyline;
            default:
                return CurveFactory.CreateRectangle(w, h, origin);
        }
    }

    internal static IReadOnlyList<DiagramPoint> Hexagon(DiagramRect r)
    {
        double tip = r.Height * 0.35;
        double cy = r.Top + (r.Height / 2);
        return
        [
            new(r.Left, cy), new(r.Left + tip, r.Top), new(r.Right - tip, r.Top),
            new(r.Right, cy), new(r.Right - tip, r.Bottom), new(r.Left + tip, r.Bottom),
        ];
    }

    private static PlacedEdge DrawEdge(SvgScene scene, Edge e, NetworkEdge model, bool highlighted, bool faded, Func<Point, DiagramPoint> map)
    {
        string colour = highlighted ? DiagramStyle.Blue : faded ? DiagramStyle.Faint : DiagramStyle.Muted;
        double width = highlighted ? 2.8 : 1.2;
        string? dash = faded && !highlighted ? "3 3" : null;
        ICurve? curve = e.Curve;
        DiagramPoint start;
        DiagramPoint end;
        var commands = new List<PathCommand>();
        if (curve is null)
        {
            start = map(e.Source.Center);
            end = map(e.Target.Center);
            commands.Add(PathCommand.MoveTo(start));
            commands.Add(PathCommand.LineTo(end));
        }
        else
        {
            start = map(curve.Start);
            end = map(curve.End);
            commands.Add(PathCommand.MoveTo(start));
            AppendCurve(commands, curve, map);
        }

        scene.Path(commands, colour, width, dash);
        Arrowhead? head = e.EdgeGeometry.TargetArrowhead;
        DiagramPoint tip = head is null ? end : map(head.TipPosition);
        double dx = tip.X - end.X;
        double dy = tip.Y - end.Y;
        double length = Math.Sqrt((dx * dx) + (dy * dy));
        if (length > 1e-6)
        {
            double half = highlighted ? 5.0 : 4.0;
            double nx = -dy / length * half;
            double ny = dx / length * half;
            scene.Polygon([tip, new DiagramPoint(end.X + nx, end.Y + ny), new DiagramPoint(end.X - nx, end.Y - ny)], colour, colour, 0.8);
        }

        DiagramRect? labelBox = null;
        string? label = model.VisibleLabel;
        if (label is not null && e.Label is not null)
        {
            DiagramPoint c = map(e.Label.Center);
            double w = TextMetrics.Width(label, DiagramStyle.SmallSize) + 8.0;
            double h = DiagramStyle.SmallSize + 6.0;
            labelBox = new DiagramRect(c.X - (w / 2), c.Y - (h / 2), w, h);
        }

        return new PlacedEdge(model.From, model.To, start, tip, labelBox, highlighted);
    }

    private static void AppendCurve(List<PathCommand> commands, ICurve curve, Func<Point, DiagramPoint> map)
    {
        switch (curve)
        {
            case Curve composite:
                foreach (ICurve segment in composite.Segments)
                {
                    AppendCurve(commands, segment, map);
                }

                break;
            case LineSegment line:
                commands.Add(PathCommand.LineTo(map(line.End)));
                break;
            case CubicBezierSegment bezier:
                commands.Add(PathCommand.CubicTo(map(bezier.B(1)), map(bezier.B(2)), map(bezier.B(3))));
                break;
            case Polyline polyline:
                foreach (Point p in polyline.Skip(1))
                {
                    commands.Add(PathCommand.LineTo(map(p)));
                }

                break;
            default:
                const int samples = 24;
                for (int k = 1; k <= samples; k++)
                {
                    double t = curve.ParStart + ((curve.ParEnd - curve.ParStart) * k / samples);
                    commands.Add(PathCommand.LineTo(map(curve[t])));
                }

                break;
        }
    }

    private static void DrawEdgeLabel(SvgScene scene, PlacedEdge placed, NetworkEdge model)
    {
        if (placed.LabelBox is not { } box || model.VisibleLabel is not { } label)
        {
            return;
        }

        string colour = placed.Highlighted ? DiagramStyle.Blue : DiagramStyle.Ink;
        scene.Rect(box, 3.0, "#FFFFFF", placed.Highlighted ? DiagramStyle.Blue : DiagramStyle.Faint, 0.8);
        scene.Text(box.Center.X, box.Top + box.Height - 4.5, label, DiagramStyle.SmallSize, TextAnchor.Middle, colour, bold: placed.Highlighted);
    }

    private static void DrawNode(SvgScene scene, NetworkNode node, NodeContent content, DiagramRect box)
    {
        bool highlighted = node.Has(NetworkNodeFlags.Highlighted);
        bool suspect = node.Has(NetworkNodeFlags.Suspect);
        bool excluded = node.Has(NetworkNodeFlags.Excluded);
        string fill = highlighted ? DiagramStyle.BlueTint
            : excluded ? "#FFFFFF"
            : node.Kind switch
            {
                NetworkNodeKind.Target => DiagramStyle.OrangeTint,
                NetworkNodeKind.Measurement => DiagramStyle.MeasurementFill,
                _ => "#FFFFFF",
            };
        string stroke = suspect ? DiagramStyle.Vermillion : highlighted ? DiagramStyle.Blue : excluded ? DiagramStyle.Faint : DiagramStyle.Ink;
        double width = (highlighted ? 3.0 : 1.3) + (node.Kind == NetworkNodeKind.Target ? 0.7 : 0.0);
        string? dash = suspect ? "6 3" : excluded ? "2 3" : null;
        DrawShape(scene, node.Kind, box, fill, stroke, width, dash);
        if (suspect && highlighted)
        {
            // A suspect node on the route keeps the route colour as an inner ring, so both cues stay visible.
            DrawShape(scene, node.Kind, Inset(box, 3.5), "none", DiagramStyle.Blue, 1.6, null);
        }

        double textLeft = box.Left + content.TextLeftInset;
        double textCentre = textLeft + ((box.Right - content.TextRightInset - textLeft) / 2);
        double y = box.Top + PadY;
        string textColour = excluded ? "#6E6E6E" : DiagramStyle.Ink;
        foreach (NodeLine line in content.Lines)
        {
            y += line.LineHeight;
            scene.Formula(textCentre, y - (line.LineHeight * 0.27), line.Tokens, line.Size, TextAnchor.Middle, line.Size < DiagramStyle.LabelSize ? (excluded ? "#6E6E6E" : "#333333") : textColour, line.Bold, line.Italic);
        }

        if (suspect)
        {
            var c = new DiagramPoint(box.Left + content.TextLeftInset - 10.0, box.Center.Y);
            scene.Circle(c, 7.0, DiagramStyle.Vermillion, "none", 0.0);
            scene.Text(c.X, c.Y + 4.3, "!", 12.0, TextAnchor.Middle, "#FFFFFF", bold: true);
        }
    }

    private static DiagramRect Inset(DiagramRect r, double d) => new(r.Left + d, r.Top + d, r.Width - (2 * d), r.Height - (2 * d));

    private static void DrawShape(SvgScene scene, NetworkNodeKind kind, DiagramRect box, string fill, string stroke, double width, string? dash)
    {
        switch (kind)
        {
            case NetworkNodeKind.Species:
                scene.Rect(box, box.Height / 2, fill, stroke, width, dash);
                break;
            case NetworkNodeKind.Target:
                scene.Polygon(Hexagon(box), fill, stroke, width, dash);
                break;
            default:
                scene.Rect(box, 0.0, fill, stroke, width, dash);
                break;
        }
    }

    private static DiagramRect DrawLegend(SvgScene scene, double left, double top, double maxWidth)
    {
        (NetworkNodeKind Kind, NetworkNodeFlags Flags, string Text)[] items =
        [
            (NetworkNodeKind.Species, NetworkNodeFlags.None, "species"),
            (NetworkNodeKind.Measurement, NetworkNodeFlags.None, "measurement"),
            (NetworkNodeKind.Target, NetworkNodeFlags.None, "target reaction"),
            (NetworkNodeKind.Measurement, NetworkNodeFlags.Highlighted, "on route / cycle"),
            (NetworkNodeKind.Measurement, NetworkNodeFlags.Suspect, "suspect"),
            (NetworkNodeKind.Measurement, NetworkNodeFlags.Excluded, "excluded"),
        ];
        const double sampleW = 40.0;
        const double sampleH = 18.0;
        const double rowH = 26.0;
        double x = left + 10.0;
        double y = top + 10.0;
        double right = x;
        foreach ((NetworkNodeKind kind, NetworkNodeFlags flags, string text) in items)
        {
            double itemW = sampleW + 6.0 + TextMetrics.Width(text, DiagramStyle.SmallSize) + 18.0;
            if (x + itemW > left + maxWidth && x > left + 10.0)
            {
                x = left + 10.0;
                y += rowH;
            }

            var box = new DiagramRect(x, y, sampleW, sampleH);
            bool suspect = flags.HasFlag(NetworkNodeFlags.Suspect);
            bool highlighted = flags.HasFlag(NetworkNodeFlags.Highlighted);
            bool excluded = flags.HasFlag(NetworkNodeFlags.Excluded);
            string fill = highlighted ? DiagramStyle.BlueTint : kind == NetworkNodeKind.Target ? DiagramStyle.OrangeTint : kind == NetworkNodeKind.Measurement && !excluded ? DiagramStyle.MeasurementFill : "#FFFFFF";
            string stroke = suspect ? DiagramStyle.Vermillion : highlighted ? DiagramStyle.Blue : excluded ? DiagramStyle.Faint : DiagramStyle.Ink;
            DrawShape(scene, kind, box, fill, stroke, highlighted ? 3.0 : 1.3, suspect ? "6 3" : excluded ? "2 3" : null);
            if (suspect)
            {
                scene.Circle(box.Center, 6.0, DiagramStyle.Vermillion, "none", 0.0);
                scene.Text(box.Center.X, box.Center.Y + 4.0, "!", 11.0, TextAnchor.Middle, "#FFFFFF", bold: true);
            }

            scene.Text(x + sampleW + 6.0, y + 13.5, text, DiagramStyle.SmallSize, TextAnchor.Start, DiagramStyle.Ink);
            x += itemW;
            right = Math.Max(right, x);
        }

        const string factorText = "edge label = stoichiometric factor (shown when ≠ 1); arrows point from reactants to products";
        double factorW = TextMetrics.Width(factorText, DiagramStyle.SmallSize);
        y += rowH;
        scene.Text(left + 10.0, y + 12.0, factorText, DiagramStyle.SmallSize, TextAnchor.Start, DiagramStyle.Muted);
        right = Math.Max(right, left + 10.0 + factorW + 10.0);
        var frame = new DiagramRect(left, top, right - left, y + 20.0 - top);
        scene.Rect(frame, 4.0, "none", "#BBBBBB", 0.8);
        return frame;
    }

    /// <summary>The text lines of a node and the box size they need.</summary>
    private sealed record NodeContent(IReadOnlyList<NodeLine> Lines, double Width, double Height, double TextLeftInset, double TextRightInset)
    {
        public static NodeContent For(NetworkNode node)
        {
            bool target = node.Kind == NetworkNodeKind.Target;
            var lines = new List<NodeLine>
            {
                new(node.Kind == NetworkNodeKind.Species ? FormulaMarkup.Tokenize(node.Label) : [new FormulaToken(node.Label, FormulaTextRole.Normal)],
                    DiagramStyle.LabelSize, 17.0, target, false),
            };
            if (!string.IsNullOrWhiteSpace(node.SubLabel))
            {
                lines.Add(new NodeLine([new FormulaToken(node.SubLabel, FormulaTextRole.Normal)], DiagramStyle.SmallSize, 14.0, false, false));
            }

            if (node.Has(NetworkNodeFlags.Excluded))
            {
                lines.Add(new NodeLine([new FormulaToken("excluded", FormulaTextRole.Normal)], 10.0, 13.0, false, true));
            }

            double textW = lines.Max(l => TextMetrics.FormulaWidth(l.Tokens, l.Size, l.Bold));
            double height = Math.Max(28.0, lines.Sum(l => l.LineHeight) + (2 * PadY));
            double side = node.Kind switch
            {
                NetworkNodeKind.Species => PadX + (height * 0.25),
                NetworkNodeKind.Target => PadX + (height * 0.35),
                _ => PadX,
            };
            double left = side + (node.Has(NetworkNodeFlags.Suspect) ? BadgeRoom : 0.0);
            double width = Math.Max(48.0, left + textW + side);
            return new NodeContent(lines, width, height, left, side);
        }
    }

    private sealed record NodeLine(IReadOnlyList<FormulaToken> Tokens, double Size, double LineHeight, bool Bold, bool Italic);
}
