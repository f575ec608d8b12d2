using System.Numerics;

namespace PathFinder.Algebra;

/// <summary>Arithmetic modulo a prime below 2^31, with products reduced through a floating-point quotient estimate.</summary>
/// <remarks>
/// Values are kept in [0, p). Products of two values are below 2^62, so the quotient x/p estimated in double
/// precision is off by at most one and a single correction step gives the exact residue.
/// </remarks>
internal readonly struct ModularField
{
    private readonly double _inverse;

    public ModularField(ulong prime)
    {
        Prime = prime;
        _inverse = 1.0 / prime;
    }

    public ulong Prime { get; }

    public ulong Reduce(ulong x)
    {
        unchecked
        {
            ulong q = (ulong)(x * _inverse);
            long r = (long)(x - (q * Prime));
            if (r < 0)
            {
                r += (long)Prime;
            }
            else if (r >= (long)Prime)
            {
                r -= (long)Prime;
            }

            return (ulong)r;
        }
    }

    public ulong Multiply(ulong a, ulong b) => Reduce(unchecked(a * b));

    /// <summary>Returns (w + g·v) mod p for values already reduced.</summary>
    public ulong MultiplyAdd(ulong w, ulong g, ulong v) => Reduce(unchecked((g * v) + w));

    public ulong Negate(ulong a) => a == 0 ? 0 : Prime - a;

    public ulong Add(ulong a, ulong b)
    {
        ulong s = a + b;
        return s >= Prime ? s - Prime : s;
    }

    public ulong Subtract(ulong a, ulong b) => a >= b ? a - b : a + Prime - b;

    public ulong Inverse(ulong a)
    {
        if (a == 0)
        {
            throw new DivideByZeroException("Zero has no inverse modulo a prime.");
        }

        return Power(a, Prime - 2);
    }

    public ulong Power(ulong a, ulong e)
    {
        ulong result = 1;
        ulong b = a % Prime;
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

    public ulong FromBigInteger(BigInteger value)
    {
        BigInteger r = BigInteger.Remainder(value, Prime);
        if (r.Sign < 0)
        {
            r += Prime;
        }

        return (ulong)r;
    }

    /// <summary>Deterministic primality test for n below 2^32 (Miller–Rabin with bases 2, 7, 61).</summary>
    public static bool IsPrime(ulong n)
    {
        if (n < 2)
        {
            return false;
        }

        foreach (ulong small in new ulong[] { 2, 3, 5, 7, 11, 13, 61 })
        {
            if (n % small == 0)
            {
                return n == small;
            }
        }

        var field = new ModularField(n);
        ulong d = n - 1;
        int s = 0;
        while ((d & 1) == 0)
        {
            d >>= 1;
            s++;
        }

        foreach (ulong a in new ulong[] { 2, 7, 61 })
        {
            ulong x = field.Power(a, d);
            if (x == 1 || x == n - 1)
            {
                continue;
            }

            bool composite = true;
            for (int i = 1; i < s; i++)
            {
                x = field.Multiply(x, x);
                if (x == n - 1)
                {
                    composite = false;
                    break;
                }
            }

            if (composite)
            {
                return false;
            }
        }

        return true;
    }

    /// <summary>Draws a uniformly random prime in [2^30, 2^31) from <paramref name="random"/>.</summary>
    public static ulong RandomPrime(Random random)
    {
        while (true)
        {
            ulong candidate = (ulong)random.NextInt64(1L << 30, 1L << 31) | 1UL;
            if (IsPrime(candidate))
            {
                return candidate;
            }
        }
    }
}
