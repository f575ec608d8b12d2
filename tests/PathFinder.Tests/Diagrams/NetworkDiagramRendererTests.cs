using System.Globalization;
using System.Xml.Linq;
using PathFinder.Diagrams;

namespace PathFinder.Tests.Diagrams;

public class NetworkDiagramRendererTests
{
    private const double EndTolerance = 1.5;

    private static NetworkDiagramResult RenderSample(LayoutDirection direction = LayoutDirection.LeftToRight) =>
        NetworkDiagramRenderer.Render(DiagramSamples.Network(), new NetworkDiagramOptions { Direction = direction });

    [Theory]
    [InlineData(LayoutDirection.LeftToRight)]
    [InlineData(LayoutDirection.TopDown)]
    public void Render_ProducesValidSvgWithAllTextOnCanvas(LayoutDirection direction)
    {
        // Given the sample network; When rendered; Then the SVG parses and no text leaves the canvas.
        NetworkDiagramResult result = RenderSample(direction);

        Assert.True(result.IsRendered);
        XDocument doc = SvgChecks.ParseValid(result.Diagram!);
        SvgChecks.AllTextInsideCanvas(doc, result.Diagram!);
        Assert.Contains(doc.Descendants(SvgChecks.Svg + "text"), t => t.Value.Contains("confirm by calorimetry", StringComparison.Ordinal));
    }

    [Theory]
    [InlineData(LayoutDirection.LeftToRight)]
    [InlineData(LayoutDirection.TopDown)]
    public void Render_NodeBoxesDoNotOverlap(LayoutDirection direction)
    {
        NetworkLayout layout = RenderSample(direction).Layout!;

        for (int i = 0; i < layout.Nodes.Count; i++)
        {
            for (int j = i + 1; j < layout.Nodes.Count; j++)
            {
                Assert.False(layout.Nodes[i].Box.Overlaps(layout.Nodes[j].Box), $"{layout.Nodes[i].Id} overlaps {layout.Nodes[j].Id}");
            }
        }
    }

    [Theory]
    [InlineData(LayoutDirection.LeftToRight)]
    [InlineData(LayoutDirection.TopDown)]
    public void Render_EdgeEndsTouchTheirNodes(LayoutDirection direction)
    {
        // Given the layout; Then each edge starts on its source outline and its arrow tip lies on the target outline.
        // Rounded ends and hexagon tips lie inside the bounding box by up to 0.35 of the box height.
        NetworkLayout layout = RenderSample(direction).Layout!;
        Dictionary<string, PlacedNode> byId = layout.Nodes.ToDictionary(n => n.Id);

        foreach (PlacedEdge edge in layout.Edges)
        {
            DiagramRect from = byId[edge.From].Box;
            DiagramRect to = byId[edge.To].Box;
            Assert.True(from.Contains(edge.Start, EndTolerance) && from.DistanceToOutline(edge.Start) <= (0.35 * from.Height) + EndTolerance,
                $"{edge.From}→{edge.To} start {edge.Start} is not on {from}");
            Assert.True(to.Contains(edge.Tip, EndTolerance) && to.DistanceToOutline(edge.Tip) <= (0.35 * to.Height) + EndTolerance,
                $"{edge.From}→{edge.To} tip {edge.Tip} is not on {to}");
        }
    }

    [Fact]
    public void Render_DrawsFactorLabelsOnlyWhenNotOne()
    {
        NetworkDiagram diagram = DiagramSamples.Network();
        NetworkLayout layout = NetworkDiagramRenderer.Render(diagram).Layout!;

        for (int i = 0; i < diagram.Edges.Count; i++)
        {
            bool expectLabel = diagram.Edges[i].Factor is { } f && f != "1";
            Assert.Equal(expectLabel, layout.Edges[i].LabelBox.HasValue);
        }
    }

    [Fact]
    public void Render_LegendAndLabelsDoNotOverlapNodes()
    {
        NetworkLayout layout = RenderSample().Layout!;

        foreach (PlacedNode node in layout.Nodes)
        {
            Assert.False(node.Box.Overlaps(layout.Legend!.Value), $"{node.Id} overlaps the legend");
            foreach (PlacedEdge edge in layout.Edges.Where(e => e.LabelBox.HasValue))
            {
                Assert.False(node.Box.Overlaps(edge.LabelBox!.Value, tolerance: 1.0), $"label of {edge.From}→{edge.To} overlaps {node.Id}");
            }
        }
    }

    [Fact]
    public void Render_HighlightsRouteEdgesUnlessOverridden()
    {
        NetworkLayout layout = RenderSample().Layout!;

        Assert.Contains(layout.Edges, e => e is { From: "C(gr)", To: "m1", Highlighted: true });
        Assert.Contains(layout.Edges, e => e is { From: "O2(g)", To: "m3", Highlighted: false });
        Assert.Contains(layout.Edges, e => e is { From: "H2(g)", To: "m3", Highlighted: false });
    }

    [Fact]
    public void Render_MarksSuspectAndExcludedNodesBeyondColour()
    {
        string svg = RenderSample().Diagram!.Svg;

        Assert.Contains("stroke-dasharray=\"6 3\"", svg, StringComparison.Ordinal); // suspect: dashed
        Assert.Contains("stroke-dasharray=\"2 3\"", svg, StringComparison.Ordinal); // excluded: dotted
        Assert.Contains(">!</text>", svg, StringComparison.Ordinal);
        Assert.Contains(">excluded</text>", svg, StringComparison.Ordinal);
    }

    [Fact]
    public void Render_TypesetsFormulaLabelsWithShiftedRuns()
    {
        XDocument doc = XDocument.Parse(RenderSample().Diagram!.Svg);

        XElement sulfate = doc.Descendants(SvgChecks.Svg + "text").First(t => t.Value == "SO4 2−(aq)".Replace(" ", string.Empty, StringComparison.Ordinal));
        // Shifts: down for "4", up for "2−", back to the baseline for "(aq)".
        Assert.Equal(3, sulfate.Elements(SvgChecks.Svg + "tspan").Count(s => s.Attribute("dy") is not null));
    }

    [Fact]
    public void Render_RefusesNetworksAboveTheNodeLimit()
    {
        // Given more nodes than the default limit; When rendered; Then no layout runs and the message suggests a narrower focus.
        NetworkDiagram big = DiagramSamples.Chain(NetworkDiagramOptions.DefaultMaxNodes);

        NetworkDiagramResult result = NetworkDiagramRenderer.Render(big);

        Assert.False(result.IsRendered);
        Assert.Null(result.Diagram);
        Assert.Contains($"limited to {NetworkDiagramOptions.DefaultMaxNodes} nodes", result.RefusalMessage, StringComparison.Ordinal);
        Assert.Contains("narrower focus", result.RefusalMessage, StringComparison.Ordinal);
    }

    [Fact]
    public void Render_HonoursALowerNodeLimit()
    {
        NetworkDiagramResult result = NetworkDiagramRenderer.Render(DiagramSamples.Network(), new NetworkDiagramOptions { MaxNodes = 5 });

        Assert.False(result.IsRendered);
    }

    [Fact]
    public void Render_ThrowsWhenCancelled()
    {
        using var source = new CancellationTokenSource();
        source.Cancel();

        Assert.ThrowsAny<OperationCanceledException>(() => NetworkDiagramRenderer.Render(DiagramSamples.Chain(30), null, source.Token));
    }

    [Fact]
    public void Render_RejectsDuplicateIdsAndUnknownEdgeEnds()
    {
        var duplicate = new NetworkDiagram("d", [NetworkNode.Species("A"), NetworkNode.Species("A")], []);
        var dangling = new NetworkDiagram("d", [NetworkNode.Species("A")], [new NetworkEdge("A", "m9")]);

        Assert.Throws<ArgumentException>(() => NetworkDiagramRenderer.Render(duplicate));
        Assert.Throws<ArgumentException>(() => NetworkDiagramRenderer.Render(dangling));
    }

    [Fact]
    public void Render_EmptyNetworkGivesAValidPicture()
    {
        NetworkDiagramResult result = NetworkDiagramRenderer.Render(new NetworkDiagram("Empty", [], []));

        Assert.True(result.IsRendered);
        SvgChecks.ParseValid(result.Diagram!);
    }

    [Fact]
    public void Render_EscapesMarkupCharactersInLabels()
    {
        var diagram = new NetworkDiagram("A <b> & \"c\"", [NetworkNode.Measurement("m<1>&", "x < y")], []);

        SvgDiagram svg = NetworkDiagramRenderer.Render(diagram).Diagram!;

        XDocument doc = SvgChecks.ParseValid(svg);
        Assert.Contains(doc.Descendants(SvgChecks.Svg + "text"), t => t.Value == "m<1>&");
    }

    [Fact]
    public void Render_ShowsControlCharactersInLabelsAndStaysValidXml()
    {
        // Given labels with a screen clear, a C1 control, DEL, a bidi override and an unpaired surrogate
        var diagram = new NetworkDiagram("t\u001b]0;pwned\u0007", [NetworkNode.Measurement("m\u001b[2J\u009b\u007f", "x\u202e\ud800")], []);

        SvgDiagram svg = NetworkDiagramRenderer.Render(diagram).Diagram!;

        // Then the SVG parses as XML, holds no control character except line breaks, and shows the sequences
        XDocument doc = SvgChecks.ParseValid(svg);
        Assert.DoesNotContain(svg.Svg, c => (char.IsControl(c) && c is not ('\n' or '\t' or '\r')) || char.IsSurrogate(c) || c == '\u202e');
        Assert.Contains(doc.Descendants(SvgChecks.Svg + "text"), t => t.Value == "m\\u001B[2J\\u009B\\u007F");
    }

    [Fact]
    public void Render_IsDeterministicAndCultureInvariant()
    {
        string first = RenderSample().Diagram!.Svg;
        CultureInfo saved = CultureInfo.CurrentCulture;
        try
        {
            CultureInfo.CurrentCulture = new CultureInfo("de-DE");
            Assert.Equal(first, RenderSample().Diagram!.Svg);
        }
        finally
        {
            CultureInfo.CurrentCulture = saved;
        }
    }

    [Fact]
    public void Render_MatchesSnapshot()
    {
        SnapshotAssert.Matches(RenderSample().Diagram!.Svg, "network-sample.svg");
    }

    [Fact]
    public void Save_WritesTheSvgFile()
    {
        string folder = Path.Combine(Path.GetTempPath(), "pf-diagrams-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(folder);
        try
        {
            SvgDiagram diagram = RenderSample().Diagram!;
            string path = Path.Combine(folder, "net.svg");

            diagram.Save(path);

            Assert.Equal(diagram.Svg, File.ReadAllText(path));
            Assert.Single(Directory.GetFiles(folder));
        }
        finally
        {
            Directory.Delete(folder, recursive: true);
        }
    }

    [Fact]
    public void Render_CapsTheDisplayWidthOfLargeDrawings()
    {
        // Given a network too wide for a page; Then the viewBox keeps its size but the width attribute is capped.
        SvgDiagram diagram = NetworkDiagramRenderer.Render(DiagramSamples.Chain(40)).Diagram!;

        Assert.True(diagram.Width > 1600.0);
        XDocument doc = SvgChecks.ParseValid(diagram);
        Assert.Equal(1600.0, SvgChecks.Number(doc.Root!, "width"), 2);
    }
}
