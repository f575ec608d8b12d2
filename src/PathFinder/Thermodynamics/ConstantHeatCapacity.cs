namespace PathFinder.Thermodynamics;

/// <summary>A temperature-independent heat capacity Cp = c, mainly for tests and rough estimates.</summary>
/// <remarks>∫Cp dT = c·(T2 − T1) in J/mol; ∫Cp/T dT = c·ln(T2/T1) in J/(mol·K).</remarks>
public sealed class ConstantHeatCapacity : IHeatCapacity
{
    /// <summary>Creates the model.</summary>
    /// <param name="heatCapacity">Cp in J/(mol·K) (finite).</param>
    /// <param name="validRange">The range it is valid over; <see cref="TemperatureRange.Unbounded"/> when omitted.</param>
    public ConstantHeatCapacity(double heatCapacity, TemperatureRange? validRange = null)
    {
        if (!double.IsFinite(heatCapacity))
        {
            throw new ArgumentOutOfRangeException(nameof(heatCapacity), heatCapacity, "The heat capacity must be finite.");
        }

        Value = heatCapacity;
        ValidRange = validRange ?? TemperatureRange.Unbounded;
    }

    /// <summary>Cp in J/(mol·K).</summary>
    public double Value { get; }

    /// <inheritdoc />
    public TemperatureRange ValidRange { get; }

    /// <inheritdoc />
    public double HeatCapacity(double temperature)
    {
        Temperature.RequirePositive(temperature, nameof(temperature));
        return Value;
    }

    /// <inheritdoc />
    public double IntegrateHeatCapacity(double from, double to)
    {
        Temperature.RequirePositive(from, nameof(from));
        Temperature.RequirePositive(to, nameof(to));
        return Value * (to - from);
    }

    /// <inheritdoc />
    public double IntegrateHeatCapacityOverTemperature(double from, double to)
    {
        Temperature.RequirePositive(from, nameof(from));
        Temperature.RequirePositive(to, nameof(to));
        return Value * Math.Log(to / from);
    }
}
