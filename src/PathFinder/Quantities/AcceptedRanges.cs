using System.Globalization;

namespace PathFinder.Quantities;

/// <summary>The magnitudes a data set may hold: values, uncertainties and temperatures beyond them are refused at read time.</summary>
/// <remarks>
/// <para>The bounds are wide enough for every real thermochemical datum and narrow enough that no sum, square or
/// weight the analyses form can overflow or vanish in double precision. In canonical units:</para>
/// <list type="bullet">
/// <item>Energies (ΔH, ΔG, ΔU), per mole of reaction as written: |value| ≤ 1e5 kJ/mol. The combustion of large
/// molecules reaches about 2e4 kJ/mol (common practice, no source).</item>
/// <item>Entropies (ΔS, S°): |value| ≤ 1e5 J/(mol·K); absolute entropies of large molecules stay below about 1e4.</item>
/// <item>Equilibrium constants: |ln K| ≤ 1000, so |log₁₀ K| ≤ 1000/ln 10 ≈ 434.29 (real data stay within a few hundred).</item>
/// <item>Standard uncertainties: at most the value bound, and at least the larger of 1e-9·|value| and an absolute floor
/// (1e-6 kJ/mol, 1e-6 J/(mol·K), 1e-6 in ln K or log₁₀ K): no measurement is more precise, and a smaller one would
/// give a weight that swamps every other datum in the least-squares normal matrix.</item>
/// <item>Temperatures of measurements: 1 K to 10,000 K.</item>
/// <item>Heat capacities (<c>heat-capacity.csv</c>): ranges end at most at 20,000 K (NASA fits reach 6,000 K, some
/// 20,000 K), and Cp across each range is finite and at most 1e5 J/(mol·K) in magnitude.</item>
/// </list>
/// </remarks>
public static class AcceptedRanges
{
    /// <summary>The largest |energy| accepted, kJ/mol per mole of reaction as written.</summary>
    public const double MaxEnergy = 1e5;

    /// <summary>The largest |entropy| accepted, J/(mol·K).</summary>
    public const double MaxEntropy = 1e5;

    /// <summary>The largest |ln K| accepted.</summary>
    public const double MaxLnK = 1000.0;

    /// <summary>The smallest uncertainty accepted relative to the value's magnitude.</summary>
    public const double RelativeUncertaintyFloor = 1e-9;

    /// <summary>The smallest absolute uncertainty accepted, in the canonical unit of every dimension.</summary>
    public const double AbsoluteUncertaintyFloor = 1e-6;

    /// <summary>The lowest measurement temperature accepted, K.</summary>
    public const double MinTemperature = 1.0;

    /// <summary>The highest measurement temperature accepted, K.</summary>
    public const double MaxTemperature = 10000.0;

    /// <summary>The highest temperature a heat-capacity range may reach, K.</summary>
    public const double MaxHeatCapacityTemperature = 20000.0;

    /// <summary>The largest |Cp| accepted anywhere in a heat-capacity range, J/(mol·K).</summary>
    public const double MaxHeatCapacity = 1e5;

    /// <summary>The largest magnitude accepted for a value of <paramref name="property"/>, in its canonical unit.</summary>
    public static double MaxMagnitude(ThermoProperty property) => property switch
    {
        ThermoProperty.LnEquilibriumConstant => MaxLnK,
        ThermoProperty.Log10EquilibriumConstant => MaxLnK / Math.Log(10.0),
        _ => MaxMagnitude(property.Dimension()),
    };

    /// <summary>The largest magnitude accepted for a value of a dimension, in its canonical unit (ln K for pure numbers).</summary>
    public static double MaxMagnitude(UnitDimension dimension) => dimension switch
    {
        UnitDimension.MolarEnergy => MaxEnergy,
        UnitDimension.MolarEntropy => MaxEntropy,
        _ => MaxLnK,
    };

    /// <summary>The smallest standard uncertainty accepted for <paramref name="value"/> (canonical unit): max(1e-6, 1e-9·|value|).</summary>
    public static double MinUncertainty(double value) => Math.Max(AbsoluteUncertaintyFloor, RelativeUncertaintyFloor * Math.Abs(value));

    /// <summary>Whether a canonical value lies within <see cref="MaxMagnitude(ThermoProperty)"/> (and is finite).</summary>
    public static bool IsValueAccepted(ThermoProperty property, double value) =>
        double.IsFinite(value) && Math.Abs(value) <= MaxMagnitude(property);

    /// <summary>Whether a canonical standard uncertainty of a value lies between <see cref="MinUncertainty"/> and the value bound.</summary>
    public static bool IsUncertaintyAccepted(ThermoProperty property, double value, double uncertainty) =>
        double.IsFinite(uncertainty) && uncertainty >= MinUncertainty(value) && uncertainty <= MaxMagnitude(property);

    /// <summary>Whether a measurement temperature lies within 1–10,000 K.</summary>
    public static bool IsTemperatureAccepted(double temperature) =>
        temperature is >= MinTemperature and <= MaxTemperature;

    /// <summary>A number for messages: up to 6 significant digits, invariant culture, a small <c>e</c> for the exponent.</summary>
    public static string Format(double value) => value.ToString("G6", CultureInfo.InvariantCulture).Replace('E', 'e');
}
