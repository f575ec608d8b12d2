namespace PathFinder.Quantities;

/// <summary>Data codes, symbols and dimensions of <see cref="ThermoProperty"/> values.</summary>
public static class ThermoProperties
{
    /// <summary>The codes accepted in the <c>property</c> column, in documentation order.</summary>
    public static IReadOnlyList<string> Codes { get; } = ["dH", "dG", "dS", "dU", "S"];

    /// <summary>The data code: dH, dG, dS, dU or S.</summary>
    public static string Code(this ThermoProperty property) => property switch
    {
        ThermoProperty.Enthalpy => "dH",
        ThermoProperty.GibbsEnergy => "dG",
        ThermoProperty.Entropy => "dS",
        ThermoProperty.InternalEnergy => "dU",
        ThermoProperty.AbsoluteEntropy => "S",
        _ => throw new ArgumentOutOfRangeException(nameof(property)),
    };

    /// <summary>The printed symbol: ΔH, ΔG, ΔS, ΔU or S°.</summary>
    public static string Symbol(this ThermoProperty property) => property switch
    {
        ThermoProperty.Enthalpy => "ΔH",
        ThermoProperty.GibbsEnergy => "ΔG",
        ThermoProperty.Entropy => "ΔS",
        ThermoProperty.InternalEnergy => "ΔU",
        ThermoProperty.AbsoluteEntropy => "S°",
        _ => throw new ArgumentOutOfRangeException(nameof(property)),
    };

    /// <summary>Whether values are molar energies (kJ/mol) rather than molar entropies (J/(mol·K)).</summary>
    public static bool IsEnergy(this ThermoProperty property) =>
        property is ThermoProperty.Enthalpy or ThermoProperty.GibbsEnergy or ThermoProperty.InternalEnergy;

    /// <summary>The canonical unit values are held in: kJ/mol for energies, J/(mol·K) for entropies.</summary>
    public static EnergyUnit CanonicalUnit(this ThermoProperty property) =>
        property.IsEnergy() ? EnergyUnit.KilojoulePerMole : EnergyUnit.JoulePerMoleKelvin;

    /// <summary>Reads a data code (case-insensitive for the Δ codes; <c>S</c> and <c>s</c> both mean S°).</summary>
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
            default:
                property = default;
                return false;
        }
    }
}
