using System.Text;
using System.Text.Encodings.Web;
using System.Text.Json;
using PathFinder.IO;

namespace PathFinder.Tui.ViewModels;

/// <summary>Turns a <see cref="TableSnapshot"/> into CSV, JSON or Markdown text.</summary>
/// <remarks>CSV cells and Markdown text are written by <see cref="CsvCell"/> and <see cref="MarkdownCell"/>, as in the CLI.</remarks>
public static class TableExporter
{
    private static readonly JsonSerializerOptions JsonOptions = new() { WriteIndented = true, Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping };

    /// <summary>The format implied by a file extension (.csv, .json, .md/.markdown, .svg), or null.</summary>
    public static ExportFormat? FormatFromPath(string path)
    {
        ArgumentNullException.ThrowIfNull(path);
        return Path.GetExtension(path).ToLowerInvariant() switch
        {
            ".csv" => ExportFormat.Csv,
            ".json" => ExportFormat.Json,
            ".md" or ".markdown" => ExportFormat.Markdown,
            ".svg" => ExportFormat.Svg,
            _ => null,
        };
    }

    /// <summary>Formats the table; <see cref="ExportFormat.Svg"/> is not a table format and throws.</summary>
    public static string Format(TableSnapshot table, ExportFormat format)
    {
        ArgumentNullException.ThrowIfNull(table);
        return format switch
        {
            ExportFormat.Csv => Csv(table),
            ExportFormat.Json => Json(table),
            ExportFormat.Markdown => Markdown(table),
            _ => throw new ArgumentOutOfRangeException(nameof(format), format, "a table is exported as CSV, JSON or Markdown"),
        };
    }

    private static string Csv(TableSnapshot table)
    {
        var text = new StringBuilder();
        text.Append(CsvCell.Line(table.Headers.Select(CsvCell.Text))).Append('\n');
        foreach (IReadOnlyList<string> row in table.Rows)
        {
            text.Append(CsvCell.Line(row.Select((cell, column) => table.IsNumberColumn(column) ? CsvCell.NumberOrText(cell) : CsvCell.Text(cell)))).Append('\n');
        }

        return text.ToString();
    }

    private static string Json(TableSnapshot table)
    {
        var rows = table.Rows
            .Select(row => table.Headers.Select((header, i) => (header, cell: i < row.Count ? row[i] : "")).ToDictionary(pair => pair.header, pair => pair.cell))
            .ToArray();
        return JsonSerializer.Serialize(new { table = table.Title, rows }, JsonOptions) + "\n";
    }

    private static string Markdown(TableSnapshot table)
    {
        var text = new StringBuilder();
        text.Append("## ").Append(MarkdownCell.Text(table.Title)).Append("\n\n");
        text.Append("| ").Append(string.Join(" | ", table.Headers.Select(MarkdownCell.Text))).Append(" |\n");
        text.Append('|').Append(string.Join("|", table.Headers.Select(_ => "---"))).Append("|\n");
        foreach (IReadOnlyList<string> row in table.Rows)
        {
            text.Append("| ").Append(string.Join(" | ", row.Select(MarkdownCell.Text))).Append(" |\n");
        }

        return text.ToString();
    }
}
