using PathFinder.Quantities;

namespace PathFinder.Thermodynamics;

/// <summary>One temperature range of the 7-coefficient NASA polynomial for Cp, H and S of a species.</summary>
/// <remarks>
/// With T in K and R the molar gas constant (<see cref="PhysicalConstants.GasConstant"/>):
/// <code>
/// Cp/R  = a1 + a2·T + a3·T² + a4·T³ + a5·T⁴
/// H/(RT) = a1 + a2·T/2 + a3·T²/3 + a4·T³/4 + a5·T⁴/5 + a6/T
/// S/R   = a1·ln T + a2·T + a3·T²/2 + a4·T³/3 + a5·T⁴/4 + a7
/// </code>
/// The integrals ∫Cp dT and ∫Cp/T dT use only a1…a5; a6 and a7 fix the absolute H and S scales
/// (H includes the enthalpy of formation at 298.15 K in the usual convention).
/// The usual data set has two ranges joined at Tmid; build it with <see cref="TwoRange"/>.
/// </remarks>
public sealed class Nasa7Polynomial : IHeatCapacity
{
    private readonly double[] _a;

    /// <summary>Creates one range from the seven coefficients a1…a7.</summary>
    /// <param name="coefficients">Exactly seven finite numbers a1…a7 (dimensionless with T in K).</param>
    /// <param name="validRange">The temperature range of this set.</param>
    public Nasa7Polynomial(IReadOnlyList<double> coefficients, TemperatureRange validRange)
    {
        ArgumentNullException.ThrowIfNull(coefficients);
        if (coefficients.Count != 7)
        {
            throw new ArgumentException($"A NASA 7-coefficient polynomial needs 7 coefficients, got {coefficients.Count}.", nameof(coefficients));
        }

        if (coefficients.Any(c => !double.IsFinite(c)))
        {
            throw new ArgumentException("The coefficients must be finite.", nameof(coefficients));
        }

        _a = [.. coefficients];
        ValidRange = validRange;
    }

    /// <summary>The coefficients a1…a7 (index 0 is a1).</summary>
    public IReadOnlyList<double> Coefficients => _a;

    /// <inheritdoc />
    public TemperatureRange ValidRange { get; }

    /// <summary>Builds the usual two-range data set: <paramref name="low"/> on [tmin, tmid], <paramref name="high"/> on [tmid, tmax].</summary>
    /// <param name="low">a1…a7 for the low range.</param>
    /// <param name="high">a1…a7 for the high range.</param>
    /// <param name="minimum">Tmin in K.</param>
    /// <param name="middle">Tmid in K (often 1000 K).</param>
    /// <param name="maximum">Tmax in K.</param>
    public static PiecewiseHeatCapacity TwoRange(IReadOnlyList<double> low, IReadOnlyList<double> high, double minimum, double middle, double maximum) =>
        new([
            new Nasa7Polynomial(low, new TemperatureRange(minimum, middle)),
            new Nasa7Polynomial(high, new TemperatureRange(middle, maximum)),
        ]);

    /// <inheritdoc />
    public double HeatCapacity(double temperature)
    {
        Temperature.RequirePositive(temperature, nameof(temperature));
        double t = temperature;
        return PhysicalConstants.GasConstant * (_a[0] + (t * (_a[1] + (t * (_a[2] + (t * (_a[3] + (t * _a[4]))))))));
    }

    /// <inheritdoc />
    public double IntegrateHeatCapacity(double from, double to)
    {
        Temperature.RequirePositive(from, nameof(from));
        Temperature.RequirePositive(to, nameof(to));
        return PhysicalConstants.GasConstant * (Antiderivative(to) - Antiderivative(from));
    }

    /// <inheritdoc />
    public double IntegrateHeatCapacityOverTemperature(double from, double to)
    {
        Temperature.RequirePositive(from, nameof(from));
        Temperature.RequirePositive(to, nameof(to));
        return PhysicalConstants.GasConstant * ((_a[0] * Math.Log(to / from)) + (EntropyPolynomial(to) - EntropyPolynomial(from)));
    }

    /// <summary>The absolute molar enthalpy H°(T) on the polynomial's own scale, in J/mol: R·T·(H/RT).</summary>
    /// <param name="temperature">Temperature in K (&gt; 0).</param>
    public double Enthalpy(double temperature)
    {
        Temperature.RequirePositive(temperature, nameof(temperature));
        return PhysicalConstants.GasConstant * (Antiderivative(temperature) + _a[5]);
    }

    /// <summary>The absolute molar entropy S°(T) at standard pressure, in J/(mol·K): R·(S/R).</summary>
    /// <param name="temperature">Temperature in K (&gt; 0).</param>
    public double Entropy(double temperature)
    {
        Temperature.RequirePositive(temperature, nameof(temperature));
        return PhysicalConstants.GasConstant * ((_a[0] * Math.Log(temperature)) + EntropyPolynomial(temperature) + _a[6]);
    }

    // ∫(Cp/R) dT without the a6 constant: a1·T + a2·T²/2 + a3·T³/3 + a4·T⁴/4 + a5·T⁵/5.
    private double Antiderivative(double t) =>
        t * (_a[0] + (t * ((_a[1] / 2.0) + (t * ((_a[2] / 3.0) + (t * ((_a[3] / 4.0) + (t * _a[4] / 5.0))))))));

    // ∫(Cp/R)/T dT without a1·ln T and a7: a2·T + a3·T²/2 + a4·T³/3 + a5·T⁴/4.
    private double EntropyPolynomial(double t) =>
        t * (_a[1] + (t * ((_a[2] / 2.0) + (t * ((_a[3] / 3.0) + (t * _a[4] / 4.0))))));
}
