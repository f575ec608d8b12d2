namespace PathFinder.Quantities;

/// <summary>The state function a measurement reports.</summary>
public enum ThermoProperty
{
    /// <summary>Reaction (or formation) enthalpy ΔH, data code <c>dH</c>.</summary>
    Enthalpy,

    /// <summary>Reaction (or formation) Gibbs energy ΔG, data code <c>dG</c>.</summary>
    GibbsEnergy,

    /// <summary>Reaction (or formation) entropy ΔS, data code <c>dS</c>.</summary>
    Entropy,

    /// <summary>Reaction internal energy ΔU at constant volume (bomb calorimetry), data code <c>dU</c>.</summary>
    InternalEnergy,

    /// <summary>Absolute (third-law) entropy S° of one species, data code <c>S</c>.</summary>
    AbsoluteEntropy,

    /// <summary>Natural logarithm of a reaction's equilibrium constant, ln K (dimensionless), data code <c>lnK</c>; ΔrG°(T) = −RT·ln K.</summary>
    LnEquilibriumConstant,

    /// <summary>Decimal logarithm of a reaction's equilibrium constant, log₁₀ K (dimensionless), data code <c>log10K</c>; ln K = ln 10 · log₁₀ K.</summary>
    Log10EquilibriumConstant,
}
