using System.Globalization;

namespace PathFinder.IO;

/// <summary>
/// The one place that decides how a CSV cell is written: quoting, numbers, and text a spreadsheet would run as a formula.
/// </summary>
/// <remarks>
/// A cell is written by its type, never by its first character: <see cref="Number(double)"/> writes a number as it is
/// (-393.51 stays -393.51), while <see cref="Text"/> puts an apostrophe before text that starts with <c>=</c>, <c>+</c>,
/// <c>-</c>, <c>@</c>, a tab or a carriage return (or their full-width forms), which spreadsheets would otherwise evaluate
/// as a formula (<c>=HYPERLINK(...)</c>, <c>@SUM(...)</c>): the OWASP "CSV injection" defence, and the apostrophe is
/// what a spreadsheet itself uses to mark a cell as text. Reports meant for people and spreadsheets use
/// <see cref="Text"/>; files PathFinder reads back itself (generated networks) use <see cref="Field"/>, which only
/// quotes, because an apostrophe would become part of the value.
/// </remarks>
public static class CsvCell
{
    /// <summary>A text cell, neutralised against formula evaluation and quoted when needed.</summary>
    public static string Text(string? text)
    {
        text ??= "";
        return Field(StartsLikeFormula(text) ? "'" + text : text);
    }

    /// <summary>A number cell: the shortest invariant text that reads back to the same double; empty when not finite.</summary>
    public static string Number(double value) =>
        double.IsFinite(value) ? value.ToString("R", CultureInfo.InvariantCulture) : "";

    /// <summary>An integer cell.</summary>
    public static string Number(long value) => value.ToString(CultureInfo.InvariantCulture);

    /// <summary>
    /// A cell of a column of numbers whose values were already formatted for the screen (z "+1.25", a count, "—"):
    /// written as it is when it is a finite invariant number, else as <see cref="Text"/>.
    /// </summary>
    public static string NumberOrText(string? formatted)
    {
        formatted ??= "";
        return double.TryParse(formatted, NumberStyles.AllowLeadingSign | NumberStyles.AllowDecimalPoint | NumberStyles.AllowExponent, CultureInfo.InvariantCulture, out double value) && double.IsFinite(value)
            ? formatted
            : Text(formatted);
    }

    /// <summary>The field as it is, quoted (RFC 4180) when it holds a comma, a quote, a line break or leading or trailing spaces.</summary>
    public static string Field(string? text)
    {
        text ??= "";
        bool quote = text.AsSpan().IndexOfAny(",\"\r\n") >= 0 || (text.Length > 0 && (char.IsWhiteSpace(text[0]) || char.IsWhiteSpace(text[^1])));
        return quote ? "\"" + text.Replace("\"", "\"\"", StringComparison.Ordinal) + "\"" : text;
    }

    /// <summary>Cells joined into one CSV line (without the line break).</summary>
    public static string Line(IEnumerable<string> cells) => string.Join(",", cells);

    /// <summary>Whether a spreadsheet would take text starting like this for a formula.</summary>
    public static bool StartsLikeFormula(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        return text.Length > 0 && text[0] is '=' or '+' or '-' or '@' or '\t' or '\r' or '\uFF1D' or '\uFF0B' or '\uFF0D' or '\uFF20';
    }
}
