using PathFinder.Diagrams;

namespace PathFinder.Tests.Diagrams;

public class AxisTicksTests
{
    [Theory]
    [InlineData(-393.5, 0.0)]
    [InlineData(-965.1, 12.0)]
    [InlineData(0.2, 0.9)]
    public void Nice_CoversTheRangeWithEvenSteps(double min, double max)
    {
        IReadOnlyList<double> ticks = AxisTicks.Nice(min, max);

        Assert.InRange(ticks.Count, 3, 12);
        Assert.All(ticks, t => Assert.InRange(t, min - 1e-9, max + 1e-9));
        double step = ticks[1] - ticks[0];
        for (int i = 2; i < ticks.Count; i++)
        {
            Assert.Equal(step, ticks[i] - ticks[i - 1], 9);
        }

        if (min <= 0.0 && max >= 0.0)
        {
            Assert.Contains(0.0, ticks);
        }
    }
}
