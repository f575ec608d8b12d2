using PathFinder.Quantities;

namespace PathFinder.Thermodynamics;

/// <summary>ΔG = ΔH − T·ΔS, equilibrium constants and the consistency check of (ΔH, ΔS, ΔG), with first-order uncertainty propagation.</summary>
/// <remarks>
/// Units: ΔH and ΔG in J/mol, ΔS in J/(mol·K), T in K (exact). R = <see cref="PhysicalConstants.GasConstant"/>.
/// Uncertainties are standard uncertainties propagated linearly (GUM first order); covariances are optional and default
/// to 0 (independent measurements). Covariances are in the product of the two quantities' units.
/// </remarks>
public static class GibbsRelations
{
    /// <summary>ΔG = ΔH − T·ΔS with u²(ΔG) = u²(ΔH) + T²·u²(ΔS) − 2·T·cov(ΔH, ΔS).</summary>
    /// <param name="enthalpy">ΔH in J/mol.</param>
    /// <param name="entropy">ΔS in J/(mol·K).</param>
    /// <param name="temperature">T in K (&gt; 0).</param>
    /// <param name="covariance">cov(ΔH, ΔS) in J²/(mol²·K); default 0.</param>
    public static UncertainValue GibbsEnergy(UncertainValue enthalpy, UncertainValue entropy, double temperature, double covariance = 0.0)
    {
        Temperature.RequirePositive(temperature, nameof(temperature));
        double t = temperature;
        double variance = Square(enthalpy.StandardUncertainty) + (t * t * Square(entropy.StandardUncertainty)) - (2.0 * t * covariance);
        return new UncertainValue(enthalpy.Value - (t * entropy.Value), SafeSqrt(variance));
    }

    /// <summary>ΔS = (ΔH − ΔG)/T with u²(ΔS) = [u²(ΔH) + u²(ΔG) − 2·cov(ΔH, ΔG)]/T².</summary>
    /// <param name="enthalpy">ΔH in J/mol.</param>
    /// <param name="gibbsEnergy">ΔG in J/mol.</param>
    /// <param name="temperature">T in K (&gt; 0).</param>
    /// <param name="covariance">cov(ΔH, ΔG) in J²/mol²; default 0.</param>
    public static UncertainValue Entropy(UncertainValue enthalpy, UncertainValue gibbsEnergy, double temperature, double covariance = 0.0)
    {
        Temperature.RequirePositive(temperature, nameof(temperature));
        double variance = Square(enthalpy.StandardUncertainty) + Square(gibbsEnergy.StandardUncertainty) - (2.0 * covariance);
        return new UncertainValue((enthalpy.Value - gibbsEnergy.Value) / temperature, SafeSqrt(variance) / temperature);
    }

    /// <summary>ΔH = ΔG + T·ΔS with u²(ΔH) = u²(ΔG) + T²·u²(ΔS) + 2·T·cov(ΔG, ΔS).</summary>
    /// <param name="gibbsEnergy">ΔG in J/mol.</param>
    /// <param name="entropy">ΔS in J/(mol·K).</param>
    /// <param name="temperature">T in K (&gt; 0).</param>
    /// <param name="covariance">cov(ΔG, ΔS) in J²/(mol²·K); default 0.</param>
    public static UncertainValue Enthalpy(UncertainValue gibbsEnergy, UncertainValue entropy, double temperature, double covariance = 0.0)
    {
        Temperature.RequirePositive(temperature, nameof(temperature));
        double t = temperature;
        double variance = Square(gibbsEnergy.StandardUncertainty) + (t * t * Square(entropy.StandardUncertainty)) + (2.0 * t * covariance);
        return new UncertainValue(gibbsEnergy.Value + (t * entropy.Value), SafeSqrt(variance));
    }

    /// <summary>The equilibrium constant from ΔrG°: ln K = −ΔrG°/(R·T), u(ln K) = u(ΔrG°)/(R·T).</summary>
    /// <param name="gibbsEnergy">ΔrG° in J/mol.</param>
    /// <param name="temperature">T in K (&gt; 0).</param>
    public static EquilibriumConstant EquilibriumConstant(UncertainValue gibbsEnergy, double temperature)
    {
        Temperature.RequirePositive(temperature, nameof(temperature));
        double rt = PhysicalConstants.GasConstant * temperature;
        return new EquilibriumConstant(-gibbsEnergy.Value / rt, gibbsEnergy.StandardUncertainty / rt, temperature);
    }

    /// <summary>The equilibrium constant from ΔrH° and ΔrS° at the same temperature (ΔrG° = ΔrH° − T·ΔrS° first).</summary>
    /// <param name="enthalpy">ΔrH° in J/mol.</param>
    /// <param name="entropy">ΔrS° in J/(mol·K).</param>
    /// <param name="temperature">T in K (&gt; 0).</param>
    /// <param name="covariance">cov(ΔrH°, ΔrS°) in J²/(mol²·K); default 0.</param>
    public static EquilibriumConstant EquilibriumConstant(UncertainValue enthalpy, UncertainValue entropy, double temperature, double covariance = 0.0) =>
        EquilibriumConstant(GibbsEnergy(enthalpy, entropy, temperature, covariance), temperature);

    /// <summary>Checks ΔG = ΔH − T·ΔS: r = ΔG − ΔH + T·ΔS, u²(r) = u²(ΔG) + u²(ΔH) + T²·u²(ΔS) − 2·T·cov(ΔH, ΔS).</summary>
    /// <param name="enthalpy">ΔH in J/mol.</param>
    /// <param name="entropy">ΔS in J/(mol·K).</param>
    /// <param name="gibbsEnergy">ΔG in J/mol.</param>
    /// <param name="temperature">T in K (&gt; 0), the same for all three.</param>
    /// <param name="covariance">cov(ΔH, ΔS) in J²/(mol²·K); default 0 (ΔG is taken as independent of both).</param>
    public static GibbsConsistency CheckConsistency(UncertainValue enthalpy, UncertainValue entropy, UncertainValue gibbsEnergy, double temperature, double covariance = 0.0)
    {
        Temperature.RequirePositive(temperature, nameof(temperature));
        UncertainValue predicted = GibbsEnergy(enthalpy, entropy, temperature, covariance);
        double residual = gibbsEnergy.Value - predicted.Value;
        double combined = Math.Sqrt(Square(gibbsEnergy.StandardUncertainty) + Square(predicted.StandardUncertainty));
        return new GibbsConsistency(temperature, residual, combined);
    }

    private static double Square(double x) => x * x;

    // A covariance larger than the variances allow would make the variance negative; clamp rather than return NaN.
    private static double SafeSqrt(double variance) => Math.Sqrt(Math.Max(variance, 0.0));
}
