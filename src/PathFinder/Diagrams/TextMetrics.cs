namespace PathFinder.Diagrams;

/// <summary>Conservative text width estimates; no font is measured, so boxes are sized generously.</summary>
/// <remarks>Uses 0.62 em per character (0.68 em for bold), which covers DejaVu Sans, Arial and Helvetica for the
/// Latin, Greek and symbol characters used in formulas and values.</remarks>
internal static class TextMetrics
{
    public const double EmPerChar = 0.62;
    public const double BoldEmPerChar = 0.68;
    public const double ScriptScale = 0.72;

    public static double Width(string text, double fontSize, bool bold = false) =>
        text.Length * fontSize * (bold ? BoldEmPerChar : EmPerChar);

    public static double FormulaWidth(IReadOnlyList<FormulaToken> tokens, double fontSize, bool bold = false)
    {
        double width = 0.0;
        foreach (FormulaToken token in tokens)
        {
            double size = token.Role == FormulaTextRole.Normal ? fontSize : fontSize * ScriptScale;
            width += Width(token.Text, size, bold);
        }

        return width;
    }
}
