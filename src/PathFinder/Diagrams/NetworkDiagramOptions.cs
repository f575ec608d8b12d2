namespace PathFinder.Diagrams;

/// <summary>Settings for drawing a network diagram.</summary>
public sealed record NetworkDiagramOptions
{
    /// <summary>The default node limit, <see cref="MaxNodes"/>.</summary>
    public const int DefaultMaxNodes = 300;

    /// <summary>Largest number of nodes drawn; above it rendering is refused (default 300).</summary>
    /// <remarks>
    /// Measured with DiagramBenchmark (Release build, 2-core machine; neighbourhoods in a generated network of 2,000
    /// species and 30,000 measurements, about 2 edges per node; least CPU time of three runs): 0.1–0.3 s for 130–145
    /// nodes, 0.1–0.8 s for 210–245, 0.4–1.1 s for 315–325 and 1.7–2.5 s for 400–440. So up to 300 nodes are laid out
    /// within 2 s; beyond that the layout grows quickly (about 20 s for 2,000 nodes) and the drawing, tens of thousands
    /// of units tall, is unreadable anyway. Above the limit rendering is refused with a message suggesting a narrower
    /// focus.
    /// </remarks>
    public int MaxNodes { get; init; } = DefaultMaxNodes;

    /// <summary>Direction of the reaction flow (default left to right).</summary>
    public LayoutDirection Direction { get; init; } = LayoutDirection.LeftToRight;

    /// <summary>Minimum gap between neighbouring nodes of one layer, in SVG units (default 18).</summary>
    public double NodeSeparation { get; init; } = 18.0;

    /// <summary>Gap between layers, in SVG units (default 56; room for factor labels on edges).</summary>
    public double LayerSeparation { get; init; } = 56.0;

    /// <summary>Caution line under the drawing (default: estimates from measured data, confirm by calorimetry).</summary>
    public string Caption { get; init; } = DiagramStyle.DefaultCaption;

    /// <summary>Whether to draw the legend of shapes and markings (default true).</summary>
    public bool ShowLegend { get; init; } = true;
}
