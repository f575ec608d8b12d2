using System.Globalization;
using System.Text;
using PathFinder.IO;

namespace PathFinder.Diagrams;

/// <summary>Culture-invariant number formatting and XML escaping for diagram text.</summary>
internal static class DiagramText
{
    public const char Minus = '−';

    /// <summary>A coordinate: at most two decimals, invariant culture, never "-0".</summary>
    public static string Coordinate(double value)
    {
        double rounded = Math.Round(value, 2, MidpointRounding.AwayFromZero);
        if (Math.Abs(rounded) < 0.005)
        {
            return "0";
        }

        return rounded.ToString("0.##", CultureInfo.InvariantCulture);
    }

    /// <summary>A value with an explicit sign (<c>+141.5</c>, <c>−110.5</c>) and a fixed number of decimals.</summary>
    public static string Signed(double value, int decimals)
    {
        string magnitude = Math.Abs(value).ToString("F" + decimals.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);
        bool isZero = Math.Abs(value) < 0.5 * Math.Pow(10.0, -decimals);
        return isZero ? magnitude : (value < 0.0 ? Minus + magnitude : "+" + magnitude);
    }

    /// <summary>The decimals to print an uncertainty with: <paramref name="decimals"/>, or more while the uncertainty is
    /// below one unit of the last decimal (0.04 with 1 decimal gets 2 decimals), so its first significant digit shows.</summary>
    /// <remarks>At most 4 decimals; the value beside it should use the same count, as in "−285.83 ± 0.04".</remarks>
    public static int DecimalsFor(double uncertainty, int decimals)
    {
        int d = Math.Max(decimals, 0);
        double u = Math.Abs(uncertainty);
        if (!double.IsFinite(u) || u <= 0.0)
        {
            return d;
        }

        while (d < 4 && u < Math.Pow(10.0, -d) * (1.0 - 1e-9))
        {
            d++;
        }

        return d;
    }

    /// <summary>A signed value and its uncertainty with matching decimals: <c>+44.0 ± 0.2</c>, <c>−285.83 ± 0.04</c>.</summary>
    /// <remarks>Uses <paramref name="decimals"/>, or more when the uncertainty needs them (<see cref="DecimalsFor"/>).</remarks>
    public static string WithUncertainty(double value, double uncertainty, int decimals)
    {
        int d = DecimalsFor(uncertainty, decimals);
        return $"{Signed(value, d)} ± {Fixed(uncertainty, d)}";
    }

    /// <summary>An unsigned magnitude with a fixed number of decimals.</summary>
    public static string Fixed(double value, int decimals) =>
        Math.Abs(value).ToString("F" + decimals.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);

    /// <summary>A tick label: shortest invariant form, U+2212 for negatives.</summary>
    public static string Tick(double value)
    {
        double rounded = Math.Round(value, 6);
        if (Math.Abs(rounded) < 1e-9)
        {
            return "0";
        }

        string text = Math.Abs(rounded).ToString("0.######", CultureInfo.InvariantCulture);
        return rounded < 0.0 ? Minus + text : text;
    }

    /// <summary>Escapes text for XML content and attributes; no control character from data reaches the file.</summary>
    /// <remarks>
    /// Control characters (ESC, C1, DEL, the bidirectional overrides) and unpaired surrogates are shown as <c>\uXXXX</c>
    /// (<see cref="TerminalText.Visible"/>): XML 1.0 forbids most of them, and the others would reach a terminal that
    /// prints the file. Tabs and line breaks stay (XML allows them); U+FFFE and U+FFFF, not characters in XML, are dropped.
    /// </remarks>
    public static string Escape(string text)
    {
        string visible = TerminalText.Visible(text, keepLineBreaks: true);
        var sb = new StringBuilder(visible.Length + 8);
        foreach (char c in visible)
        {
            switch (c)
            {
                case '&': sb.Append("&amp;"); break;
                case '<': sb.Append("&lt;"); break;
                case '>': sb.Append("&gt;"); break;
                case '"': sb.Append("&quot;"); break;
                case '\'': sb.Append("&apos;"); break;
                case '\uFFFE' or '\uFFFF': break;
                default: sb.Append(c); break;
            }
        }

        return sb.ToString();
    }
}
