using PathFinder.Diagnostics;

namespace PathFinder.Chemistry;

/// <summary>Reads a species written as a formula followed by its state: <c>CH4(g)</c>, <c>Ca(OH)2(cr)</c>, <c>C(cr,graphite)</c>.</summary>
/// <remarks>
/// The state is the last parenthesised group when it starts with a small letter (element symbols start with
/// a capital), so <c>Ca(OH)2(cr)</c> is the formula <c>Ca(OH)2</c> in state <c>cr</c>. Every species needs a
/// state, because ΔH depends on it (H2O(l) and H2O(g) differ by the enthalpy of vaporization). The electron
/// may be written <c>e-</c> without a state.
/// </remarks>
public static class SpeciesParser
{
    /// <summary>Reads a species. Never throws for bad input.</summary>
    public static ParseResult<Species> Parse(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        if (text is "e-" or "e^-" or "e-(g)")
        {
            return ParseResult<Species>.Ok(Species.Create(Formula.Electron, PhysicalState.Gas, name: "e-"));
        }

        if (text.Length == 0)
        {
            return ParseResult<Species>.Fail(0, "bad-formula", "the species is empty");
        }

        if (text[^1] != ')')
        {
            return MissingState(text);
        }

        int open = text.LastIndexOf('(');
        if (open < 0 || open + 1 >= text.Length - 1 || !char.IsAsciiLetterLower(text[open + 1]))
        {
            return MissingState(text);
        }

        string stateText = text[(open + 1)..^1];
        ParseStateResult state = PhysicalState.Parse(stateText);
        if (state.Error is not null)
        {
            return ParseResult<Species>.Fail(open + 1, "bad-state", state.Error, "use g, l, cr (or s), am or aq, optionally with a modification: (cr,graphite), (cr,rhombic)");
        }

        string formulaText = text[..open];
        ParseResult<Formula> formula = FormulaParser.Parse(formulaText);
        if (!formula.TryGetValue(out Formula? value))
        {
            return ParseResult<Species>.Fail(formula.Failure);
        }

        return ParseResult<Species>.Ok(Species.Create(value, state.State, name: $"{value.Text}({state.State})"));
    }

    private static ParseResult<Species> MissingState(string text)
    {
        // A state in capitals, NH3(G): the G would otherwise be reported as an unknown element symbol.
        int open = text.LastIndexOf('(');
        if (text[^1] == ')' && open >= 0 && open + 1 < text.Length - 1 && char.IsAsciiLetterUpper(text[open + 1]))
        {
            string written = text[(open + 1)..^1];
            ParseStateResult lower = PhysicalState.Parse(written.ToLowerInvariant());
            if (lower.Error is null)
            {
                string fixedText = $"{text[..open]}({lower.State})";
                return ParseResult<Species>.Fail(open + 1, "bad-state", $"the state '({DiagnosticText.Excerpt(written)})' is in capitals; states are written in lower case", $"write {DiagnosticText.Excerpt(fixedText)}");
            }
        }

        ParseResult<Formula> formula = FormulaParser.Parse(text);
        if (!formula.Success)
        {
            return ParseResult<Species>.Fail(formula.Failure);
        }

        return ParseResult<Species>.Fail(text.Length, "missing-state", $"'{DiagnosticText.Excerpt(text)}' has no state", StateHint(DiagnosticText.Excerpt(text)));
    }

    private static string StateHint(string formula) => $"add the state after the formula, e.g. {formula}(g), {formula}(l), {formula}(cr) or {formula}(aq)";
}
