using System.Globalization;
using Fractions;
using PathFinder.Diagnostics;

namespace PathFinder.Chemistry;

/// <summary>Reads chemical formulas such as <c>Ca(OH)2</c>, <c>K4[Fe(CN)6]</c>, <c>CuSO4·5H2O</c>, <c>SO4^2-</c>.</summary>
/// <remarks>
/// <para>Charge notation: <c>^n+</c> / <c>^n-</c> (<c>Fe^3+</c>, <c>SO4^2-</c>), or a single trailing sign for
/// charge ±1 (<c>Na+</c>, <c>NH4+</c>, <c>Cl-</c>). Forms that people write with two meanings are refused with a
/// hint rather than guessed: <c>Fe3+</c> (iron(III) or an Fe3 cluster?) and <c>SO42-</c> (sulfate or SO42⁻?).</para>
/// <para>Hydrate separators are <c>·</c> or <c>*</c>, optionally followed by a multiplier (<c>CuSO4·5H2O</c>,
/// <c>CaSO4·0.5H2O</c>). The electron is written <c>e-</c>.</para>
/// <para>Brackets nest at most <see cref="MaxNesting"/> levels deep; deeper nesting is refused with its location
/// (the reader recurses once per level, and no real formula comes near the limit).</para>
/// </remarks>
public static class FormulaParser
{
    /// <summary>The deepest bracket nesting read: <c>K4[Fe(CN)6]</c> nests 2 levels; 32 leaves room for any real formula.</summary>
    public const int MaxNesting = 32;

    private const string ChargeHint = "write charges as ^n+ or ^n- after the formula (Fe^3+, SO4^2-), or a single + or - for charge 1 (Na+, NH4+, Cl-)";

    /// <summary>Reads a formula without a state. Never throws for bad input.</summary>
    public static ParseResult<Formula> Parse(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        if (text is "e-" or "e^-" or "e^1-")
        {
            return ParseResult<Formula>.Ok(Formula.Electron);
        }

        if (text.Length == 0)
        {
            return ParseResult<Formula>.Fail(0, "bad-formula", "the formula is empty");
        }

        ParseResult<(int Charge, int BodyLength)> charge = ReadCharge(text);
        if (!charge.TryGetValue(out (int Charge, int BodyLength) chargeValue))
        {
            return ParseResult<Formula>.Fail(charge.Failure!);
        }

        string body = text[..chargeValue.BodyLength];
        var reader = new Reader(body);
        ParseResult<Dictionary<string, Fraction>> counts = reader.ReadWhole();
        if (!counts.TryGetValue(out Dictionary<string, Fraction>? composition))
        {
            return ParseResult<Formula>.Fail(counts.Failure!);
        }

        string normalised = text.Replace('*', '·');
        return ParseResult<Formula>.Ok(new Formula(normalised, composition, chargeValue.Charge));
    }

    private static ParseResult<(int Charge, int BodyLength)> ReadCharge(string text)
    {
        int caret = text.LastIndexOf('^');
        if (caret >= 0)
        {
            string suffix = text[(caret + 1)..];
            if (suffix.Length == 0 || (suffix[^1] != '+' && suffix[^1] != '-'))
            {
                return ParseResult<(int, int)>.Fail(caret, "bad-charge", $"the charge '{DiagnosticText.Excerpt(suffix)}' after '^' must end in + or -", ChargeHint);
            }

            string digits = suffix[..^1];
            int magnitude = 1;
            if (digits.Length > 0 && (!digits.All(char.IsAsciiDigit) || !int.TryParse(digits, NumberStyles.None, CultureInfo.InvariantCulture, out magnitude) || magnitude == 0))
            {
                return ParseResult<(int, int)>.Fail(caret + 1, "bad-charge", $"the charge '^{suffix}' is not a whole number followed by + or -", ChargeHint);
            }

            return ParseResult<(int, int)>.Ok((suffix[^1] == '+' ? magnitude : -magnitude, caret));
        }

        char last = text[^1];
        if (last != '+' && last != '-')
        {
            return ParseResult<(int, int)>.Ok((0, text.Length));
        }

        int signs = 0;
        while (signs < text.Length && text[text.Length - 1 - signs] == last)
        {
            signs++;
        }

        int bodyLength = text.Length - signs;
        if (signs > 1)
        {
            return ParseResult<(int, int)>.Fail(bodyLength, "bad-charge", $"'{new string(last, signs)}' is not a charge notation PathFinder reads", ChargeHint);
        }

        int digitRun = 0;
        while (digitRun < bodyLength && char.IsAsciiDigit(text[bodyLength - 1 - digitRun]))
        {
            digitRun++;
        }

        if (digitRun > 0)
        {
            string body = text[..bodyLength];
            bool singleElement = body.Count(char.IsAsciiLetterUpper) == 1 && body.IndexOfAny(['(', '[', '·', '*']) < 0;
            if (digitRun >= 2 || singleElement)
            {
                string count = text.Substring(bodyLength - digitRun, digitRun);
                string withCharge = body[..^1] + "^" + count[^1..] + last;
                return ParseResult<(int, int)>.Fail(
                    bodyLength - digitRun,
                    "ambiguous-charge",
                    $"'{DiagnosticText.Excerpt(text)}' is ambiguous: the digits before '{last}' could be an atom count or the charge",
                    $"write {DiagnosticText.Excerpt(withCharge)} if the charge is {count[^1..]}{last}, or {DiagnosticText.Excerpt(body + "^" + last)} for a count of {DiagnosticText.Excerpt(count)} with charge 1{last}");
            }
        }

        return ParseResult<(int, int)>.Ok((last == '+' ? 1 : -1, bodyLength));
    }

    private sealed class Reader(string text)
    {
        private int _position;
        private int _depth;

        public ParseResult<Dictionary<string, Fraction>> ReadWhole()
        {
            var total = new Dictionary<string, Fraction>(StringComparer.Ordinal);
            bool first = true;
            while (true)
            {
                Fraction multiplier = Fraction.One;
                if (!first)
                {
                    int start = _position;
                    while (_position < text.Length && (char.IsAsciiDigit(text[_position]) || text[_position] == '.' || text[_position] == '/'))
                    {
                        _position++;
                    }

                    if (_position > start && (!RationalText.TryParse(text[start.._position], out multiplier) || multiplier <= Fraction.Zero))
                    {
                        return ParseResult<Dictionary<string, Fraction>>.Fail(start, "bad-formula", $"'{DiagnosticText.Excerpt(text[start.._position])}' is not a positive hydrate multiplier", "write it as CuSO4·5H2O or CaSO4·0.5H2O");
                    }
                }

                int partStart = _position;
                ParseResult<Dictionary<string, Fraction>> part = ReadSequence(closing: null);
                if (!part.TryGetValue(out Dictionary<string, Fraction>? counts))
                {
                    return part;
                }

                if (counts.Count == 0)
                {
                    return ParseResult<Dictionary<string, Fraction>>.Fail(partStart, "bad-formula", first ? "the formula has no element symbols" : "nothing follows the hydrate separator", "write a formula such as H2O or CuSO4·5H2O");
                }

                foreach (KeyValuePair<string, Fraction> pair in counts)
                {
                    total[pair.Key] = total.GetValueOrDefault(pair.Key, Fraction.Zero) + (pair.Value * multiplier);
                }

                if (_position >= text.Length)
                {
                    return ParseResult<Dictionary<string, Fraction>>.Ok(total);
                }

                // ReadSequence stops only at the end, a hydrate separator or a stray closing bracket.
                char stop = text[_position];
                if (stop is not ('·' or '*'))
                {
                    return ParseResult<Dictionary<string, Fraction>>.Fail(_position, "bad-formula", $"'{stop}' closes a bracket that was never opened", "check the brackets");
                }

                _position++;
                first = false;
            }
        }

        private ParseResult<Dictionary<string, Fraction>> ReadSequence(char? closing)
        {
            var counts = new Dictionary<string, Fraction>(StringComparer.Ordinal);
            while (_position < text.Length)
            {
                char ch = text[_position];
                if (closing is not null && ch == closing)
                {
                    return ParseResult<Dictionary<string, Fraction>>.Ok(counts);
                }

                if (ch is '·' or '*' or ')' or ']')
                {
                    if (closing is not null)
                    {
                        return ParseResult<Dictionary<string, Fraction>>.Fail(_position, "bad-formula", $"expected '{closing}' but found '{ch}'", "check that every bracket is closed with its own kind");
                    }

                    return ParseResult<Dictionary<string, Fraction>>.Ok(counts);
                }

                if (char.IsAsciiLetterUpper(ch))
                {
                    int start = _position;
                    string symbol = ReadSymbol();
                    if (!ElementTable.Contains(symbol))
                    {
                        return ParseResult<Dictionary<string, Fraction>>.Fail(start, "unknown-element", $"'{DiagnosticText.Excerpt(symbol)}' is not an element symbol", "element symbols start with a capital letter followed by at most one small letter (Co is cobalt, CO is carbon + oxygen)");
                    }

                    ParseResult<int> count = ReadCount();
                    if (!count.Success)
                    {
                        return ParseResult<Dictionary<string, Fraction>>.Fail(count.Failure);
                    }

                    counts[symbol] = counts.GetValueOrDefault(symbol, Fraction.Zero) + count.Value;
                    continue;
                }

                if (ch is '(' or '[')
                {
                    int open = _position;
                    char expected = ch == '(' ? ')' : ']';
                    if (_depth == MaxNesting)
                    {
                        return ParseResult<Dictionary<string, Fraction>>.Fail(open, "bad-formula", $"brackets nest more than {MaxNesting} levels deep here", "no real formula needs that many levels: check the brackets");
                    }

                    _position++;
                    _depth++;
                    ParseResult<Dictionary<string, Fraction>> inner = ReadSequence(expected);
                    _depth--;
                    if (!inner.TryGetValue(out Dictionary<string, Fraction>? innerCounts))
                    {
                        return inner;
                    }

                    if (_position >= text.Length || text[_position] != expected)
                    {
                        return ParseResult<Dictionary<string, Fraction>>.Fail(open, "bad-formula", $"'{ch}' is never closed", $"add the matching '{expected}'");
                    }

                    if (innerCounts.Count == 0)
                    {
                        return ParseResult<Dictionary<string, Fraction>>.Fail(open, "bad-formula", "empty brackets", "remove them or put a group inside");
                    }

                    _position++;
                    ParseResult<int> count = ReadCount();
                    if (!count.Success)
                    {
                        return ParseResult<Dictionary<string, Fraction>>.Fail(count.Failure);
                    }

                    foreach (KeyValuePair<string, Fraction> pair in innerCounts)
                    {
                        counts[pair.Key] = counts.GetValueOrDefault(pair.Key, Fraction.Zero) + (pair.Value * count.Value);
                    }

                    continue;
                }

                if (char.IsAsciiLetterLower(ch))
                {
                    string suggestion = char.ToUpperInvariant(ch).ToString();
                    return ParseResult<Dictionary<string, Fraction>>.Fail(_position, "unknown-element", $"'{ch}' cannot start an element symbol", $"element symbols start with a capital letter (did you mean '{suggestion}'?)");
                }

                if (char.IsAsciiDigit(ch))
                {
                    return ParseResult<Dictionary<string, Fraction>>.Fail(_position, "bad-formula", $"the count '{ch}' does not follow an element or a bracket", "a count comes right after the element or group it multiplies; put a coefficient before the formula with a space");
                }

                return ParseResult<Dictionary<string, Fraction>>.Fail(_position, "bad-formula", $"unexpected character '{ch}' in the formula", "formulas contain element symbols, counts, ( ) [ ], a hydrate dot · and a charge such as ^2-");
            }

            if (closing is not null)
            {
                return ParseResult<Dictionary<string, Fraction>>.Ok(counts);
            }

            return ParseResult<Dictionary<string, Fraction>>.Ok(counts);
        }

        private string ReadSymbol()
        {
            int start = _position;
            _position++;
            if (_position < text.Length && char.IsAsciiLetterLower(text[_position]))
            {
                string two = text.Substring(start, 2);
                if (ElementTable.Contains(two) || !ElementTable.Contains(text.Substring(start, 1)))
                {
                    _position++;
                    return two;
                }
            }

            return text.Substring(start, 1);
        }

        private ParseResult<int> ReadCount()
        {
            int start = _position;
            while (_position < text.Length && char.IsAsciiDigit(text[_position]))
            {
                _position++;
            }

            if (_position == start)
            {
                return ParseResult<int>.Ok(1);
            }

            string digits = text[start.._position];
            if (!int.TryParse(digits, NumberStyles.None, CultureInfo.InvariantCulture, out int count) || count == 0 || count > 100000)
            {
                return ParseResult<int>.Fail(start, "bad-formula", $"the atom count '{DiagnosticText.Excerpt(digits)}' must be a whole number from 1 to 100000", "write counts as positive integers");
            }

            return ParseResult<int>.Ok(count);
        }
    }
}
