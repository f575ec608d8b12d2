using PathFinder.Quantities;

namespace PathFinder.Thermodynamics;

/// <summary>Converts a reaction internal energy measured at constant volume (bomb calorimetry) to an enthalpy, and back.</summary>
/// <remarks>
/// ΔH = ΔU + Δn(gas)·R·T, with ΔU and ΔH in J/mol, T in K, R = <see cref="PhysicalConstants.GasConstant"/> and
/// Δn(gas) the change in amount of gaseous species per mole of reaction as written (products minus reactants; may be
/// fractional). The gases are treated as ideal and the condensed phases' p·V change is neglected, as is usual in
/// thermochemistry; the correction is taken as exact, so u(ΔH) = u(ΔU).
/// </remarks>
public static class ConstantVolumeCalorimetry
{
    /// <summary>The correction Δn(gas)·R·T in J/mol.</summary>
    /// <param name="gasAmountChange">Δn(gas), mol of gas per mole of reaction.</param>
    /// <param name="temperature">T in K (&gt; 0).</param>
    public static double Correction(double gasAmountChange, double temperature)
    {
        Temperature.RequirePositive(temperature, nameof(temperature));
        if (!double.IsFinite(gasAmountChange))
        {
            throw new ArgumentOutOfRangeException(nameof(gasAmountChange), gasAmountChange, "Δn(gas) must be finite.");
        }

        return gasAmountChange * PhysicalConstants.GasConstant * temperature;
    }

    /// <summary>ΔH = ΔU + Δn(gas)·R·T, in J/mol.</summary>
    /// <param name="internalEnergy">ΔU in J/mol.</param>
    /// <param name="gasAmountChange">Δn(gas) per mole of reaction.</param>
    /// <param name="temperature">T in K (&gt; 0).</param>
    public static double EnthalpyFromInternalEnergy(double internalEnergy, double gasAmountChange, double temperature) =>
        internalEnergy + Correction(gasAmountChange, temperature);

    /// <summary>ΔH = ΔU + Δn(gas)·R·T with u(ΔH) = u(ΔU), in J/mol.</summary>
    /// <param name="internalEnergy">ΔU in J/mol with its standard uncertainty.</param>
    /// <param name="gasAmountChange">Δn(gas) per mole of reaction.</param>
    /// <param name="temperature">T in K (&gt; 0).</param>
    public static UncertainValue EnthalpyFromInternalEnergy(UncertainValue internalEnergy, double gasAmountChange, double temperature) =>
        internalEnergy with { Value = internalEnergy.Value + Correction(gasAmountChange, temperature) };

    /// <summary>ΔU = ΔH − Δn(gas)·R·T, in J/mol.</summary>
    /// <param name="enthalpy">ΔH in J/mol.</param>
    /// <param name="gasAmountChange">Δn(gas) per mole of reaction.</param>
    /// <param name="temperature">T in K (&gt; 0).</param>
    public static double InternalEnergyFromEnthalpy(double enthalpy, double gasAmountChange, double temperature) =>
        enthalpy - Correction(gasAmountChange, temperature);

    /// <summary>ΔU = ΔH − Δn(gas)·R·T with u(ΔU) = u(ΔH), in J/mol.</summary>
    /// <param name="enthalpy">ΔH in J/mol with its standard uncertainty.</param>
    /// <param name="gasAmountChange">Δn(gas) per mole of reaction.</param>
    /// <param name="temperature">T in K (&gt; 0).</param>
    public static UncertainValue InternalEnergyFromEnthalpy(UncertainValue enthalpy, double gasAmountChange, double temperature) =>
        enthalpy with { Value = enthalpy.Value - Correction(gasAmountChange, temperature) };
}
