using Fractions;
using PathFinder.Chemistry;

namespace PathFinder.Tests.Chemistry;

public sealed class FormulaTests
{
    [Theory]
    [InlineData("CH3OH", "CH4O")]
    [InlineData("C2H5OH", "C2H6O")]
    [InlineData("CH3OCH3", "C2H6O")]
    [InlineData("CO2", "CO2")]
    [InlineData("SO4^2-", "O4S^2-")]
    [InlineData("NH4+", "H4N^+")]
    [InlineData("Cl-", "Cl^-")]
    [InlineData("HCl", "ClH")]
    [InlineData("Ca(OH)2", "CaH2O2")]
    [InlineData("NaHCO3", "CHNaO3")]
    public void HillNotation_IsCarbonHydrogenThenAlphabetical_OrAllAlphabeticalWithoutCarbon(string text, string hill)
    {
        Assert.Equal(hill, Formula.Parse(text).HillNotation);
    }

    [Fact]
    public void Equals_IsByCompositionAndCharge_NotBySpelling()
    {
        // Given two spellings of C2H6O and a different charge
        Formula ethanol = Formula.Parse("C2H5OH");
        Formula ether = Formula.Parse("CH3OCH3");

        // Then the spellings are chemically equal, and charge makes a difference
        Assert.Equal(ethanol, ether);
        Assert.Equal(ethanol.GetHashCode(), ether.GetHashCode());
        Assert.NotEqual(Formula.Parse("NH4"), Formula.Parse("NH4+"));
    }

    [Fact]
    public void Text_KeepsTheSpellingAndNormalisesTheHydrateStar()
    {
        Assert.Equal("CuSO4·5H2O", Formula.Parse("CuSO4*5H2O").Text);
        Assert.Equal(Formula.Parse("CuSO4*5H2O"), Formula.Parse("CuSO4·5H2O"));
        Assert.Equal("CH3CH2OH", Formula.Parse("CH3CH2OH").ToString());
    }

    [Fact]
    public void CountOf_IsZeroForAnAbsentElement()
    {
        Assert.Equal(Fraction.Zero, Formula.Parse("H2O").CountOf("C"));
    }

    [Theory]
    [InlineData(0, "")]
    [InlineData(1, "+")]
    [InlineData(-1, "-")]
    [InlineData(2, "^2+")]
    [InlineData(-3, "^3-")]
    public void ChargeText_WritesTheDataNotation(int charge, string expected)
    {
        Assert.Equal(expected, Formula.ChargeText(charge));
    }

    [Theory]
    [InlineData("Fe^3+")]
    [InlineData("SO4^2-")]
    [InlineData("Na+")]
    public void ChargeText_RoundTripsThroughTheParser(string text)
    {
        // Given an ion, when its body and ChargeText are glued back, then the same formula is read
        Formula formula = Formula.Parse(text);
        string body = text[..(text.IndexOf('^', StringComparison.Ordinal) is int caret and >= 0 ? caret : text.Length - 1)];

        Assert.Equal(formula, Formula.Parse(body + Formula.ChargeText(formula.Charge)));
    }

    [Fact]
    public void Parse_ThrowsFormatExceptionWithTheOffsetForBadInput()
    {
        FormatException exception = Assert.Throws<FormatException>(() => Formula.Parse("Ca(OH2"));

        Assert.Contains("at offset 2", exception.Message, StringComparison.Ordinal);
    }
}
