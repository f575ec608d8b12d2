using System.Globalization;
using PathFinder.Diagnostics;

namespace PathFinder.Data;

/// <summary>Reads a number from a CSV field the one way every table of a network does.</summary>
/// <remarks>
/// Invariant culture whatever the machine's; a decimal comma in a semicolon-separated file (a comma-decimal
/// spreadsheet export); the Unicode minus sign (−) as a minus. Empty, unreadable and infinite numbers are located errors.
/// </remarks>
internal static class CsvNumber
{
    /// <summary>The field's number, or null after adding an error (<c>missing-number</c> or <c>bad-number</c>).</summary>
    /// <param name="row">The row.</param>
    /// <param name="column">The field's index.</param>
    /// <param name="field">The column name, for messages and the location.</param>
    /// <param name="decimalComma">Whether the file uses decimal commas (<see cref="CsvTable.DecimalComma"/>).</param>
    /// <param name="diagnostics">Where problems are added.</param>
    /// <param name="example">A typical value of the field, shown in hints.</param>
    public static double? Read(CsvRow row, int column, string field, bool decimalComma, ICollection<Diagnostic> diagnostics, string example = "-74.87")
    {
        string text = row.FieldOrEmpty(column);
        if (text.Length == 0)
        {
            diagnostics.Add(Diagnostic.Error("missing-number", row.LocationOf(column, field), $"the {field} is empty", $"give the {field} as a number such as {example}"));
            return null;
        }

        string normalised = decimalComma ? text.Replace(',', '.') : text;
        if (normalised.Contains('−', StringComparison.Ordinal))
        {
            normalised = normalised.Replace('−', '-');
        }

        if (!double.TryParse(normalised, NumberStyles.Float, CultureInfo.InvariantCulture, out double number))
        {
            string hint = !decimalComma && text.Contains(',', StringComparison.Ordinal)
                ? "use a decimal point (1.5), not a decimal comma"
                : $"write a plain number such as {example} or 1.2e3";
            diagnostics.Add(Diagnostic.Error("bad-number", row.LocationOf(column, field), $"the {field} '{DiagnosticText.Excerpt(text)}' is not a number", hint));
            return null;
        }

        if (!double.IsFinite(number))
        {
            diagnostics.Add(Diagnostic.Error("bad-number", row.LocationOf(column, field), $"the {field} '{DiagnosticText.Excerpt(text)}' is not a finite number", "give a finite value; leave the row out if there is none"));
            return null;
        }

        return number;
    }

    /// <summary>The warning, on the header, that a semicolon-separated file was read with decimal commas.</summary>
    public static Diagnostic DecimalCommaWarning(CsvTable table) =>
        Diagnostic.Warning("decimal-comma", new SourceLocation(table.File, table.HeaderLine, 1), "the file is semicolon-separated (a comma-decimal spreadsheet export); numbers were read with decimal commas", "no action needed; export with a comma separator and decimal points to silence this");
}
