using System.Globalization;
using System.Numerics;
using Fractions;

namespace PathFinder.Chemistry;

/// <summary>Reads and writes exact stoichiometric factors: integers, decimals (<c>0.5</c>) and fractions (<c>3/2</c>).</summary>
public static class RationalText
{
    /// <summary>Denominators above this are written as exact decimals when they have one (factors that carry a temperature, T/1000 = 5963/20000).</summary>
    public const int LargestFractionDenominator = 1000;

    /// <summary>Formats as an integer or a reduced fraction, e.g. <c>2</c>, <c>-1/2</c>; an exact decimal such as <c>0.149075</c> when the denominator exceeds <see cref="LargestFractionDenominator"/> and the expansion terminates.</summary>
    /// <remarks>Either form reads back exactly with <see cref="TryParse(string, out Fraction)"/>.</remarks>
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

        if (denominator > LargestFractionDenominator && TerminatingDecimal(numerator, denominator) is { } decimalText)
        {
            return decimalText;
        }

        return denominator.IsOne
            ? numerator.ToString(CultureInfo.InvariantCulture)
            : $"{numerator.ToString(CultureInfo.InvariantCulture)}/{denominator.ToString(CultureInfo.InvariantCulture)}";
    }

    /// <summary>The exact decimal of n/d (d &gt; 0, reduced) when d has no prime factors but 2 and 5, else null.</summary>
    private static string? TerminatingDecimal(BigInteger numerator, BigInteger denominator)
    {
        int twos = 0;
        int fives = 0;
        BigInteger rest = denominator;
        while (rest.IsEven)
        {
            rest /= 2;
            twos++;
        }

        while (rest % 5 == 0)
        {
            rest /= 5;
            fives++;
        }

        if (!rest.IsOne)
        {
            return null;
        }

        int digits = Math.Max(twos, fives);
        BigInteger scaled = numerator * BigInteger.Pow(10, digits) / denominator;
        string magnitude = BigInteger.Abs(scaled).ToString(CultureInfo.InvariantCulture).PadLeft(digits + 1, '0');
        string text = magnitude[..^digits] + "." + magnitude[^digits..];
        return scaled.Sign < 0 ? "-" + text : text;
    }

    /// <summary>Reads <c>2</c>, <c>0.25</c>, <c>3/2</c>, <c>-1/2</c> or a vulgar fraction (<c>½</c>, <c>¼</c>, <c>¾</c>, <c>⅓</c>, <c>⅔</c>, <c>⅙</c>, <c>⅚</c>) exactly; returns false on anything else.</summary>
    /// <remarks>Decimals are converted exactly (0.1 is 1/10, not the nearest double). The vulgar fractions are those the
    /// diagrams print, so an equation copied from a diagram reads back.</remarks>
    public static bool TryParse(string text, out Fraction value)
    {
        value = Fraction.Zero;
        text = text.Trim();
        if (text.Length == 0)
        {
            return false;
        }

        if (text.Length == 1 && TryVulgarFraction(text[0], out value))
        {
            return true;
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

    /// <summary>Reads a coefficient from part of a text; see <see cref="TryParse(string, out Fraction)"/>.</summary>
    /// <remarks>Plain integers and fractions of up to 18 digits are read without building a string.</remarks>
    public static bool TryParse(ReadOnlySpan<char> text, out Fraction value)
    {
        int slash = text.IndexOf('/');
        ReadOnlySpan<char> top = slash >= 0 ? text[..slash] : text;
        ReadOnlySpan<char> bottom = slash >= 0 ? text[(slash + 1)..] : "1";
        if (top.Length is > 0 and <= 18 && bottom.Length is > 0 and <= 18 && !top.ContainsAnyExceptInRange('0', '9') && !bottom.ContainsAnyExceptInRange('0', '9'))
        {
            long numerator = long.Parse(top, NumberStyles.None, CultureInfo.InvariantCulture);
            long denominator = long.Parse(bottom, NumberStyles.None, CultureInfo.InvariantCulture);
            if (slash < 0)
            {
                value = new Fraction(new BigInteger(numerator));
                return true;
            }

            if (denominator == 0)
            {
                value = Fraction.Zero;
                return false;
            }

            value = new Fraction(new BigInteger(numerator), new BigInteger(denominator)).Reduce();
            return true;
        }

        return TryParse(text.ToString(), out value);
    }

    /// <summary>Whether <paramref name="symbol"/> is one of the vulgar fractions read as a coefficient: ½ ¼ ¾ ⅓ ⅔ ⅙ ⅚.</summary>
    public static bool IsVulgarFraction(char symbol) => TryVulgarFraction(symbol, out _);

    private static bool TryVulgarFraction(char symbol, out Fraction value)
    {
        (int numerator, int denominator) = symbol switch
        {
            '½' => (1, 2),
            '¼' => (1, 4),
            '¾' => (3, 4),
            '⅓' => (1, 3),
            '⅔' => (2, 3),
            '⅙' => (1, 6),
            '⅚' => (5, 6),
            _ => (0, 0),
        };
        value = denominator == 0 ? Fraction.Zero : new Fraction(numerator, denominator);
        return denominator != 0;
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
