using System.Globalization;

namespace PathFinder.Thermodynamics;

/// <summary>A measured value with its standard uncertainty (one standard deviation), in the units of the quantity it stands for.</summary>
/// <remarks>
/// Used by the Gibbs relations of this namespace. Energies are in J/mol, entropies in J/(mol·K).
/// A standard uncertainty of 0 means "exact" (or unknown and ignored).
/// </remarks>
/// <param name="Value">The value.</param>
/// <param name="StandardUncertainty">The standard uncertainty u, non-negative.</param>
public readonly record struct UncertainValue(double Value, double StandardUncertainty = 0.0)
{
    /// <summary>A value taken as exact.</summary>
    /// <param name="value">The value.</param>
    public static UncertainValue Exact(double value) => new(value, 0.0);

    /// <summary>Formats as <c>value ± u</c> with invariant culture.</summary>
    public override string ToString() =>
        string.Create(CultureInfo.InvariantCulture, $"{Value:G} ± {StandardUncertainty:G}");
}
