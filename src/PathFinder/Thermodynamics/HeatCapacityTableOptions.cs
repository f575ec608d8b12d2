namespace PathFinder.Thermodynamics;

/// <summary>Tolerances used by <see cref="HeatCapacityTableReader"/>.</summary>
/// <param name="RangeTolerance">Largest mismatch, in K, between one range's tmax and the next range's tmin that counts as contiguous; default 0.01 K.</param>
/// <param name="ContinuityTolerance">Largest relative jump of Cp where two ranges meet before a warning; default 0.02 (2 %).</param>
public sealed record HeatCapacityTableOptions(double RangeTolerance = TemperatureRange.DefaultTolerance, double ContinuityTolerance = 0.02)
{
    /// <summary>The defaults.</summary>
    public static HeatCapacityTableOptions Default { get; } = new();
}
