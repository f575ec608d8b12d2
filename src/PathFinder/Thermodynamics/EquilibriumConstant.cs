using PathFinder.Quantities;

namespace PathFinder.Thermodynamics;

/// <summary>A thermodynamic equilibrium constant stored as ln K with its standard uncertainty, at a temperature.</summary>
/// <remarks>
/// ln K = −ΔrG°/(R·T) with ΔrG° in J/mol, T in K, R = <see cref="PhysicalConstants.GasConstant"/>; u(ln K) = u(ΔrG°)/(R·T).
/// K is dimensionless (standard state 1 bar). ln K is kept rather than K because K overflows a double for |ΔrG°| of a few MJ/mol.
/// </remarks>
/// <param name="LnK">Natural logarithm of K.</param>
/// <param name="LnKUncertainty">Standard uncertainty of ln K.</param>
/// <param name="Temperature">Temperature in K.</param>
public readonly record struct EquilibriumConstant(double LnK, double LnKUncertainty, double Temperature)
{
    /// <summary>K itself (may be 0 or +∞ when ln K is outside about ±709).</summary>
    public double K => Math.Exp(LnK);

    /// <summary>log₁₀ K, as tabulated (log Kf) in thermochemical tables.</summary>
    public double Log10K => LnK / Math.Log(10.0);

    /// <summary>The standard uncertainty of log₁₀ K.</summary>
    public double Log10KUncertainty => LnKUncertainty / Math.Log(10.0);

    /// <summary>The relative standard uncertainty of K to first order, u(K)/K = u(ln K).</summary>
    public double RelativeUncertaintyOfK => LnKUncertainty;

    /// <summary>ΔrG° = −R·T·ln K in J/mol, with its standard uncertainty R·T·u(ln K).</summary>
    public UncertainValue GibbsEnergy()
    {
        double rt = PhysicalConstants.GasConstant * Temperature;
        return new UncertainValue(-rt * LnK, rt * LnKUncertainty);
    }
}
