namespace PathFinder.Diagrams;

/// <summary>How a run of characters in a chemical formula is typeset.</summary>
public enum FormulaTextRole
{
    /// <summary>Ordinary text on the baseline (element symbols, coefficients, states, separators).</summary>
    Normal,

    /// <summary>Lowered, smaller text: atom counts after an element symbol or a closing bracket.</summary>
    Subscript,

    /// <summary>Raised, smaller text: ionic charges such as <c>2−</c> or <c>+</c>.</summary>
    Superscript,
}
