namespace PathFinder.Thermodynamics;

/// <summary>Range checks and common derived quantities for any <see cref="IHeatCapacity"/>.</summary>
public static class HeatCapacityExtensions
{
    /// <summary>A warning when <paramref name="temperature"/> lies outside the model's valid range, otherwise <see langword="null"/>.</summary>
    /// <param name="model">The heat-capacity model.</param>
    /// <param name="temperature">Temperature in K.</param>
    /// <param name="tolerance">Absolute tolerance in K; default <see cref="TemperatureRange.ExtrapolationTolerance"/> (10 K).</param>
    public static TemperatureRangeWarning? CheckTemperature(this IHeatCapacity model, double temperature, double tolerance = TemperatureRange.ExtrapolationTolerance)
    {
        ArgumentNullException.ThrowIfNull(model);
        return model.ValidRange.Contains(temperature, tolerance)
            ? null
            : new TemperatureRangeWarning(temperature, temperature, model.ValidRange);
    }

    /// <summary>A warning when any part of the interval between two temperatures lies outside the model's valid range, otherwise <see langword="null"/>.</summary>
    /// <param name="model">The heat-capacity model.</param>
    /// <param name="first">One end of the interval in K.</param>
    /// <param name="second">The other end in K (either order).</param>
    /// <param name="tolerance">Absolute tolerance in K; default <see cref="TemperatureRange.ExtrapolationTolerance"/> (10 K).</param>
    public static TemperatureRangeWarning? CheckInterval(this IHeatCapacity model, double first, double second, double tolerance = TemperatureRange.ExtrapolationTolerance)
    {
        ArgumentNullException.ThrowIfNull(model);
        return model.ValidRange.ContainsInterval(first, second, tolerance)
            ? null
            : new TemperatureRangeWarning(Math.Min(first, second), Math.Max(first, second), model.ValidRange);
    }

    /// <summary>The enthalpy increment H°(<paramref name="to"/>) − H°(<paramref name="from"/>) in J/mol; the same as <see cref="IHeatCapacity.IntegrateHeatCapacity"/>.</summary>
    /// <param name="model">The heat-capacity model.</param>
    /// <param name="from">Reference temperature in K, often 298.15 K.</param>
    /// <param name="to">Temperature in K.</param>
    public static double EnthalpyIncrement(this IHeatCapacity model, double from, double to)
    {
        ArgumentNullException.ThrowIfNull(model);
        return model.IntegrateHeatCapacity(from, to);
    }

    /// <summary>The entropy increment S°(<paramref name="to"/>) − S°(<paramref name="from"/>) in J/(mol·K); the same as <see cref="IHeatCapacity.IntegrateHeatCapacityOverTemperature"/>.</summary>
    /// <param name="model">The heat-capacity model.</param>
    /// <param name="from">Reference temperature in K.</param>
    /// <param name="to">Temperature in K.</param>
    public static double EntropyIncrement(this IHeatCapacity model, double from, double to)
    {
        ArgumentNullException.ThrowIfNull(model);
        return model.IntegrateHeatCapacityOverTemperature(from, to);
    }
}
