using System.Runtime.CompilerServices;
using System.Runtime.InteropServices;
using Fractions;
using PathFinder.Diagnostics;

namespace PathFinder.Chemistry;

/// <summary>Reads equations such as <c>CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)</c>, or a single species for its formation.</summary>
/// <remarks>
/// <para>Arrows: <c>-&gt;</c>, <c>→</c>, <c>⟶</c>, <c>⇌</c>, <c>=</c> or <c>&lt;=&gt;</c>. Terms are separated by a <c>+</c> with
/// spaces around it (a <c>+</c> touching a formula is a charge: <c>Na+(aq) + Cl-(aq)</c>). Coefficients are integers,
/// decimals, fractions (<c>1/2</c>, <c>3/2</c>, <c>0.5</c>) or the vulgar fractions the diagrams print (<c>½</c>,
/// <c>⅓</c>, ...), written before the species, with or without a space, and are kept exact.</para>
/// <para>Formation shorthand: a single species and no arrow means its formation from the elements in their
/// reference states (<see cref="ReferenceStates"/>).</para>
/// </remarks>
public static class EquationParser
{
    private static readonly string[] Arrows = ["<=>", "->", "→", "⟶", "⇌", "="];

    private static readonly System.Buffers.SearchValues<char> ArrowStarts = System.Buffers.SearchValues.Create("<-→⟶⇌=");

    [ThreadStatic]
    private static List<EquationTerm>? t_terms;

    [ThreadStatic]
    private static List<(int Start, int Length)>? t_words;

    /// <summary>Reads an equation, resolving species with <see cref="SpeciesParser"/>. Never throws for bad input.</summary>
    public static ParseResult<ChemicalEquation> Parse(string text) => Parse(text, SpeciesParser.Parse);

    /// <summary>Reads an equation, resolving each species token with <paramref name="resolveSpecies"/> (for declared keys).</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    public static ParseResult<ChemicalEquation> Parse(string text, Func<string, ParseResult<Species>> resolveSpecies)
    {
        ArgumentNullException.ThrowIfNull(text);
        ArgumentNullException.ThrowIfNull(resolveSpecies);
        if (string.IsNullOrWhiteSpace(text))
        {
            return ParseResult<ChemicalEquation>.Fail(0, "missing-arrow", "the equation is empty", "write reactants -> products, or a single species for its formation");
        }

        (int arrowAt, int arrowLength) = FindArrow(text, out ParseFailure? arrowFailure);
        if (arrowFailure is not null)
        {
            return ParseResult<ChemicalEquation>.Fail(arrowFailure);
        }

        // One reused buffer per thread for the terms of both sides (taken while in use, in case of re-entry).
        List<EquationTerm> terms = t_terms ?? new List<EquationTerm>(16);
        t_terms = null;
        try
        {
            return Parse(text, resolveSpecies, arrowAt, arrowLength, terms);
        }
        finally
        {
            terms.Clear();
            t_terms = terms;
        }
    }

    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static ParseResult<ChemicalEquation> Parse(string text, Func<string, ParseResult<Species>> resolveSpecies, int arrowAt, int arrowLength, List<EquationTerm> terms)
    {
        if (arrowAt < 0)
        {
            ParseFailure? single = ReadSide(text, 0, text.Length, resolveSpecies, sign: 1, terms);
            if (single is not null)
            {
                // Without an arrow, a structural error (two species with no '+' between them) marks where the arrow was forgotten.
                return single.Code == "bad-equation"
                    ? ParseResult<ChemicalEquation>.Fail(single.Offset, "missing-arrow", "the equation has no arrow", "write reactants -> products; a single species alone (no coefficient) means its formation from the elements")
                    : ParseResult<ChemicalEquation>.Fail(single);
            }

            if (terms.Count != 1 || terms[0].Coefficient != Fraction.One)
            {
                return ParseResult<ChemicalEquation>.Fail(text.Length, "missing-arrow", "the equation has no arrow", "write reactants -> products; a single species alone (no coefficient) means its formation from the elements");
            }

            ChemicalEquation formation = ChemicalEquation.Formation(terms[0].Species);
            if (formation.IsEmpty)
            {
                return ParseResult<ChemicalEquation>.Fail(0, "reference-formation", $"{terms[0].Species.Name} is an element in its reference state (or a conventional zero): its formation reaction is empty", "measure a reaction instead, or drop this row");
            }

            return ParseResult<ChemicalEquation>.Ok(formation);
        }

        ParseFailure? left = ReadSide(text, 0, arrowAt, resolveSpecies, sign: -1, terms);
        if (left is not null)
        {
            return ParseResult<ChemicalEquation>.Fail(left);
        }

        int reactants = terms.Count;
        ParseFailure? right = ReadSide(text, arrowAt + arrowLength, text.Length, resolveSpecies, sign: 1, terms);
        if (right is not null)
        {
            return ParseResult<ChemicalEquation>.Fail(right);
        }

        int products = terms.Count - reactants;
        if (reactants == 0 || products == 0)
        {
            int where = reactants == 0 ? 0 : arrowAt + arrowLength;
            return ParseResult<ChemicalEquation>.Fail(where, "bad-equation", reactants == 0 ? "nothing before the arrow" : "nothing after the arrow", "write reactants -> products");
        }

        ChemicalEquation equation = ChemicalEquation.FromTerms(CollectionsMarshal.AsSpan(terms));
        if (equation.IsEmpty)
        {
            return ParseResult<ChemicalEquation>.Fail(0, "bad-equation", "every species cancels: the equation is empty", "check the equation");
        }

        return ParseResult<ChemicalEquation>.Ok(equation);
    }

    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static (int At, int Length) FindArrow(string text, out ParseFailure? failure)
    {
        failure = null;
        int found = -1;
        int length = 0;
        for (int i = 0; i < text.Length; i++)
        {
            // Every arrow starts with one of these characters; jump to the next one.
            int next = text.AsSpan(i).IndexOfAny(ArrowStarts);
            if (next < 0)
            {
                break;
            }

            i += next;
            foreach (string arrow in Arrows)
            {
                if (string.CompareOrdinal(text, i, arrow, 0, arrow.Length) != 0)
                {
                    continue;
                }

                if (found >= 0)
                {
                    failure = new ParseFailure(i, "the equation has more than one arrow", "write one reaction per row: reactants -> products", "bad-equation");
                    return (-1, 0);
                }

                found = i;
                length = arrow.Length;
                i += arrow.Length - 1;
                break;
            }
        }

        return (found, length);
    }

    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static ParseFailure? ReadSide(string text, int start, int end, Func<string, ParseResult<Species>> resolveSpecies, int sign, List<EquationTerm> terms)
    {
        // Words are kept as (start, length) in the text; only species names and messages become strings. The list
        // is reused per thread (taken while in use, in case of re-entry through the species resolver).
        List<(int Start, int Length)> words = t_words ?? new List<(int Start, int Length)>(24);
        t_words = null;
        try
        {
            return ReadSide(text, start, end, resolveSpecies, sign, terms, words);
        }
        finally
        {
            words.Clear();
            t_words = words;
        }
    }

    /// <summary>Appends one side's terms to <paramref name="terms"/>; returns the first failure, or null.</summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static ParseFailure? ReadSide(string text, int start, int end, Func<string, ParseResult<Species>> resolveSpecies, int sign, List<EquationTerm> terms, List<(int Start, int Length)> words)
    {
        int i = start;
        while (i <= end)
        {
            while (i < end && char.IsWhiteSpace(text[i]))
            {
                i++;
            }

            if (i >= end)
            {
                break;
            }

            int wordStart = i;
            while (i < end && !char.IsWhiteSpace(text[i]))
            {
                i++;
            }

            words.Add((wordStart, i - wordStart));
        }

        int termStart = 0;
        for (int w = 0; w <= words.Count; w++)
        {
            // A '+' after the last word closes the last term.
            bool last = w == words.Count;
            int offset = last ? end : words[w].Start;
            if (!last && !(words[w].Length == 1 && text[offset] == '+'))
            {
                continue;
            }

            int count = w - termStart;
            if (count == 0)
            {
                if (last && words.Count == 0)
                {
                    // An empty side: the caller reports it.
                    break;
                }

                return new ParseFailure(offset, "a '+' has no species on one side", "separate species with ' + ' and write nothing else between them", "bad-equation");
            }

            ParseFailure? failure = ReadTerm(text, words, termStart, count, resolveSpecies, sign, out EquationTerm value);
            if (failure is not null)
            {
                return failure;
            }

            terms.Add(value);
            termStart = w + 1;
        }

        return null;
    }

    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private static ParseFailure? ReadTerm(string text, List<(int Start, int Length)> words, int first, int count, Func<string, ParseResult<Species>> resolveSpecies, int sign, out EquationTerm term)
    {
        term = default;
        string Word(int index) => text.Substring(words[first + index].Start, words[first + index].Length);
        if (count > 1 && SpaceBeforeState(text, words, first, count) is { } spaced)
        {
            return spaced;
        }

        if (count > 2)
        {
            return new ParseFailure(words[first + 2].Start, $"unexpected '{DiagnosticText.Excerpt(Word(2))}': a term is an optional coefficient and one species", "separate species with ' + ' (spaces around the plus)", "bad-equation");
        }

        Fraction coefficient = Fraction.One;
        string speciesText;
        int speciesOffset;
        int termOffset = words[first].Start;
        if (count == 2)
        {
            if (!RationalText.TryParse(text.AsSpan(words[first].Start, words[first].Length), out coefficient))
            {
                if (GluedPlus(text, words[first].Start, words[first].Length) is { } glued)
                {
                    return glued;
                }

                return new ParseFailure(termOffset, $"'{DiagnosticText.Excerpt(Word(0))}' is not a coefficient", "write coefficients as 2, 0.5 or 3/2 before the species", "bad-coefficient");
            }

            speciesText = Word(1);
            speciesOffset = words[first + 1].Start;
        }
        else
        {
            ReadOnlySpan<char> word = text.AsSpan(termOffset, words[first].Length);
            int glued = 0;
            while (glued < word.Length && (char.IsAsciiDigit(word[glued]) || word[glued] is '.' or '/' || RationalText.IsVulgarFraction(word[glued])))
            {
                glued++;
            }

            if (glued > 0 && glued < word.Length)
            {
                if (!RationalText.TryParse(word[..glued], out coefficient))
                {
                    return new ParseFailure(termOffset, $"'{DiagnosticText.Excerpt(word[..glued].ToString())}' is not a coefficient", "write coefficients as 2, 0.5 or 3/2 before the species", "bad-coefficient");
                }
            }
            else
            {
                glued = 0;
            }

            speciesText = word[glued..].ToString();
            speciesOffset = termOffset + glued;
        }

        if (coefficient <= Fraction.Zero)
        {
            return new ParseFailure(termOffset, "coefficients must be positive", "move the species to the other side of the arrow instead of using a negative or zero coefficient", "bad-coefficient");
        }

        ParseResult<Species> species = resolveSpecies(speciesText);
        if (!species.TryGetValue(out Species? value))
        {
            ParseFailure failure = species.Failure!.Shift(speciesOffset);
            int plus = speciesText.IndexOf('+', StringComparison.Ordinal);
            if (plus >= 0 && plus < speciesText.Length - 1 && (char.IsAsciiLetterUpper(speciesText[plus + 1]) || char.IsAsciiDigit(speciesText[plus + 1])))
            {
                failure = failure with { Hint = "separate species with ' + ' (spaces around the plus); a + touching a formula is read as a charge" };
            }

            return failure;
        }

        term = new EquationTerm(value, sign < 0 ? -coefficient : coefficient);
        return null;
    }
    /// <summary>A failure for a state written apart from its formula (<c>NH3 (g)</c>), or null.</summary>
    /// <remarks>Without this, the formula before the space is taken for a coefficient, which points the wrong way.</remarks>
    private static ParseFailure? SpaceBeforeState(string text, List<(int Start, int Length)> words, int first, int count)
    {
        for (int w = first + 1; w < first + count; w++)
        {
            (int start, int length) = words[w];
            (int previousStart, int previousLength) = words[w - 1];
            if (text[start] != '(' || !char.IsAsciiLetterLower(text[Math.Min(start + 1, start + length - 1)]))
            {
                continue;
            }

            string formula = text.Substring(previousStart, previousLength);
            string joined = formula + text.Substring(start, length);
            return new ParseFailure(
                previousStart + previousLength,
                $"a space separates '{DiagnosticText.Excerpt(formula)}' from its state '{DiagnosticText.Excerpt(text.Substring(start, length))}'",
                $"remove the space between the formula and the state: {DiagnosticText.Excerpt(joined)}",
                "bad-spacing");
        }

        return null;
    }

    /// <summary>A failure for a <c>+</c> written without spaces between two terms (<c>NO(g)+1/2 O2(g)</c>), or null.</summary>
    /// <remarks>The glued text is otherwise read as one word and reported as a bad coefficient or formula.</remarks>
    private static ParseFailure? GluedPlus(string text, int start, int length)
    {
        int plus = text.IndexOf('+', start, length);
        if (plus <= start || plus >= start + length - 1)
        {
            return null;
        }

        string word = text.Substring(start, length);
        return new ParseFailure(
            plus,
            $"the '+' in '{DiagnosticText.Excerpt(word)}' has no spaces around it, so the two terms are read as one",
            "put spaces around + and -> (reactants + reactants -> products); a + touching a formula is read as a charge",
            "bad-spacing");
    }
}
