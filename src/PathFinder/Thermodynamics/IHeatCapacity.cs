namespace PathFinder.Thermodynamics;

/// <summary>The molar isobaric heat capacity Cp(T) of one species, with its analytic integrals and its valid temperature range.</summary>
/// <remarks>
/// Units: temperatures in K, Cp in J/(mol·K), ∫Cp dT in J/mol, ∫Cp/T dT in J/(mol·K).
/// Integrals are analytic (closed form), taken from <c>from</c> to <c>to</c>: swapping the bounds changes the sign.
/// Outside <see cref="ValidRange"/> a model extrapolates its nearest piece and does not throw; use
/// <see cref="HeatCapacityExtensions.CheckInterval"/> or <see cref="HeatCapacityExtensions.CheckTemperature"/> to obtain a warning to pass on.
/// Non-positive or non-finite temperatures are programming errors and throw <see cref="ArgumentOutOfRangeException"/>.
/// </remarks>
public interface IHeatCapacity
{
    /// <summary>The temperature range the data are valid over.</summary>
    TemperatureRange ValidRange { get; }

    /// <summary>Cp at <paramref name="temperature"/>, in J/(mol·K).</summary>
    /// <param name="temperature">Temperature in K (&gt; 0).</param>
    double HeatCapacity(double temperature);

    /// <summary>∫ Cp dT from <paramref name="from"/> to <paramref name="to"/>, in J/mol (the enthalpy change on heating).</summary>
    /// <param name="from">Lower limit in K (&gt; 0).</param>
    /// <param name="to">Upper limit in K (&gt; 0).</param>
    double IntegrateHeatCapacity(double from, double to);

    /// <summary>∫ Cp/T dT from <paramref name="from"/> to <paramref name="to"/>, in J/(mol·K) (the entropy change on heating).</summary>
    /// <param name="from">Lower limit in K (&gt; 0).</param>
    /// <param name="to">Upper limit in K (&gt; 0).</param>
    double IntegrateHeatCapacityOverTemperature(double from, double to);
}
