namespace PathFinder.Quantities;

/// <summary>What a unit measures.</summary>
public enum UnitDimension
{
    /// <summary>Molar energy (ΔH, ΔG, ΔU), canonical unit kJ/mol.</summary>
    MolarEnergy,

    /// <summary>Molar entropy (ΔS, S°), canonical unit J/(mol·K).</summary>
    MolarEntropy,

    /// <summary>A pure number (ln K, log₁₀ K), unit <c>1</c>.</summary>
    Dimensionless,
}
