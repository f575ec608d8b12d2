namespace PathFinder.Thermodynamics;

/// <summary>A heat capacity linear in temperature, Cp = a + b·T, mainly for tests.</summary>
/// <remarks>
/// a in J/(mol·K), b in J/(mol·K²). ∫Cp dT = a·(T2 − T1) + b·(T2² − T1²)/2 in J/mol;
/// ∫Cp/T dT = a·ln(T2/T1) + b·(T2 − T1) in J/(mol·K).
/// </remarks>
public sealed class LinearHeatCapacity : IHeatCapacity
{
    /// <summary>Creates the model Cp = <paramref name="intercept"/> + <paramref name="slope"/>·T.</summary>
    /// <param name="intercept">a in J/(mol·K).</param>
    /// <param name="slope">b in J/(mol·K²).</param>
    /// <param name="validRange">The range it is valid over; <see cref="TemperatureRange.Unbounded"/> when omitted.</param>
    public LinearHeatCapacity(double intercept, double slope, TemperatureRange? validRange = null)
    {
        if (!double.IsFinite(intercept) || !double.IsFinite(slope))
        {
            throw new ArgumentOutOfRangeException(nameof(intercept), "The coefficients must be finite.");
        }

        Intercept = intercept;
        Slope = slope;
        ValidRange = validRange ?? TemperatureRange.Unbounded;
    }

    /// <summary>a in J/(mol·K).</summary>
    public double Intercept { get; }

    /// <summary>b in J/(mol·K²).</summary>
    public double Slope { get; }

    /// <inheritdoc />
    public TemperatureRange ValidRange { get; }

    /// <inheritdoc />
    public double HeatCapacity(double temperature)
    {
        Temperature.RequirePositive(temperature, nameof(temperature));
        return Intercept + (Slope * temperature);
    }

    /// <inheritdoc />
    public double IntegrateHeatCapacity(double from, double to)
    {
        Temperature.RequirePositive(from, nameof(from));
        Temperature.RequirePositive(to, nameof(to));
        return (Intercept * (to - from)) + (Slope * (to - from) * (to + from) / 2.0);
    }

    /// <inheritdoc />
    public double IntegrateHeatCapacityOverTemperature(double from, double to)
    {
        Temperature.RequirePositive(from, nameof(from));
        Temperature.RequirePositive(to, nameof(to));
        return (Intercept * Math.Log(to / from)) + (Slope * (to - from));
    }
}
