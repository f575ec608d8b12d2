namespace PathFinder.Thermodynamics;

/// <summary>How well a (ΔH, ΔS, ΔG) triple at one temperature satisfies ΔG = ΔH − T·ΔS, measured in combined standard uncertainties.</summary>
/// <remarks>
/// Residual r = ΔG − (ΔH − T·ΔS) in J/mol; <see cref="CombinedUncertainty"/> is u(r) in J/mol; z = r/u(r).
/// When u(r) is zero (all three taken as exact) z is not defined and is <see cref="double.NaN"/>.
/// </remarks>
/// <param name="Temperature">T in K.</param>
/// <param name="Residual">r = ΔG − (ΔH − T·ΔS) in J/mol.</param>
/// <param name="CombinedUncertainty">u(r) in J/mol.</param>
public sealed record GibbsConsistency(double Temperature, double Residual, double CombinedUncertainty)
{
    /// <summary>z = r/u(r), or <see cref="double.NaN"/> when u(r) is zero.</summary>
    public double ZScore => CombinedUncertainty > 0.0 ? Residual / CombinedUncertainty : double.NaN;

    /// <summary>Whether |z| ≤ <paramref name="limit"/>; false when z is not defined.</summary>
    /// <param name="limit">Coverage factor; default 2 (about 95 % for a normal distribution).</param>
    public bool IsConsistent(double limit = 2.0) => Math.Abs(ZScore) <= limit;
}
