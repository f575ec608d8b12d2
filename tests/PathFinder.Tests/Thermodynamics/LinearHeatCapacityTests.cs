using PathFinder.Thermodynamics;

namespace PathFinder.Tests.Thermodynamics;

public class LinearHeatCapacityTests
{
    [Theory]
    [InlineData(25.0, 0.01, 300.0, 800.0)]
    [InlineData(-3.0, 0.2, 800.0, 300.0)]
    [InlineData(40.0, 0.0, 298.15, 1500.0)]
    public void Integrals_MatchClosedForms(double a, double b, double t1, double t2)
    {
        // Given Cp = a + bT
        var model = new LinearHeatCapacity(a, b);

        // When integrated
        double h = model.IntegrateHeatCapacity(t1, t2);
        double s = model.IntegrateHeatCapacityOverTemperature(t1, t2);

        // Then ∫Cp dT = a(T2−T1) + b(T2²−T1²)/2 and ∫Cp/T dT = a ln(T2/T1) + b(T2−T1) (calculus)
        Assert.Equal((a * (t2 - t1)) + (b * ((t2 * t2) - (t1 * t1)) / 2.0), h, 1e-9);
        Assert.Equal((a * Math.Log(t2 / t1)) + (b * (t2 - t1)), s, 1e-12);
    }

    [Fact]
    public void Integral_ReversedLimits_ChangesSign()
    {
        var model = new LinearHeatCapacity(20, 0.05);
        Assert.Equal(-model.IntegrateHeatCapacity(300, 900), model.IntegrateHeatCapacity(900, 300), 1e-9);
    }

    [Theory]
    [InlineData(0.0)]
    [InlineData(-10.0)]
    [InlineData(double.NaN)]
    public void HeatCapacity_AtNonPositiveTemperature_Throws(double temperature)
    {
        var model = new LinearHeatCapacity(20, 0.05);
        Assert.Throws<ArgumentOutOfRangeException>(() => model.HeatCapacity(temperature));
    }
}
