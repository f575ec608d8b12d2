using System.Globalization;
using System.Numerics;
using Fractions;

namespace PathFinder.Chemistry;

/// <summary>Reads and writes exact stoichiometric factors: integers, decimals (<c>0.5</c>) and fractions (<c>3/2</c>).</summary>
public static class RationalText
{
    /// <summary>Formats as an integer or a reduced fraction, e.g. <c>2</c>, <c>-1/2</c>.</summary>
    public static string Format(Fraction value)
    {
        Fraction reduced = value.Reduce();
        BigInteger numerator = reduced.Numerator;
        BigInteger denominator = reduced.Denominator;
        if (denominator.Sign < 0)
        {
            numerator = -numerator;
            denominator = -denominator;
        }

        return denominator.IsOne
            ? numerator.ToString(CultureInfo.InvariantCulture)
            : $"{numerator.ToString(CultureInfo.InvariantCulture)}/{denominator.ToString(CultureInfo.InvariantCulture)}";
    }

    /// <summary>Reads <c>2</c>, <c>0.25</c>, <c>3/2</c> or <c>-1/2</c> exactly; returns false on anything else.</summary>
    /// <remarks>Decimals are converted exactly (0.1 is 1/10, not the nearest double).</remarks>
    public static bool TryParse(string text, out Fraction value)
    {
        value = Fraction.Zero;
        text = text.Trim();
        if (text.Length == 0)
        {
            return false;
        }

        int slash = text.IndexOf('/', StringComparison.Ordinal);
        if (slash >= 0)
        {
            if (!TryParseInteger(text[..slash], out BigInteger numerator) || !TryParseInteger(text[(slash + 1)..], out BigInteger denominator)
                || denominator.IsZero || denominator.Sign < 0)
            {
                return false;
            }

            value = new Fraction(numerator, denominator).Reduce();
            return true;
        }

        int dot = text.IndexOf('.', StringComparison.Ordinal);
        if (dot >= 0)
        {
            string whole = text[..dot];
            string decimals = text[(dot + 1)..];
            if (decimals.Length == 0 || decimals.Any(ch => !char.IsAsciiDigit(ch)))
            {
                return false;
            }

            bool negative = whole.StartsWith('-');
            string digits = (negative ? whole[1..] : whole) + decimals;
            if (digits.Length == 0 || digits.Any(ch => !char.IsAsciiDigit(ch)))
            {
                return false;
            }

            BigInteger numerator = BigInteger.Parse(digits, CultureInfo.InvariantCulture);
            value = new Fraction(negative ? -numerator : numerator, BigInteger.Pow(10, decimals.Length)).Reduce();
            return true;
        }

        if (!TryParseInteger(text, out BigInteger integer))
        {
            return false;
        }

        value = new Fraction(integer);
        return true;
    }

    private static bool TryParseInteger(string text, out BigInteger value)
    {
        value = BigInteger.Zero;
        string digits = text.StartsWith('-') ? text[1..] : text;
        if (digits.Length == 0 || digits.Any(ch => !char.IsAsciiDigit(ch)))
        {
            return false;
        }

        value = BigInteger.Parse(text, NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture);
        return true;
    }
}
