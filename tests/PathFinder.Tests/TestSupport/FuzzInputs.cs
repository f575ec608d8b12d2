using System.Globalization;
using System.Text;
using CsCheck;

namespace PathFinder.Tests.TestSupport;

/// <summary>Generators for fuzzing: valid inputs built from grammar pieces, then mutated (flips, insertions, truncation, duplication).</summary>
public static class FuzzInputs
{
    private static readonly string[] Elements = ["H", "C", "O", "N", "Na", "Cl", "Fe", "S", "Ca", "K", "Cu", "Mg", "P", "Xx"];

    private static readonly string[] Inserts =
        [",", ";", "\"", "\n", "\r\n", "\t", "\0", "\u001b[2J", "(", ")", "[", "]", "^", "·", "*", "→", "é", "\uFEFF", "\uD800", "💥", "=", "+", "-", "/", "e", "9", " ", "'", "#", "\u2212"];

    /// <summary>An element symbol with an optional count.</summary>
    private static readonly Gen<string> Count = Gen.Frequency(
        (4, Gen.Const("")), (3, Gen.Int[2, 12].Select(i => i.ToString(CultureInfo.InvariantCulture))), (1, Gen.OneOf("0.5", "1.5", "2.25")));

    private static readonly Gen<string> Atom = Gen.Select(Gen.OneOf(Elements), Count, (element, count) => element + count);

    /// <summary>Formulas with brackets (up to three levels), charges and hydrates.</summary>
    public static Gen<string> Formula => Gen.Select(
        Group(3).Array[1, 4].Select(parts => string.Concat(parts)),
        Gen.Frequency((3, Gen.Const("")), (1, Gen.OneOf("·5H2O", "*H2O", "·0.5H2O", "·2NH3"))),
        Gen.Frequency((3, Gen.Const("")), (1, Gen.OneOf("+", "-", "^2+", "^3-", "^+", "^1-"))),
        (body, hydrate, charge) => body + hydrate + charge);

    /// <summary>Species: a formula with an optional state.</summary>
    public static Gen<string> Species => Gen.Select(
        Formula, Gen.OneOf("", "(g)", "(l)", "(cr)", "(aq)", "(cr,graphite)", "(s)"), (formula, state) => formula + state);

    /// <summary>Equations with coefficients (integers, fractions, decimals) and the accepted arrows.</summary>
    public static Gen<string> Equation => Gen.Select(
        Term.Array[1, 3], Gen.OneOf(" -> ", " = ", " → ", " <=> ", " ⇌ ", "->"), Term.Array[0, 3],
        (left, arrow, right) => right.Length == 0 ? left[0] : string.Join(" + ", left) + arrow + string.Join(" + ", right));

    /// <summary>Numbers in many spellings (and a few that are not numbers).</summary>
    public static Gen<string> Number => Gen.Frequency(
        (4, Gen.Double[-1e6, 1e6].Select(d => d.ToString("R", CultureInfo.InvariantCulture))),
        (2, Gen.Select(Gen.Int[-999, 999], Gen.Int[-400, 400], (m, e) => $"{m}e{e}")),
        (1, Gen.OneOf("-74.87", "+5", ".5", "5.", "−3.2", "1,5", " 7 ", "0x10", "NaN", "Infinity", "-inf", "1e400", "1e-300", "1_000", "1.2.3", "", "--1", "1e", "١٢")));

    /// <summary>Unit spellings, with case and spacing variants.</summary>
    public static Gen<string> Unit => Gen.Select(
        Gen.OneOf("kJ/mol", "J/mol", "kcal/mol", "cal/mol", "eV", "cm-1", "J/(mol·K)", "J/(mol*K)", "J/mol/K", "cal/(mol·K)", "kJ/(mol·K)", "1", "", "KJ/MOL", "kj / mol", "kJ mol-1", "furlong"),
        Gen.Int[0, 2],
        (unit, variant) => variant switch { 1 => unit.ToUpperInvariant(), 2 => " " + unit + " ", _ => unit });

    /// <summary>A measurement CSV file (header and 0 to 12 rows) with hostile text in ids and sources.</summary>
    public static Gen<string> NetworkFile => Gen.Select(
        Gen.OneOf("id,equation,property,value,uncertainty,unit,temperature,source", "id,equation,property,value,uncertainty", "id,equation,property,value,uncertainty,unit,source,coverage", "id,id,equation,property,value,uncertainty"),
        Row.Array[0, 12],
        Gen.OneOf("\n", "\r\n"),
        (header, rows, newline) => header + newline + string.Join(newline, rows) + newline);

    private static Gen<string> Term => Gen.Select(Gen.OneOf("", "2 ", "1/2 ", "0.5 ", "3", "3/2 ", "10 "), Species, (coefficient, species) => coefficient + species);

    private static Gen<string> Row => Gen.Select(
        Gen.OneOf("m1", "m2", "=HYPERLINK(\"x\")", "@SUM(A1)", "id\u001b]0;x\u0007", "", "r 4"),
        Gen.Select(Equation, Gen.OneOf("CO2(g)", "CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)", "C(cr,graphite) + O2(g) -> CO2(g)", "H+(aq) + e- -> 1/2 H2(g)"), Gen.Int[0, 1], (g, fixedOne, pick) => pick == 0 ? g : fixedOne),
        Gen.OneOf("dH", "dG", "dS", "dU", "S", "K", "dh", "bogus"),
        Number,
        Gen.OneOf("0.5", "0.1", "1e-300", "0", "-1", "2"),
        Unit,
        Gen.OneOf("", "298.15", "500", "1e-300", "0"),
        Gen.OneOf("lab", "-src", "+cmd|' /C calc'!A0", "\u001b[2Jclear"),
        (id, equation, property, value, uncertainty, unit, temperature, source) =>
            string.Join(",", new[] { id, equation, property, value, uncertainty, unit, temperature, source }.Select(cell => Quote(cell))));

    /// <summary>Mutated text: 0 to 4 edits of <paramref name="valid"/> (half the cases stay valid).</summary>
    public static Gen<string> Mutated(Gen<string> valid) => Gen.Select(
        valid, Gen.Frequency((1, Gen.Const(Array.Empty<(int, int, int)>())), (1, Gen.Select(Gen.Int[0, 4], Gen.Int[0, 1_000_000], Gen.Int[0, Inserts.Length - 1]).Array[1, 4])),
        (text, edits) => edits.Aggregate(text, Apply));

    /// <summary>Mutated bytes of the UTF-8 text of <paramref name="valid"/>: byte flips, insertions, truncation, duplication, a BOM or UTF-16.</summary>
    public static Gen<byte[]> MutatedBytes(Gen<string> valid) => Gen.Select(
        Mutated(valid), Gen.Select(Gen.Int[0, 2], Gen.Int[0, 1_000_000], Gen.Int[0, 7]).Array[0, 3], Gen.Int[0, 9],
        (text, flips, encoding) =>
        {
            byte[] bytes = encoding switch
            {
                0 => Encoding.UTF8.GetPreamble().Concat(Encoding.UTF8.GetBytes(text)).ToArray(),
                1 => Encoding.Unicode.GetPreamble().Concat(Encoding.Unicode.GetBytes(text)).ToArray(),
                _ => Encoding.UTF8.GetBytes(text),
            };
            foreach ((int op, int position, int bit) in flips)
            {
                if (bytes.Length == 0)
                {
                    break;
                }

                int at = position % bytes.Length;
                bytes = op switch
                {
                    0 => [.. bytes[..at], (byte)(bytes[at] ^ (1 << bit)), .. bytes[(at + 1)..]],
                    1 => [.. bytes[..at], (byte)(0x80 + (bit * 16)), .. bytes[at..]],
                    _ => bytes[..at],
                };
            }

            return bytes;
        });

    /// <summary>A string shown with its control and non-ASCII characters escaped, for failure messages.</summary>
    public static string Show(string text) =>
        string.Concat(text.Select(c => c is >= ' ' and <= '~' ? c.ToString() : $"\\u{(int)c:X4}"));

    /// <summary>Bytes shown as hexadecimal, for failure messages.</summary>
    public static string Show(byte[] bytes) => Convert.ToHexString(bytes);

    private static Gen<string> Group(int depth) => depth == 0
        ? Atom
        : Gen.Frequency(
            (3, Atom),
            (1, Gen.Select(Group(depth - 1).Array[1, 3], Gen.OneOf(("(", ")"), ("[", "]")), Count,
                (inner, brackets, count) => brackets.Item1 + string.Concat(inner) + brackets.Item2 + count)));

    private static string Apply(string text, (int Op, int Position, int Insert) edit)
    {
        int at = edit.Position % (text.Length + 1);
        return edit.Op switch
        {
            0 => text.Insert(at, Inserts[edit.Insert]),
            1 when text.Length > 0 => text.Remove(at % text.Length, 1),
            2 => text[..at],
            3 => text[..at] + text[at..] + text[at..],
            _ when text.Length > 0 => text.Remove(at % text.Length, 1).Insert(at % text.Length, ((char)(text[at % text.Length] ^ (1 << (edit.Insert % 8)))).ToString()),
            _ => text,
        };
    }

    private static string Quote(string field) =>
        field.AsSpan().IndexOfAny(",\"\n\r") >= 0 ? "\"" + field.Replace("\"", "\"\"", StringComparison.Ordinal) + "\"" : field;
}
