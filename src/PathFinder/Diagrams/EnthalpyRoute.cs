namespace PathFinder.Diagrams;

/// <summary>Input model of an enthalpy-level diagram for a route from the target's reactants to its products.</summary>
/// <param name="Title">Heading printed above the diagram.</param>
/// <param name="TargetLabel">The target reaction, formula markup such as <c>C(gr) + ½O2(g) → CO(g)</c>.</param>
/// <param name="StartState">The target's reactants (the level drawn at 0), formula markup.</param>
/// <param name="Steps">The route's steps in order; the last step's state is the target's products.</param>
/// <param name="TargetUncertainty">Standard uncertainty of the route's total (same unit as the steps).</param>
/// <param name="Quantity">Symbol on the axis and labels (default <c>ΔH</c>).</param>
/// <param name="Unit">Unit of all values (default <c>kJ/mol</c>).</param>
/// <remarks>The target's value is the sum of the step values; it is computed, not passed, so the picture cannot disagree
/// with its own arrows.</remarks>
public sealed record EnthalpyRoute(
    string Title,
    string TargetLabel,
    string StartState,
    IReadOnlyList<EnthalpyStep> Steps,
    double TargetUncertainty,
    string Quantity = "ΔH",
    string Unit = "kJ/mol")
{
    /// <summary>The target's value: the sum of the step values.</summary>
    public double TargetValue => Steps.Sum(s => s.Value);
}
