using System.Text;

namespace PathFinder.Diagrams;

/// <summary>Splits chemical formula text such as <c>CuSO4·5H2O(cr)</c> or <c>SO4^2-(aq)</c> into typeset runs.</summary>
/// <remarks>
/// Rules, applied per term (a term starts at the beginning, after white space or after a hydrate dot <c>·</c>/<c>*</c>):
/// a leading coefficient (digits, <c>.</c>, <c>/</c> or a vulgar fraction such as <c>½</c>) stays on the baseline;
/// digits after a letter or a closing bracket are subscripts; <c>^</c> followed by digits and a sign (<c>^2-</c>,
/// <c>^3+</c>, <c>^+</c>) is a superscript charge; a <c>+</c> or <c>-</c> directly after a letter, digit or closing
/// bracket and followed by the end, white space, <c>(</c> or <c>^</c> is a superscript charge (<c>Na+</c>, <c>Cl-(aq)</c>);
/// a bracketed group that starts with a lower-case letter is a state (<c>(g)</c>, <c>(aq)</c>, <c>(cr,II)</c>) and is
/// copied unchanged. Anything else is baseline text, so plain words pass through untouched.
/// </remarks>
public static class FormulaMarkup
{
    private const string VulgarFractions = "½⅓⅔¼¾⅕⅖⅗⅘⅙⅚⅛⅜⅝⅞";

    /// <summary>Tokenizes <paramref name="text"/> into runs of normal, subscript and superscript text.</summary>
    /// <remarks>Adjacent characters with the same role are merged; the concatenated token texts equal the input
    /// except that <c>^</c> markers are dropped and a charge's <c>-</c> becomes the minus sign U+2212.</remarks>
    public static IReadOnlyList<FormulaToken> Tokenize(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        var runs = new List<FormulaToken>();
        var current = new StringBuilder();
        FormulaTextRole currentRole = FormulaTextRole.Normal;

        void Emit(string s, FormulaTextRole role)
        {
            if (s.Length == 0)
            {
                return;
            }

            if (role != currentRole && current.Length > 0)
            {
                runs.Add(new FormulaToken(current.ToString(), currentRole));
                current.Clear();
            }

            currentRole = role;
            current.Append(s);
        }

        bool termStart = true;
        int i = 0;
        while (i < text.Length)
        {
            char c = text[i];
            if (char.IsWhiteSpace(c) || c == '·' || c == '*' || c == '•')
            {
                Emit(c == '*' ? "·" : c.ToString(), FormulaTextRole.Normal);
                termStart = true;
                i++;
                continue;
            }

            if (termStart)
            {
                int end = i;
                while (end < text.Length && IsCoefficientChar(text[end]))
                {
                    end++;
                }

                // A coefficient must be followed by the formula itself (a letter, bracket or '·'), not stand alone.
                if (end > i && end < text.Length && (char.IsLetter(text[end]) || text[end] == '(' || text[end] == '['))
                {
                    Emit(text[i..end], FormulaTextRole.Normal);
                    i = end;
                }

                termStart = false;
                continue;
            }

            if (c == '(' && i + 1 < text.Length && char.IsLower(text[i + 1]))
            {
                int close = text.IndexOf(')', i);
                if (close > i)
                {
                    Emit(text[i..(close + 1)], FormulaTextRole.Normal);
                    i = close + 1;
                    continue;
                }
            }

            if (c == '^')
            {
                int end = i + 1;
                while (end < text.Length && (char.IsDigit(text[end]) || text[end] is '+' or '-' or '−'))
                {
                    end++;
                }

                if (end > i + 1)
                {
                    Emit(Charge(text[(i + 1)..end]), FormulaTextRole.Superscript);
                    i = end;
                    continue;
                }
            }

            char previous = i > 0 ? text[i - 1] : ' ';
            bool afterFormulaChar = char.IsLetterOrDigit(previous) || previous is ')' or ']';
            if (char.IsDigit(c) && (char.IsLetter(previous) || previous is ')' or ']' || (char.IsDigit(previous) && currentRole == FormulaTextRole.Subscript)))
            {
                Emit(c.ToString(), FormulaTextRole.Subscript);
                i++;
                continue;
            }

            if (c is '+' or '-' or '−' && afterFormulaChar && previous != '^')
            {
                char next = i + 1 < text.Length ? text[i + 1] : ' ';
                if (char.IsWhiteSpace(next) || next is '(' or '^' || i + 1 == text.Length)
                {
                    Emit(Charge(c.ToString()), FormulaTextRole.Superscript);
                    i++;
                    continue;
                }
            }

            Emit(c.ToString(), FormulaTextRole.Normal);
            i++;
        }

        if (current.Length > 0)
        {
            runs.Add(new FormulaToken(current.ToString(), currentRole));
        }

        return runs;
    }

    /// <summary>The text as it reads on screen (markers removed, charge minus as U+2212), for widths and tooltips.</summary>
    public static string ToPlainText(string text) => string.Concat(Tokenize(text).Select(t => t.Text));

    /// <summary>The text with subscripts and charges written as Unicode sub- and superscript characters (<c>O₂</c>, <c>SO₄²⁻</c>).</summary>
    /// <remarks>For one-line text without markup support, such as titles. A run containing a character with no Unicode
    /// sub- or superscript form is left on the baseline.</remarks>
    public static string ToUnicodeText(string text)
    {
        var sb = new StringBuilder(text.Length);
        foreach (FormulaToken token in Tokenize(text))
        {
            string map = token.Role switch
            {
                FormulaTextRole.Subscript => SubscriptDigits,
                FormulaTextRole.Superscript => SuperscriptChars,
                _ => string.Empty,
            };
            string from = token.Role == FormulaTextRole.Superscript ? "0123456789+−" : "0123456789";
            if (map.Length == 0 || token.Text.Any(c => !from.Contains(c, StringComparison.Ordinal)))
            {
                sb.Append(token.Text);
                continue;
            }

            foreach (char c in token.Text)
            {
                sb.Append(map[from.IndexOf(c, StringComparison.Ordinal)]);
            }
        }

        return sb.ToString();
    }

    private const string SubscriptDigits = "₀₁₂₃₄₅₆₇₈₉";
    private const string SuperscriptChars = "⁰¹²³⁴⁵⁶⁷⁸⁹⁺⁻";

    private static bool IsCoefficientChar(char c) => char.IsDigit(c) || c is '.' or '/' || VulgarFractions.Contains(c);

    private static string Charge(string s) => s.Replace('-', '−');
}
