using PathFinder.Chemistry;
using PathFinder.Diagnostics;

namespace PathFinder.Analysis;

/// <summary>Reads a target typed by the user: a balanced equation, or one species for its formation reaction.</summary>
/// <remarks>
/// Species are resolved the way the data resolve them: a name or key used in the network (e.g. <c>DME(g)</c>)
/// first, then the formula with its state. A target must be balanced, like every equation in the data.
/// </remarks>
public static class TargetReaction
{
    /// <summary>The failure code of a formation shorthand whose formation reaction is empty (an element in its reference state).</summary>
    private const string ReferenceFormationCode = "reference-formation";

    /// <summary>Reads <paramref name="text"/> against the species of <paramref name="network"/>. Never throws for bad input.</summary>
    public static ParseResult<ChemicalEquation> Parse(string text, ReactionNetwork network)
    {
        ArgumentNullException.ThrowIfNull(text);
        ArgumentNullException.ThrowIfNull(network);
        ParseResult<Species> Resolve(string token)
        {
            Species? known = network.Species.FirstOrDefault(species => species.Label == token || species.Name == token);
            if (known is not null)
            {
                return ParseResult<Species>.Ok(known);
            }

            ParseResult<Species> parsed = SpeciesParser.Parse(token);
            if (!parsed.TryGetValue(out Species? species))
            {
                return parsed;
            }

            int index = network.IndexOf(species);
            return ParseResult<Species>.Ok(index >= 0 ? network.Species[index] : species);
        }

        ParseResult<ChemicalEquation> equation = EquationParser.Parse(text.Trim(), Resolve);
        if (!equation.TryGetValue(out ChemicalEquation? value))
        {
            // The parser's hint for an empty formation speaks of a data row; a target is no row.
            return equation.Failure.Code == ReferenceFormationCode
                ? ParseResult<ChemicalEquation>.Fail(equation.Failure with { Hint = "its formation quantities are zero by convention: choose a compound as the target, or write a reaction with an arrow (e.g. \"C(cr,graphite) -> C(cr,diamond)\")" })
                : equation;
        }

        IReadOnlyList<string> imbalances = value.FindImbalances();
        if (imbalances.Count > 0)
        {
            return ParseResult<ChemicalEquation>.Fail(0, "unbalanced-equation", $"the target is not balanced: {string.Join("; ", imbalances)}", "correct the coefficients so every element and the charge balance");
        }

        return ParseResult<ChemicalEquation>.Ok(value);
    }

    /// <summary>Formats a parse failure of a target for a message: the text with a caret under the problem.</summary>
    public static string Describe(string text, ParseFailure failure)
    {
        ArgumentNullException.ThrowIfNull(text);
        ArgumentNullException.ThrowIfNull(failure);
        int offset = Math.Clamp(failure.Offset, 0, text.Length);
        string hint = failure.Hint.Length > 0 ? $"\n  fix: {failure.Hint}" : "";
        return $"target '{text}': {failure.Message} (column {offset + 1})\n  {text}\n  {new string(' ', offset)}^{hint}";
    }
}
