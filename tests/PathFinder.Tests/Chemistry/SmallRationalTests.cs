using PathFinder.Chemistry;

namespace PathFinder.Tests.Chemistry;

public sealed class SmallRationalTests
{
    [Fact]
    public void Add_ReducesAndKeepsTheDenominatorPositive()
    {
        // Given 1/6 + 1/3 (= 1/2) and 1/(-2) + 0
        // Then the results are reduced with a positive denominator
        Assert.Equal((1L, 2L), SmallRational.Add(1, 6, 1, 3));
        Assert.Equal((-1L, 2L), SmallRational.Add(1, -2, 0, 1));
        Assert.Equal((0L, 1L), SmallRational.Add(1, 2, -1, 2));
    }

    [Fact]
    public void Add_ThrowsOverflowInsteadOfWrapping()
    {
        // Given sums that do not fit in 64 bits
        // Then an overflow is reported so that callers fall back to exact big-integer fractions
        Assert.Throws<OverflowException>(() => SmallRational.Add(long.MaxValue, 1, 1, 1));
        Assert.Throws<OverflowException>(() => SmallRational.Add(1, long.MaxValue, 1, long.MaxValue - 1));
    }

    [Fact]
    public void Divide_GivesTheReducedQuotient()
    {
        // (3/4) / (-3/2) = -1/2
        Assert.Equal((-1L, 2L), SmallRational.Divide(3, 4, -3, 2));
    }

    [Fact]
    public void TryFrom_RefusesNumbersBeyond64Bits()
    {
        // Given a fraction with a 20-digit numerator, and one that fits
        var huge = new Fractions.Fraction(System.Numerics.BigInteger.Pow(10, 20), 3);

        // Then only the small one converts
        Assert.False(SmallRational.TryFrom(huge, out _, out _));
        Assert.True(SmallRational.TryFrom(new Fractions.Fraction(6, -4), out long n, out long d));
        Assert.Equal((-3L, 2L), (n, d));
    }
}
