namespace PathFinder.Diagrams;

/// <summary>One step of a route or cycle: a measurement as used (flipped and/or scaled) and the state it leads to.</summary>
/// <param name="Label">How the measurement is used, plain text such as <c>−½ × m3</c>.</param>
/// <param name="Value">The transformed value of the step, in the diagram's unit (e.g. +141.5 for kJ/mol).</param>
/// <param name="StateAfter">The state reached, formula markup such as <c>CO(g) + ½O2(g)</c>.</param>
/// <param name="Uncertainty">Optional standard uncertainty of the transformed value (same unit); printed as "± u".</param>
public sealed record EnthalpyStep(string Label, double Value, string StateAfter, double? Uncertainty = null);
