namespace PathFinder.Diagrams;

/// <summary>Outcome of drawing a network: a diagram, or a refusal with a message for the user.</summary>
public sealed record NetworkDiagramResult
{
    private NetworkDiagramResult(SvgDiagram? diagram, NetworkLayout? layout, string? refusal)
    {
        Diagram = diagram;
        Layout = layout;
        RefusalMessage = refusal;
    }

    /// <summary>True when a diagram was drawn.</summary>
    public bool IsRendered => Diagram is not null;

    /// <summary>The SVG, or null when refused.</summary>
    public SvgDiagram? Diagram { get; }

    /// <summary>Node and edge geometry, or null when refused.</summary>
    public NetworkLayout? Layout { get; }

    /// <summary>Why nothing was drawn and what to do instead, or null when rendered.</summary>
    public string? RefusalMessage { get; }

    /// <summary>Creates a successful result.</summary>
    public static NetworkDiagramResult Rendered(SvgDiagram diagram, NetworkLayout layout)
    {
        ArgumentNullException.ThrowIfNull(diagram);
        ArgumentNullException.ThrowIfNull(layout);
        return new NetworkDiagramResult(diagram, layout, null);
    }

    /// <summary>Creates a refusal.</summary>
    public static NetworkDiagramResult Refused(string message)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(message);
        return new NetworkDiagramResult(null, null, message);
    }
}
