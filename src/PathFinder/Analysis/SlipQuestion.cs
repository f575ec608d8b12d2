using PathFinder.Quantities;

namespace PathFinder.Analysis;

/// <summary>What is known about a suspect measurement when asking which common slip, if any, explains it.</summary>
/// <remarks>
/// <para>All values are in the row's canonical unit: kJ/mol for ΔH, ΔU and ΔG, J/(mol·K) for ΔS and S°. Rows of
/// ln K and log₁₀ K are read by the analysis as ΔrG° = −RT·ln K, so their values are ΔG in kJ/mol too.</para>
/// <para><see cref="Correction"/> is the additive part of <see cref="Value"/> that the analysis added itself (the
/// Δn(gas)·RT term of ΔU → ΔH, a Kirchhoff shift to the analysis temperature), so Value − Correction is the number
/// the user typed, converted to the canonical unit. Slips act on that number: the value without the slip is
/// transform(Value − Correction) + Correction. For ln K rows the conversion to ΔG is a multiplication, which sign and
/// factor transforms commute with; their correction is a Kirchhoff part only, usually 0.</para>
/// </remarks>
/// <param name="Property">What the row measures.</param>
/// <param name="Value">The value the analysis used for the row (canonical unit, corrections included).</param>
/// <param name="Correction">The part of <paramref name="Value"/> the analysis added (canonical unit); 0 when none.</param>
/// <param name="Uncertainty">The measurement's standard uncertainty u (canonical unit, non-negative).</param>
/// <param name="Predicted">What the rest of the network predicts for the row (leave-one-out).</param>
/// <param name="PredictedUncertainty">The prediction's standard uncertainty (non-negative).</param>
/// <param name="Phases">States the network also knows for species of the equation; empty when none.</param>
public sealed record SlipQuestion(
    ThermoProperty Property,
    double Value,
    double Correction,
    double Uncertainty,
    double Predicted,
    double PredictedUncertainty,
    IReadOnlyList<PhaseAlternative> Phases)
{
    /// <summary>The number the user typed, in the canonical unit: <see cref="Value"/> − <see cref="Correction"/>.</summary>
    public double Typed => Value - Correction;
}
