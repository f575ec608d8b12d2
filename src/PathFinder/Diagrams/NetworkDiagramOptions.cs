namespace PathFinder.Diagrams;

/// <summary>Settings for drawing a network diagram.</summary>
public sealed record NetworkDiagramOptions
{
    /// <summary>The default node limit, <see cref="MaxNodes"/>.</summary>
    public const int DefaultMaxNodes = 400;

    /// <summary>Largest number of nodes drawn; above it rendering is refused (default 400).</summary>
    /// <remarks>Layered layout takes about 1.5 s for 300 nodes and 20 s for 2000 on a small machine, and drawings of
    /// more than a few hundred nodes are unreadable anyway; the refusal message suggests a narrower focus.</remarks>
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
