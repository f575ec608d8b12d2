using PathFinder.Chemistry;

namespace PathFinder.Tests.Chemistry;

public sealed class ZeroForOxygenTests
{
    [Theory]
    [InlineData("H20(g)", 2, "H2O(g)", false)]
    [InlineData("N02(g)", 1, "NO2(g)", true)]
    [InlineData("2 NO(g) + O2(g) -> 2 N02(g)", 22, "NO2(g)", true)]
    [InlineData("2H202(l) -> 2H2O(l) + O2(g)", 3, "H2O2(l)", false)]
    [InlineData("C10H8(cr)", 2, "C1OH8(cr)", false)]
    [InlineData("Ca(OH)20(cr)", 7, "Ca(OH)2O(cr)", false)]
    public void Find_ReadsEachZeroInAnAtomCountAsTheLetterO(string text, int offset, string suggested, bool leading)
    {
        ZeroForOxygen typo = Assert.Single(ZeroForOxygen.Find(text));

        Assert.Equal(offset, typo.Offset);
        Assert.Equal(suggested, typo.Suggested);
        Assert.Equal(leading, typo.CountStartsWithZero);
    }

    [Theory]
    [InlineData("10 H2(g) + 5 O2(g) -> 10 H2O(l)")]
    [InlineData("CuSO4·10H2O(cr)")]
    [InlineData("X^10+(g)")]
    [InlineData("CO2(g)")]
    public void Find_IgnoresCoefficientsMultipliersAndCharges(string text)
    {
        Assert.Empty(ZeroForOxygen.Find(text));
    }
}
