using PathFinder.Chemistry;
using PathFinder.Quantities;

namespace PathFinder.Analysis;

/// <summary>A group of properties analysed together because they measure one state function.</summary>
/// <remarks>
/// ΔH and ΔU measurements both become enthalpy equations (ΔU is converted with Δn(gas)·R·T); ΔS and S°
/// measurements both constrain absolute entropies (ΔrS = Σν·S°); ΔG stands alone.
/// </remarks>
public enum PropertyFamily
{
    /// <summary>Enthalpy: ΔH and ΔU data; unknowns are ΔfH°, in kJ/mol.</summary>
    Enthalpy,

    /// <summary>Gibbs energy: ΔG data; unknowns are ΔfG°, in kJ/mol.</summary>
    GibbsEnergy,

    /// <summary>Entropy: ΔS and S° data; unknowns are absolute S°, in J/(mol·K).</summary>
    Entropy,
}

/// <summary>How measurements map onto property families and which species each family fixes by convention.</summary>
public static class PropertyFamilies
{
    /// <summary>The family a property belongs to.</summary>
    public static PropertyFamily FamilyOf(ThermoProperty property) => property switch
    {
        ThermoProperty.Enthalpy or ThermoProperty.InternalEnergy => PropertyFamily.Enthalpy,
        ThermoProperty.GibbsEnergy or ThermoProperty.LnEquilibriumConstant or ThermoProperty.Log10EquilibriumConstant => PropertyFamily.GibbsEnergy,
        ThermoProperty.Entropy or ThermoProperty.AbsoluteEntropy => PropertyFamily.Entropy,
        _ => throw new ArgumentOutOfRangeException(nameof(property)),
    };

    /// <summary>The family of a data code such as <c>dU</c>.</summary>
    public static PropertyFamily FamilyOf(string code) =>
        ThermoProperties.TryParse(code, out ThermoProperty property) ? FamilyOf(property) : throw new ArgumentException($"unknown property '{code}'", nameof(code));

    /// <summary>The property a family's results are expressed as (dH, dG or dS).</summary>
    public static ThermoProperty ResultProperty(this PropertyFamily family) => family switch
    {
        PropertyFamily.Enthalpy => ThermoProperty.Enthalpy,
        PropertyFamily.GibbsEnergy => ThermoProperty.GibbsEnergy,
        PropertyFamily.Entropy => ThermoProperty.Entropy,
        _ => throw new ArgumentOutOfRangeException(nameof(family)),
    };

    /// <summary>The unit of the family's values.</summary>
    public static EnergyUnit Unit(this PropertyFamily family) => family.ResultProperty().CanonicalUnit();

    /// <summary>What a species' unknown means in this family, e.g. "ΔfH°".</summary>
    public static string SpeciesQuantity(this PropertyFamily family) => family switch
    {
        PropertyFamily.Enthalpy => "ΔfH°",
        PropertyFamily.GibbsEnergy => "ΔfG°",
        _ => "S°",
    };

    /// <summary>Whether the species' value is fixed by definition or convention in this family (and so not an unknown).</summary>
    /// <remarks>
    /// Formation properties of elements in their reference states, of H+(aq) and of the electron are zero.
    /// Absolute entropies are not zero for elements; only S°(H+, aq) = 0 by convention.
    /// </remarks>
    public static bool IsFixed(this PropertyFamily family, Species species) => family switch
    {
        PropertyFamily.Entropy => species.Equals(ReferenceStates.AqueousProton),
        _ => ReferenceStates.HasZeroFormationProperties(species),
    };
}
