using System.Globalization;
using System.Xml.Linq;
using PathFinder.Diagrams;

namespace PathFinder.Tests.Diagrams;

/// <summary>Structural checks shared by the diagram tests: valid XML, a consistent canvas, and every text on it.</summary>
internal static class SvgChecks
{
    public static readonly XNamespace Svg = "http://www.w3.org/2000/svg";

    public static XDocument ParseValid(SvgDiagram diagram)
    {
        XDocument doc = XDocument.Parse(diagram.Svg);
        XElement root = doc.Root!;
        Assert.Equal(Svg + "svg", root.Name);
        Assert.Equal("1.1", (string?)root.Attribute("version"));
        double scale = Math.Min(1.0, 1600.0 / diagram.Width);
        Assert.Equal(Math.Round(diagram.Width * scale), Number(root, "width"), 2);
        Assert.Equal(Math.Round(diagram.Height * scale), Number(root, "height"), 2);
        string[] viewBox = ((string)root.Attribute("viewBox")!).Split(' ');
        Assert.Equal(diagram.Width, double.Parse(viewBox[2], CultureInfo.InvariantCulture), 2);
        Assert.Equal(diagram.Height, double.Parse(viewBox[3], CultureInfo.InvariantCulture), 2);
        Assert.NotNull(root.Element(Svg + "title"));
        Assert.DoesNotContain("href", diagram.Svg, StringComparison.Ordinal);
        Assert.DoesNotContain("@import", diagram.Svg, StringComparison.Ordinal);
        return doc;
    }

    /// <summary>Every text's anchor, and its estimated extent, lies inside the canvas.</summary>
    public static void AllTextInsideCanvas(XDocument doc, SvgDiagram diagram)
    {
        foreach (XElement text in doc.Descendants(Svg + "text"))
        {
            double x = Number(text, "x");
            double y = Number(text, "y");
            double size = Number(text, "font-size");
            Assert.InRange(x, 0.0, diagram.Width);
            Assert.InRange(y, 0.0, diagram.Height);
            if (text.Attribute("transform") is not null)
            {
                continue;
            }

            double width = TextMetrics.Width(text.Value, size);
            string anchor = (string?)text.Attribute("text-anchor") ?? "start";
            double left = anchor switch { "middle" => x - (width / 2), "end" => x - width, _ => x };
            Assert.True(left >= -0.5 && left + width <= diagram.Width + 0.5, $"Text '{text.Value}' runs off the canvas.");
            Assert.True(y - size >= -0.5, $"Text '{text.Value}' is cut at the top.");
        }
    }

    public static double Number(XElement e, string attribute) =>
        double.Parse((string)e.Attribute(attribute)!, CultureInfo.InvariantCulture);
}
