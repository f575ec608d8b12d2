namespace PathFinder.Thermodynamics;

/// <summary>One temperature range of the Shomate equation for Cp, with the optional F, G, H constants for H° − H°(298.15 K) and S°.</summary>
/// <remarks>
/// With t = T/(1000 K), in the published form:
/// <code>
/// Cp           = A + B·t + C·t² + D·t³ + E/t²                      J/(mol·K)
/// H° − H°298.15 = A·t + B·t²/2 + C·t³/3 + D·t⁴/4 − E/t + F − H      kJ/mol
/// S°           = A·ln t + B·t + C·t²/2 + D·t³/3 − E/(2·t²) + G      J/(mol·K)
/// </code>
/// This class returns energies in J/mol (the published kJ/mol form times 1000).
/// ∫Cp dT = 1000·[A·t + B·t²/2 + C·t³/3 + D·t⁴/4 − E/t] between the limits, in J/mol;
/// ∫Cp/T dT = [A·ln t + B·t + C·t²/2 + D·t³/3 − E/(2t²)] between the limits, in J/(mol·K).
/// F and H (kJ/mol) and G (J/(mol·K)) are optional; they are needed only for <see cref="EnthalpyIncrement"/> and <see cref="Entropy"/>.
/// </remarks>
public sealed class ShomateEquation : IHeatCapacity
{
    /// <summary>Creates one range.</summary>
    /// <param name="a">A in J/(mol·K).</param>
    /// <param name="b">B in J/(mol·K) per t.</param>
    /// <param name="c">C in J/(mol·K) per t².</param>
    /// <param name="d">D in J/(mol·K) per t³.</param>
    /// <param name="e">E in J/(mol·K)·t².</param>
    /// <param name="validRange">The temperature range of this set.</param>
    /// <param name="f">F in kJ/mol, or <see langword="null"/>.</param>
    /// <param name="g">G in J/(mol·K), or <see langword="null"/>.</param>
    /// <param name="h">H in kJ/mol (the enthalpy of formation at 298.15 K in the published tables), or <see langword="null"/>.</param>
    public ShomateEquation(double a, double b, double c, double d, double e, TemperatureRange validRange, double? f = null, double? g = null, double? h = null)
    {
        double[] all = [a, b, c, d, e, f ?? 0.0, g ?? 0.0, h ?? 0.0];
        if (all.Any(x => !double.IsFinite(x)))
        {
            throw new ArgumentException("The Shomate coefficients must be finite.");
        }

        A = a;
        B = b;
        C = c;
        D = d;
        E = e;
        F = f;
        G = g;
        H = h;
        ValidRange = validRange;
    }

    /// <summary>A in J/(mol·K).</summary>
    public double A { get; }

    /// <summary>B in J/(mol·K).</summary>
    public double B { get; }

    /// <summary>C in J/(mol·K).</summary>
    public double C { get; }

    /// <summary>D in J/(mol·K).</summary>
    public double D { get; }

    /// <summary>E in J/(mol·K).</summary>
    public double E { get; }

    /// <summary>F in kJ/mol, when given.</summary>
    public double? F { get; }

    /// <summary>G in J/(mol·K), when given.</summary>
    public double? G { get; }

    /// <summary>H in kJ/mol, when given.</summary>
    public double? H { get; }

    /// <inheritdoc />
    public TemperatureRange ValidRange { get; }

    /// <inheritdoc />
    public double HeatCapacity(double temperature)
    {
        Temperature.RequirePositive(temperature, nameof(temperature));
        double t = temperature / 1000.0;
        return A + (t * (B + (t * (C + (t * D))))) + (E / (t * t));
    }

    /// <inheritdoc />
    public double IntegrateHeatCapacity(double from, double to)
    {
        Temperature.RequirePositive(from, nameof(from));
        Temperature.RequirePositive(to, nameof(to));
        return 1000.0 * (EnthalpyAntiderivative(to / 1000.0) - EnthalpyAntiderivative(from / 1000.0));
    }

    /// <inheritdoc />
    public double IntegrateHeatCapacityOverTemperature(double from, double to)
    {
        Temperature.RequirePositive(from, nameof(from));
        Temperature.RequirePositive(to, nameof(to));
        return (A * Math.Log(to / from)) + EntropyPolynomial(to / 1000.0) - EntropyPolynomial(from / 1000.0);
    }

    /// <summary>H°(T) − H°(298.15 K) in J/mol from the published form with F and H.</summary>
    /// <param name="temperature">Temperature in K (&gt; 0).</param>
    /// <exception cref="InvalidOperationException">F or H was not given.</exception>
    public double EnthalpyIncrement(double temperature)
    {
        Temperature.RequirePositive(temperature, nameof(temperature));
        if (F is not double f || H is not double h)
        {
            throw new InvalidOperationException("This Shomate data set has no F and H constants.");
        }

        return 1000.0 * (EnthalpyAntiderivative(temperature / 1000.0) + f - h);
    }

    /// <summary>S°(T) in J/(mol·K) from the published form with G.</summary>
    /// <param name="temperature">Temperature in K (&gt; 0).</param>
    /// <exception cref="InvalidOperationException">G was not given.</exception>
    public double Entropy(double temperature)
    {
        Temperature.RequirePositive(temperature, nameof(temperature));
        if (G is not double g)
        {
            throw new InvalidOperationException("This Shomate data set has no G constant.");
        }

        double t = temperature / 1000.0;
        return (A * Math.Log(t)) + EntropyPolynomial(t) + g;
    }

    // A·t + B·t²/2 + C·t³/3 + D·t⁴/4 − E/t, in kJ/mol.
    private double EnthalpyAntiderivative(double t) =>
        (t * (A + (t * ((B / 2.0) + (t * ((C / 3.0) + (t * D / 4.0))))))) - (E / t);

    // B·t + C·t²/2 + D·t³/3 − E/(2t²), in J/(mol·K).
    private double EntropyPolynomial(double t) =>
        (t * (B + (t * ((C / 2.0) + (t * D / 3.0))))) - (E / (2.0 * t * t));
}
