using System.Globalization;
using System.Text;

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

    /// <summary>Escapes text for XML content and attributes and drops characters XML 1.0 forbids.</summary>
    public static string Escape(string text)
    {
        var sb = new StringBuilder(text.Length + 8);
        foreach (char c in text)
        {
            switch (c)
            {
                case '&': sb.Append("&amp;"); break;
                case '<': sb.Append("&lt;"); break;
                case '>': sb.Append("&gt;"); break;
                case '"': sb.Append("&quot;"); break;
                case '\'': sb.Append("&apos;"); break;
                default:
                    if (c >= 0x20 || c is '\t' or '\n' or '\r')
                    {
                        if (c is not ('\uFFFE' or '\uFFFF'))
                        {
                            sb.Append(c);
                        }
                    }

                    break;
            }
        }

        return sb.ToString();
    }
}
