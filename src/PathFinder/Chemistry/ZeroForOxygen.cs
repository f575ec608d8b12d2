namespace PathFinder.Chemistry;

/// <summary>A digit 0 in a formula that may be the letter O typed as zero: <c>N02(g)</c>, <c>H20(g)</c>.</summary>
/// <param name="Offset">0-based offset of the first suspicious 0 in the text searched.</param>
/// <param name="Written">The species as written, e.g. <c>H20(g)</c>.</param>
/// <param name="Suggested">The species with the 0s of that count read as the letter O, e.g. <c>H2O(g)</c>.</param>
/// <param name="CountStartsWithZero">Whether the count itself starts with 0 (<c>N02</c>), which no atom count does.</param>
public sealed record ZeroForOxygen(int Offset, string Written, string Suggested, bool CountStartsWithZero)
{
    /// <summary>Finds, in an equation or species text, every atom count with a digit 0 in it, and the spelling with the letter O instead.</summary>
    /// <remarks>
    /// An atom count is a run of digits right after a letter or a closing bracket (coefficients, hydrate multipliers
    /// and charges follow a space, a dot or a caret). A count that starts with 0 is always suspicious (it is read as
    /// the count without the 0: <c>N02</c> is N2); a count such as <c>20</c> is suspicious only when the spelling
    /// with O names a species the caller knows, which the caller decides (<c>C10H8</c> is naphthalene).
    /// </remarks>
    /// <param name="text">An equation such as <c>H2(g) + 1/2 O2(g) -> H20(g)</c>, or one species.</param>
    public static IReadOnlyList<ZeroForOxygen> Find(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        var found = new List<ZeroForOxygen>();
        if (!text.Contains('0', StringComparison.Ordinal))
        {
            return found;
        }

        int i = 0;
        while (i < text.Length)
        {
            while (i < text.Length && char.IsWhiteSpace(text[i]))
            {
                i++;
            }

            int start = i;
            while (i < text.Length && !char.IsWhiteSpace(text[i]))
            {
                i++;
            }

            // A coefficient glued to the species (2H2O(g)) is not part of it.
            int species = start;
            while (species < i && (char.IsAsciiDigit(text[species]) || text[species] is '.' or '/'))
            {
                species++;
            }

            if (species < i)
            {
                AddWord(text, species, i - species, found);
            }
        }

        return found;
    }

    private static void AddWord(string text, int start, int length, List<ZeroForOxygen> found)
    {
        string word = text.Substring(start, length);
        for (int k = 1; k < word.Length; k++)
        {
            if (!char.IsAsciiDigit(word[k]) || char.IsAsciiDigit(word[k - 1]) || !(char.IsAsciiLetter(word[k - 1]) || word[k - 1] is ')' or ']'))
            {
                continue;
            }

            int end = k;
            while (end < word.Length && char.IsAsciiDigit(word[end]))
            {
                end++;
            }

            int zero = word.IndexOf('0', k, end - k);
            if (zero >= 0)
            {
                string count = word[k..end];
                string suggested = word[..k] + count.Replace('0', 'O') + word[end..];
                found.Add(new ZeroForOxygen(start + zero, word, suggested, word[k] == '0'));
            }

            k = end - 1;
        }
    }
}
