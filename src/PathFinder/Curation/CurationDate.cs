using System.Globalization;

namespace PathFinder.Curation;

/// <summary>Reads the date of a curation decision in the spellings people and spreadsheets write.</summary>
/// <remarks>
/// <para>Accepted: ISO 8601 (<c>2024-05-17</c>, also with a time, <c>2024-05-17T10:30</c>), year first with slashes or
/// dots (<c>2024/05/17</c>), a month name (<c>17 May 2024</c>, <c>17-May-2024</c>, <c>May 17, 2024</c>), and day and month
/// as numbers (<c>17/05/2024</c>, <c>5.17.2024</c>) when only one order makes a date or both orders give the same day.</para>
/// <para><c>05/06/2024</c> could be 5 June or 6 May, so it is never guessed: the text is kept as written and the decision
/// still applies (the date only records when it was made).</para>
/// </remarks>
public static class CurationDate
{
    private static readonly string[] IsoAndNamedFormats =
    [
        "yyyy-MM-dd", "yyyy-M-d", "yyyy/M/d", "yyyy.M.d", "yyyy-MM-ddTHH:mm", "yyyy-MM-ddTHH:mm:ss", "yyyy-MM-dd HH:mm", "yyyy-MM-dd HH:mm:ss",
        "d MMM yyyy", "d MMMM yyyy", "d-MMM-yyyy", "d-MMMM-yyyy", "MMM d yyyy", "MMMM d yyyy", "MMM d, yyyy", "MMMM d, yyyy",
    ];

    /// <summary>Reads <paramref name="text"/>; the result says whether it is a date, and why not when it is not.</summary>
    /// <param name="text">The field as written (surrounding blanks ignored).</param>
    /// <param name="date">The date when one reading is certain.</param>
    /// <param name="problem">Why no date was taken (empty text, ambiguous day and month, not a date), or empty.</param>
    /// <returns>Whether <paramref name="date"/> holds the date.</returns>
    public static bool TryRead(string text, out DateOnly date, out string problem)
    {
        ArgumentNullException.ThrowIfNull(text);
        date = default;
        string trimmed = text.Trim();
        if (trimmed.Length == 0)
        {
            problem = "the decision has no date";
            return false;
        }

        if (DateTime.TryParseExact(trimmed, IsoAndNamedFormats, CultureInfo.InvariantCulture, DateTimeStyles.AllowInnerWhite, out DateTime parsed))
        {
            date = DateOnly.FromDateTime(parsed);
            problem = "";
            return true;
        }

        string[] parts = trimmed.Split('/', '.', '-');
        if (parts.Length == 3 && parts[2].Length == 4 && parts.All(IsNumber))
        {
            int first = int.Parse(parts[0], CultureInfo.InvariantCulture);
            int second = int.Parse(parts[1], CultureInfo.InvariantCulture);
            int year = int.Parse(parts[2], CultureInfo.InvariantCulture);
            bool dayFirst = IsDate(year, second, first);
            bool monthFirst = IsDate(year, first, second);
            if (dayFirst && monthFirst && first != second)
            {
                problem = $"'{trimmed}' could be day/month or month/day";
                return false;
            }

            if (dayFirst || monthFirst)
            {
                date = dayFirst ? new DateOnly(year, second, first) : new DateOnly(year, first, second);
                problem = "";
                return true;
            }
        }

        problem = $"'{Shorten(trimmed)}' is not a date";
        return false;
    }

    private static bool IsNumber(string part) => part.Length is > 0 and <= 4 && part.All(char.IsAsciiDigit);

    private static bool IsDate(int year, int month, int day) =>
        year is >= 1 and <= 9999 && month is >= 1 and <= 12 && day >= 1 && day <= DateTime.DaysInMonth(year, month);

    private static string Shorten(string text) => text.Length <= 40 ? text : string.Concat(text.AsSpan(0, 39), "…");
}
