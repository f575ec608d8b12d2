using PathFinder.Thermodynamics;

namespace PathFinder.Tests.Thermodynamics;

public class PiecewiseHeatCapacityTests
{
    [Fact]
    public void Integral_AcrossJoint_SumsThePieces()
    {
        // Given Cp = 20 on 200–500 K and Cp = 10 + 0.02 T on 500–1000 K
        var low = new ConstantHeatCapacity(20, new TemperatureRange(200, 500));
        var high = new LinearHeatCapacity(10, 0.02, new TemperatureRange(500, 1000));
        var model = new PiecewiseHeatCapacity([high, low]);

        // When integrating 300 → 800 K
        double h = model.IntegrateHeatCapacity(300, 800);
        double s = model.IntegrateHeatCapacityOverTemperature(800, 300);

        // Then each piece covers only its own part (calculus)
        Assert.Equal((20 * 200) + (10 * 300) + (0.01 * ((800 * 800) - (500 * 500))), h, 1e-9);
        Assert.Equal(-((20 * Math.Log(500.0 / 300)) + (10 * Math.Log(800.0 / 500)) + (0.02 * 300)), s, 1e-12);
        Assert.Equal(new TemperatureRange(200, 1000), model.ValidRange);
        Assert.Same(low, model.PieceAt(500));
        Assert.Same(high, model.PieceAt(500.001));
    }

    [Fact]
    public void Outside_ExtrapolatesNearestPiece_AndRangeChecksWarn()
    {
        var low = new ConstantHeatCapacity(20, new TemperatureRange(200, 500));
        var high = new ConstantHeatCapacity(30, new TemperatureRange(500, 1000));
        var model = new PiecewiseHeatCapacity([low, high]);

        Assert.Equal(20 * 50, model.IntegrateHeatCapacity(100, 150), 1e-9);
        Assert.Equal(30 * 500, model.IntegrateHeatCapacity(1000, 1500), 1e-9);
        Assert.NotNull(model.CheckTemperature(150));
        Assert.NotNull(model.CheckInterval(900, 1500));
        Assert.Null(model.CheckInterval(200, 1000));
    }

    [Theory]
    [InlineData(600.0)] // gap 500–600
    [InlineData(450.0)] // overlap 450–500
    public void Constructor_WithGapOrOverlap_Throws(double secondStart)
    {
        var low = new ConstantHeatCapacity(20, new TemperatureRange(200, 500));
        var high = new ConstantHeatCapacity(30, new TemperatureRange(secondStart, 1000));
        Assert.Throws<ArgumentException>(() => new PiecewiseHeatCapacity([low, high]));
    }
}
