using Fractions;
using PathFinder.Chemistry;

namespace PathFinder.Tests.Chemistry;

public sealed class RationalTextTests
{
    [Theory]
    [InlineData("2", 2, 1)]
    [InlineData("0.1", 1, 10)]
    [InlineData("0.25", 1, 4)]
    [InlineData("3/2", 3, 2)]
    [InlineData("6/4", 3, 2)]
    [InlineData("-1/2", -1, 2)]
    [InlineData("-0.5", -1, 2)]
    [InlineData(" 7 ", 7, 1)]
    [InlineData(".5", 1, 2)]
    [InlineData("½", 1, 2)]
    [InlineData("¼", 1, 4)]
    [InlineData("¾", 3, 4)]
    [InlineData("⅓", 1, 3)]
    [InlineData("⅔", 2, 3)]
    [InlineData("⅙", 1, 6)]
    [InlineData("⅚", 5, 6)]
    public void TryParse_ReadsExactly(string text, int numerator, int denominator)
    {
        Assert.True(RationalText.TryParse(text, out Fraction value));
        Assert.Equal(new Fraction(numerator, denominator), value);
    }

    [Fact]
    public void TryParse_DecimalsAreExactNotBinary()
    {
        // 0.1 + 0.2 is not 0.3 in binary floating point; as decimals read exactly it is
        Assert.True(RationalText.TryParse("0.1", out Fraction a));
        Assert.True(RationalText.TryParse("0.2", out Fraction b));
        Assert.True(RationalText.TryParse("0.3", out Fraction c));
        Assert.Equal(c, a + b);
    }

    [Theory]
    [InlineData("")]
    [InlineData("abc")]
    [InlineData("1/0")]
    [InlineData("1/-2")]
    [InlineData("1.")]
    [InlineData("1.2.3")]
    [InlineData("1e3")]
    [InlineData("1,5")]
    [InlineData("-")]
    public void TryParse_RefusesAnythingElse(string text)
    {
        Assert.False(RationalText.TryParse(text, out _));
    }

    [Theory]
    [InlineData(2, 1, "2")]
    [InlineData(4, 2, "2")]
    [InlineData(-1, 2, "-1/2")]
    [InlineData(1, -2, "-1/2")]
    [InlineData(9, 6, "3/2")]
    [InlineData(0, 5, "0")]
    public void Format_WritesReducedFractions(int numerator, int denominator, string expected)
    {
        Assert.Equal(expected, RationalText.Format(new Fraction(numerator, denominator, normalize: false)));
    }

    [Theory]
    [InlineData("7/3")]
    [InlineData("-5/8")]
    [InlineData("12")]
    public void Format_RoundTripsThroughTryParse(string text)
    {
        Assert.True(RationalText.TryParse(text, out Fraction value));
        Assert.Equal(text, RationalText.Format(value));
    }

    [Theory]
    [InlineData("2")]
    [InlineData("02")]
    [InlineData("3/2")]
    [InlineData("6/4")]
    [InlineData("0.25")]
    [InlineData("5/0")]
    [InlineData("1/2/3")]
    [InlineData("123456789012345678901234/3")]
    [InlineData("")]
    public void TryParse_FromASpanAgreesWithTheStringForm(string text)
    {
        // Given a coefficient read from part of a longer text, and the same coefficient as a string
        bool fromString = RationalText.TryParse(text, out Fraction expected);
        bool fromSpan = RationalText.TryParse($"[{text}]".AsSpan(1, text.Length), out Fraction actual);

        // Then both readings agree
        Assert.Equal(fromString, fromSpan);
        Assert.Equal(expected, actual);
    }
}
