namespace PathFinder.Quantities;

/// <summary>Data codes, symbols and dimensions of <see cref="ThermoProperty"/> values.</summary>
public static class ThermoProperties
{
    /// <summary>The codes accepted in the <c>property</c> column, in documentation order.</summary>
    public static IReadOnlyList<string> Codes { get; } = ["dH", "dG", "dS", "dU", "S", "lnK", "log10K"];

    /// <summary>The data code: dH, dG, dS, dU, S, lnK or log10K.</summary>
    public static string Code(this ThermoProperty property) => property switch
    {
        ThermoProperty.Enthalpy => "dH",
        ThermoProperty.GibbsEnergy => "dG",
        ThermoProperty.Entropy => "dS",
        ThermoProperty.InternalEnergy => "dU",
        ThermoProperty.AbsoluteEntropy => "S",
        ThermoProperty.LnEquilibriumConstant => "lnK",
        ThermoProperty.Log10EquilibriumConstant => "log10K",
        _ => throw new ArgumentOutOfRangeException(nameof(property)),
    };

    /// <summary>The printed symbol: ΔH, ΔG, ΔS, ΔU, S°, ln K or log₁₀ K.</summary>
    public static string Symbol(this ThermoProperty property) => property switch
    {
        ThermoProperty.Enthalpy => "ΔH",
        ThermoProperty.GibbsEnergy => "ΔG",
        ThermoProperty.Entropy => "ΔS",
        ThermoProperty.InternalEnergy => "ΔU",
        ThermoProperty.AbsoluteEntropy => "S°",
        ThermoProperty.LnEquilibriumConstant => "ln K",
        ThermoProperty.Log10EquilibriumConstant => "log₁₀ K",
        _ => throw new ArgumentOutOfRangeException(nameof(property)),
    };

    /// <summary>Whether values are molar energies (kJ/mol): ΔH, ΔG, ΔU.</summary>
    public static bool IsEnergy(this ThermoProperty property) =>
        property is ThermoProperty.Enthalpy or ThermoProperty.GibbsEnergy or ThermoProperty.InternalEnergy;

    /// <summary>Whether the property is an equilibrium constant (ln K or log₁₀ K), which the model reads as ΔrG° = −RT·ln K.</summary>
    public static bool IsEquilibriumConstant(this ThermoProperty property) =>
        property is ThermoProperty.LnEquilibriumConstant or ThermoProperty.Log10EquilibriumConstant;

    /// <summary>What the property's values measure: molar energy, molar entropy, or a pure number.</summary>
    public static UnitDimension Dimension(this ThermoProperty property) =>
        property.IsEnergy() ? UnitDimension.MolarEnergy
        : property.IsEquilibriumConstant() ? UnitDimension.Dimensionless
        : UnitDimension.MolarEntropy;

    /// <summary>The canonical unit values are held in: kJ/mol for energies, J/(mol·K) for entropies, 1 for ln K and log₁₀ K.</summary>
    public static EnergyUnit CanonicalUnit(this ThermoProperty property) => property.Dimension() switch
    {
        UnitDimension.MolarEnergy => EnergyUnit.KilojoulePerMole,
        UnitDimension.MolarEntropy => EnergyUnit.JoulePerMoleKelvin,
        _ => EnergyUnit.Dimensionless,
    };

    /// <summary>Reads a data code (case-insensitive; <c>S</c> and <c>s</c> both mean S°; <c>lnK</c>, <c>log10K</c>, also <c>logK</c>).</summary>
    public static bool TryParse(string code, out ThermoProperty property)
    {
        switch (code.Trim().ToLowerInvariant())
        {
            case "dh":
                property = ThermoProperty.Enthalpy;
                return true;
            case "dg":
                property = ThermoProperty.GibbsEnergy;
                return true;
            case "ds":
                property = ThermoProperty.Entropy;
                return true;
            case "du":
                property = ThermoProperty.InternalEnergy;
                return true;
            case "s":
                property = ThermoProperty.AbsoluteEntropy;
                return true;
            case "lnk":
                property = ThermoProperty.LnEquilibriumConstant;
                return true;
            case "log10k" or "logk":
                property = ThermoProperty.Log10EquilibriumConstant;
                return true;
            default:
                property = default;
                return false;
        }
    }
}
