namespace PathFinder.Diagrams;

/// <summary>A run of formula text that shares one typesetting role.</summary>
/// <param name="Text">The characters to draw (a charge's minus sign is already U+2212).</param>
/// <param name="Role">Baseline, subscript or superscript.</param>
public readonly record struct FormulaToken(string Text, FormulaTextRole Role);
