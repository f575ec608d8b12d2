using PathFinder.Chemistry;

namespace PathFinder.Analysis;

/// <summary>A species of a measured equation written in one state while the network also knows it in another.</summary>
/// <remarks>
/// If the measurement was really made with <see cref="Alternative"/> in place of <see cref="Written"/>, the value
/// of the equation as written is the measured value minus <see cref="Shift"/>, where
/// Shift = ν·(X(alternative) − X(written)) in the row's own property (ΔfH° for ΔH rows, S° for S° and ΔS rows,
/// ΔfG°(T) for ΔG and equilibrium-constant rows), as the rest of the network predicts it.
/// </remarks>
/// <param name="Written">The species as written in the equation, e.g. H2O(l).</param>
/// <param name="Alternative">The same formula in another state that the network knows, e.g. H2O(g).</param>
/// <param name="Coefficient">ν of <see cref="Written"/> in the equation (negative on the left).</param>
/// <param name="Shift">ν·(X(alternative) − X(written)), in the row's unit.</param>
/// <param name="ShiftUncertainty">Its standard uncertainty.</param>
public sealed record PhaseAlternative(Species Written, Species Alternative, double Coefficient, double Shift, double ShiftUncertainty);
