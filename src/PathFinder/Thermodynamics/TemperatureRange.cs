using System.Globalization;

namespace PathFinder.Thermodynamics;

/// <summary>A closed temperature interval [Minimum, Maximum] in kelvin over which a heat-capacity model is valid.</summary>
/// <remarks>
/// Both bounds are in K. <see cref="Unbounded"/> (0 to +∞) is used by the simple test models, which claim no range.
/// Membership is tested with an absolute tolerance in K (default <see cref="DefaultTolerance"/>), because published
/// ranges such as 298 K versus 298.15 K differ by rounding.
/// </remarks>
public readonly record struct TemperatureRange
{
    /// <summary>The default tolerance, in K, used when testing whether a temperature lies in a range: 0.01 K.</summary>
    public const double DefaultTolerance = 0.01;

    /// <summary>How far, in K, a temperature may lie outside a heat-capacity model's range before its use is called an extrapolation: 10 K.</summary>
    /// <remarks>
    /// Many published polynomials start at 300 K (or end a few kelvin short of a round number) although they describe
    /// the substance at 298.15 K just as well: a heat capacity changes by a fraction of a percent over 2 K, and
    /// ∫Cp dT over 10 K at the edge of a range is tens of J/mol, far below the uncertainty of any ΔH. Without this,
    /// every calculation at 298.15 K with such data would carry an extrapolation note. Common practice, no source:
    /// tables are used a few kelvin beyond their stated limits without comment.
    /// </remarks>
    public const double ExtrapolationTolerance = 10.0;

    /// <summary>Creates a range; the bounds must satisfy 0 ≤ <paramref name="minimum"/> &lt; <paramref name="maximum"/>.</summary>
    /// <param name="minimum">Lower bound in K (finite, non-negative).</param>
    /// <param name="maximum">Upper bound in K (greater than the minimum; may be +∞).</param>
    public TemperatureRange(double minimum, double maximum)
    {
        if (!double.IsFinite(minimum) || minimum < 0.0)
        {
            throw new ArgumentOutOfRangeException(nameof(minimum), minimum, "The lower temperature bound must be finite and non-negative.");
        }

        if (double.IsNaN(maximum) || !(maximum > minimum))
        {
            throw new ArgumentOutOfRangeException(nameof(maximum), maximum, "The upper temperature bound must exceed the lower bound.");
        }

        Minimum = minimum;
        Maximum = maximum;
    }

    /// <summary>The range from 0 K to +∞, for models that claim no limits.</summary>
    public static TemperatureRange Unbounded => new(0.0, double.PositiveInfinity);

    /// <summary>Lower bound in K.</summary>
    public double Minimum { get; }

    /// <summary>Upper bound in K (may be +∞).</summary>
    public double Maximum { get; }

    /// <summary>Whether <paramref name="temperature"/> lies in the range, widened by <paramref name="tolerance"/> on both sides.</summary>
    /// <param name="temperature">Temperature in K.</param>
    /// <param name="tolerance">Absolute tolerance in K; default <see cref="DefaultTolerance"/>.</param>
    public bool Contains(double temperature, double tolerance = DefaultTolerance) =>
        temperature >= Minimum - tolerance && temperature <= Maximum + tolerance;

    /// <summary>Whether the whole interval between two temperatures (in either order) lies in the range, within <paramref name="tolerance"/>.</summary>
    /// <param name="first">One end in K.</param>
    /// <param name="second">The other end in K.</param>
    /// <param name="tolerance">Absolute tolerance in K; default <see cref="DefaultTolerance"/>.</param>
    public bool ContainsInterval(double first, double second, double tolerance = DefaultTolerance) =>
        Contains(Math.Min(first, second), tolerance) && Contains(Math.Max(first, second), tolerance);

    /// <summary>Formats as <c>298.15–1000 K</c> with invariant culture.</summary>
    public override string ToString() =>
        string.Create(CultureInfo.InvariantCulture, $"{Minimum:G}–{Maximum:G} K");
}
