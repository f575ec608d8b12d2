namespace PathFinder.Thermodynamics;

/// <summary>The result of moving a reaction enthalpy or entropy from one temperature to another with Kirchhoff's law.</summary>
/// <remarks>
/// For an enthalpy: <see cref="Initial"/>, <see cref="Correction"/> = ∫ΔrCp dT and <see cref="Result"/> are in J/mol.
/// For an entropy: the correction is ∫ΔrCp/T dT and all three are in J/(mol·K). Temperatures in K.
/// Species without heat-capacity data contributed nothing to ΔrCp (they are listed in <see cref="SpeciesWithoutData"/>,
/// so the caller can decide whether to warn); extrapolated species are listed in <see cref="RangeWarnings"/>.
/// </remarks>
/// <typeparam name="TKey">The caller's opaque species identifier.</typeparam>
/// <param name="FromTemperature">T1 in K, where <see cref="Initial"/> applies.</param>
/// <param name="ToTemperature">T2 in K, where <see cref="Result"/> applies.</param>
/// <param name="Initial">The value at T1.</param>
/// <param name="Correction">The integral of ΔrCp (enthalpy) or ΔrCp/T (entropy) from T1 to T2.</param>
/// <param name="RangeWarnings">Species whose data were used outside their valid range.</param>
/// <param name="SpeciesWithoutData">Species without a heat-capacity model.</param>
public sealed record KirchhoffShift<TKey>(
    double FromTemperature,
    double ToTemperature,
    double Initial,
    double Correction,
    IReadOnlyList<SpeciesRangeWarning<TKey>> RangeWarnings,
    IReadOnlyList<TKey> SpeciesWithoutData)
{
    /// <summary>The value at T2: <see cref="Initial"/> + <see cref="Correction"/>.</summary>
    public double Result => Initial + Correction;

    /// <summary>Whether every species had data valid over the whole interval.</summary>
    public bool IsClean => RangeWarnings.Count == 0 && SpeciesWithoutData.Count == 0;
}
