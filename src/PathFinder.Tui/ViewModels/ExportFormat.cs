namespace PathFinder.Tui.ViewModels;

/// <summary>What an export writes.</summary>
public enum ExportFormat
{
    /// <summary>The current table as RFC 4180 CSV.</summary>
    Csv,

    /// <summary>The current table as a JSON array of objects keyed by header.</summary>
    Json,

    /// <summary>The current table as a Markdown pipe table.</summary>
    Markdown,

    /// <summary>A diagram of the network as SVG, through the analysis' diagram hook.</summary>
    Svg,
}
