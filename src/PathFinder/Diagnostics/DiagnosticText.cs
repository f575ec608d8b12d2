namespace PathFinder.Diagnostics;

/// <summary>How user text is quoted in messages: every diagnostic that echoes a value goes through <see cref="Excerpt"/>.</summary>
public static class DiagnosticText
{
    /// <summary>The longest excerpt of user text a message shows, in characters (the ellipsis included).</summary>
    public const int MaxExcerpt = 80;

    /// <summary>The text itself when short, else its first 79 characters and an ellipsis (…), so a 100,000-character value never fills a screen.</summary>
    /// <remarks>A cut never splits a surrogate pair.</remarks>
    public static string Excerpt(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        if (text.Length <= MaxExcerpt)
        {
            return text;
        }

        int keep = MaxExcerpt - 1;
        if (char.IsHighSurrogate(text[keep - 1]))
        {
            keep--;
        }

        return string.Concat(text.AsSpan(0, keep), "…");
    }
}
