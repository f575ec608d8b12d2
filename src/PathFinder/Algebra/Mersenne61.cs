using System.Numerics;

namespace PathFinder.Algebra;

/// <summary>Arithmetic modulo the Mersenne prime p = 2^61 − 1, with values kept in [0, p).</summary>
internal static class Mersenne61
{
    public const ulong Prime = (1UL << 61) - 1;

    public static ulong Multiply(ulong a, ulong b)
    {
        unchecked
        {
            ulong hi = Math.BigMul(a, b, out ulong lo);
            ulong r = (lo & Prime) + ((lo >> 61) | (hi << 3));
            return r >= Prime ? r - Prime : r;
        }
    }

    public static ulong Add(ulong a, ulong b)
    {
        ulong s = a + b;
        return s >= Prime ? s - Prime : s;
    }

    public static ulong Subtract(ulong a, ulong b) => a >= b ? a - b : a + Prime - b;

    public static ulong Negate(ulong a) => a == 0 ? 0 : Prime - a;

    public static ulong Inverse(ulong a)
    {
        if (a == 0)
        {
            throw new DivideByZeroException("Zero has no inverse modulo a prime.");
        }

        ulong result = 1, b = a, e = Prime - 2;
        while (e > 0)
        {
            if ((e & 1) == 1)
            {
                result = Multiply(result, b);
            }

            b = Multiply(b, b);
            e >>= 1;
        }

        return result;
    }

    public static ulong FromBigInteger(BigInteger value)
    {
        BigInteger r = BigInteger.Remainder(value, Prime);
        if (r.Sign < 0)
        {
            r += Prime;
        }

        return (ulong)r;
    }

    /// <summary>Finds n/d with |n|, d ≤ √(p/2) and n ≡ a·d (mod p), if one exists (Wang's rational reconstruction).</summary>
    public static bool TryReconstruct(ulong a, out long numerator, out long denominator)
    {
        const long bound = 1L << 30; // < sqrt(p / 2) ≈ 1.07e9 · 1.5
        long r0 = (long)Prime, r1 = (long)a, t0 = 0, t1 = 1;
        while (r1 > bound)
        {
            long q = r0 / r1;
            (r0, r1) = (r1, r0 - (q * r1));
            (t0, t1) = (t1, t0 - (q * t1));
        }

        numerator = r1;
        denominator = t1;
        if (denominator == 0 || Math.Abs(denominator) > bound)
        {
            return false;
        }

        if (denominator < 0)
        {
            numerator = -numerator;
            denominator = -denominator;
        }

        return BigInteger.GreatestCommonDivisor(numerator, denominator).IsOne;
    }
}
