using System.Numerics;
using Fractions;

namespace PathFinder.Chemistry;

/// <summary>Exact rational arithmetic on checked 64-bit numerators and denominators, a fast path before <see cref="Fraction"/>.</summary>
/// <remarks>
/// Every operation is checked and throws <see cref="OverflowException"/> when a number does not fit; callers then
/// fall back to <see cref="Fraction"/>. Results are reduced with a positive denominator.
/// </remarks>
internal static class SmallRational
{
    /// <summary>The reduced numerator and positive denominator of <paramref name="value"/>, when both fit in a long.</summary>
    public static bool TryFrom(Fraction value, out long numerator, out long denominator)
    {
        numerator = 0;
        denominator = 1;
        BigInteger n = value.Numerator;
        BigInteger d = value.Denominator;
        if (d.IsZero || n < long.MinValue + 1 || n > long.MaxValue || d < long.MinValue + 1 || d > long.MaxValue)
        {
            return false;
        }

        (numerator, denominator) = Reduce((long)n, (long)d);
        return true;
    }

    /// <summary>a/b + c/d, reduced.</summary>
    public static (long Numerator, long Denominator) Add(long a, long b, long c, long d) =>
        b == d ? Reduce(checked(a + c), b) : Reduce(checked((a * d) + (c * b)), checked(b * d));

    /// <summary>(a/b) / (c/d) for c ≠ 0, reduced.</summary>
    public static (long Numerator, long Denominator) Divide(long a, long b, long c, long d) =>
        Reduce(checked(a * d), checked(b * c));

    /// <summary>Divides out the common factor and makes the denominator positive.</summary>
    public static (long Numerator, long Denominator) Reduce(long numerator, long denominator)
    {
        if (denominator < 0)
        {
            numerator = checked(-numerator);
            denominator = checked(-denominator);
        }

        if (numerator == 0)
        {
            return (0, 1);
        }

        long gcd = GreatestCommonDivisor(Math.Abs(numerator), denominator);
        return gcd == 1 ? (numerator, denominator) : (numerator / gcd, denominator / gcd);
    }

    private static long GreatestCommonDivisor(long a, long b)
    {
        while (b != 0)
        {
            (a, b) = (b, a % b);
        }

        return a;
    }
}
