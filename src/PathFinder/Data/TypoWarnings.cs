using PathFinder.Chemistry;
using PathFinder.Diagnostics;

namespace PathFinder.Data;

/// <summary>Warnings about species spellings that parse but are likely typos: the digit 0 for the letter O.</summary>
/// <remarks>
/// <c>N02(g)</c> reads as N2(g) (a reference element) and <c>H20(g)</c> as 20 hydrogen atoms; both balance when the
/// rest of the row is consistent with the typo (a formation shorthand always is), so nothing else would catch them.
/// </remarks>
internal static class TypoWarnings
{
    /// <summary>The code of the warning on a 0 that is probably the letter O.</summary>
    public const string Code = "zero-for-oxygen";

    /// <summary>Adds one warning per suspicious spelling, located on the digit in the first row that writes it.</summary>
    /// <param name="measurements">The usable measurements, in file order.</param>
    /// <param name="catalog">Resolves the suggested spelling as the data would.</param>
    /// <param name="used">The species the measurements use (a count such as 20 is suspicious only when the spelling with O is one of them).</param>
    /// <param name="diagnostics">Where warnings go.</param>
    public static void Add(IReadOnlyList<Measurement> measurements, SpeciesCatalog catalog, IReadOnlySet<Species> used, List<Diagnostic> diagnostics)
    {
        var reported = new HashSet<(string Written, string Suggested)>();
        foreach (Measurement measurement in measurements)
        {
            foreach (ZeroForOxygen typo in ZeroForOxygen.Find(measurement.EquationText))
            {
                Species? suggested = catalog.ResolveWithoutRecording(typo.Suggested).TryGetValue(out Species? species) ? species : null;
                bool known = suggested is not null && used.Contains(suggested);
                if (!(typo.CountStartsWithZero || known) || !reported.Add((typo.Written, typo.Suggested)))
                {
                    continue;
                }

                string written = DiagnosticText.Excerpt(typo.Written);
                string guess = suggested is null ? "" : $": did you mean {DiagnosticText.Excerpt(typo.Suggested)}?";
                string message = typo.CountStartsWithZero
                    ? $"'{written}' has an atom count starting with 0, which is read without the 0{guess}"
                    : $"'{written}' is read with a count containing 0{guess} ({DiagnosticText.Excerpt(typo.Suggested)} is used elsewhere in the data)";
                diagnostics.Add(Diagnostic.Warning(Code, measurement.Location.Shift(typo.Offset) with { Field = "equation" }, message, "write the letter O for oxygen, not the digit 0; an atom count never starts with 0"));
            }
        }
    }
}
