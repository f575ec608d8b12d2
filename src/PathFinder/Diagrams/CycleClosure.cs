namespace PathFinder.Diagrams;

/// <summary>Input model of a cycle-closure diagram: steps that should return to the starting state with a total of zero.</summary>
/// <param name="Title">Heading printed above the diagram.</param>
/// <param name="StartState">The state the cycle starts and ends in, formula markup.</param>
/// <param name="Steps">The cycle's steps in order; the last step's state is normally <paramref name="StartState"/> again.</param>
/// <param name="ResidualUncertainty">Standard uncertainty of the residual (same unit as the steps).</param>
/// <param name="ZScore">The residual's z-score if computed elsewhere (for example with correlations); null means residual / uncertainty.</param>
/// <param name="Quantity">Symbol on the axis and labels (default <c>ΔH</c>).</param>
/// <param name="Unit">Unit of all values (default <c>kJ/mol</c>).</param>
public sealed record CycleClosure(
    string Title,
    string StartState,
    IReadOnlyList<EnthalpyStep> Steps,
    double ResidualUncertainty,
    double? ZScore = null,
    string Quantity = "ΔH",
    string Unit = "kJ/mol")
{
    /// <summary>The closure residual: the sum of the step values (zero for a perfect cycle).</summary>
    public double Residual => Steps.Sum(s => s.Value);

    /// <summary>The z-score used for the verdict: <see cref="ZScore"/>, else residual / uncertainty (±∞ when the uncertainty is 0 and the residual is not).</summary>
    public double EffectiveZ => ZScore ?? (ResidualUncertainty > 0.0 ? Residual / ResidualUncertainty
        : Math.Abs(Residual) > 0.0 ? Math.CopySign(double.PositiveInfinity, Residual) : 0.0);
}
