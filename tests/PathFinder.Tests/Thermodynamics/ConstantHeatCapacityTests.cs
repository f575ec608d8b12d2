using PathFinder.Thermodynamics;

namespace PathFinder.Tests.Thermodynamics;

public class ConstantHeatCapacityTests
{
    [Fact]
    public void Integrals_MatchClosedForms()
    {
        // Given Cp = 29.1 J/(mol K)
        var model = new ConstantHeatCapacity(29.1);

        // Then ∫Cp dT = Cp ΔT and ∫Cp/T dT = Cp ln(T2/T1) (calculus)
        Assert.Equal(29.1 * (1000 - 298.15), model.IntegrateHeatCapacity(298.15, 1000), 1e-9);
        Assert.Equal(29.1 * Math.Log(1000 / 298.15), model.IntegrateHeatCapacityOverTemperature(298.15, 1000), 1e-12);
    }

    [Fact]
    public void CheckInterval_OutsideRange_GivesWarningNotException()
    {
        // Given a model valid from 300 to 600 K
        var model = new ConstantHeatCapacity(30, new TemperatureRange(300, 600));

        // When asked about 298.15–800 K
        TemperatureRangeWarning? warning = model.CheckInterval(298.15, 800);
        double value = model.IntegrateHeatCapacity(298.15, 800);

        // Then a warning names the interval and the valid range, and the value is still computed
        Assert.NotNull(warning);
        Assert.Equal(298.15, warning.Low, 1e-12);
        Assert.Equal(800, warning.High, 1e-12);
        Assert.Equal(new TemperatureRange(300, 600), warning.ValidRange);
        Assert.Contains("300–600 K", warning.Message, StringComparison.Ordinal);
        Assert.Equal(30 * (800 - 298.15), value, 1e-9);
    }

    [Fact]
    public void CheckInterval_InsideRangeWithinTolerance_GivesNoWarning()
    {
        var model = new ConstantHeatCapacity(30, new TemperatureRange(298.15, 600));
        Assert.Null(model.CheckInterval(298.145, 600));
        Assert.Null(model.CheckTemperature(450));
        Assert.NotNull(model.CheckTemperature(288.0));
    }

    [Theory]
    [InlineData(298.15, false)]
    [InlineData(290.0, false)]
    [InlineData(289.9, true)]
    [InlineData(1009.9, false)]
    [InlineData(1010.1, true)]
    public void CheckTemperature_AllowsTenKelvinBeyondTheRange(double temperature, bool warned)
    {
        // Given a polynomial range that starts at 300 K, as many published ones do
        var model = new ConstantHeatCapacity(30, new TemperatureRange(300, 1000));

        // When checked at a temperature near either end
        TemperatureRangeWarning? warning = model.CheckTemperature(temperature);

        // Then only more than TemperatureRange.ExtrapolationTolerance (10 K) outside counts as an extrapolation
        Assert.Equal(warned, warning is not null);
        Assert.Equal(warned, model.CheckInterval(temperature, 500) is not null);
    }
}
