using PathFinder.Diagrams;

namespace PathFinder.Tests.Diagrams;

public sealed class DiagramTextTests
{
    [Theory]
    [InlineData(0.13, 1, 1)]
    [InlineData(0.1, 1, 1)]
    [InlineData(0.04, 1, 2)]
    [InlineData(0.05, 1, 2)]
    [InlineData(0.004, 1, 3)]
    [InlineData(0.00001, 1, 4)]
    [InlineData(0.0, 1, 1)]
    [InlineData(2.5, 0, 0)]
    [InlineData(0.3, 0, 1)]
    public void DecimalsFor_AddsDecimalsUntilTheFirstSignificantDigitShows(double uncertainty, int decimals, int expected)
    {
        Assert.Equal(expected, DiagramText.DecimalsFor(uncertainty, decimals));
    }

    [Theory]
    [InlineData(-285.83, 0.04, 1, "−285.83 ± 0.04")]
    [InlineData(44.01, 0.2, 1, "+44.0 ± 0.2")]
    [InlineData(-393.51, 0.13, 2, "−393.51 ± 0.13")]
    public void WithUncertainty_PrintsValueAndUncertaintyWithTheSameDecimals(double value, double uncertainty, int decimals, string expected)
    {
        Assert.Equal(expected, DiagramText.WithUncertainty(value, uncertainty, decimals));
    }
}
