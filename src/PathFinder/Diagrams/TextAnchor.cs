namespace PathFinder.Diagrams;

/// <summary>Horizontal alignment of a text line at its anchor point.</summary>
internal enum TextAnchor
{
    /// <summary>Text starts at the anchor.</summary>
    Start,

    /// <summary>Text is centred on the anchor.</summary>
    Middle,

    /// <summary>Text ends at the anchor.</summary>
    End,
}
