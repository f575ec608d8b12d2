using System.Text.Json;
using PathFinder.Tui.ViewModels;

namespace PathFinder.Tui.Tests.ViewModels;

public sealed class TableExporterTests
{
    private static readonly TableSnapshot Table = new("T", ["id", "note"], [["A1", "a, \"b\""], ["A2", "x|y"]]);

    [Fact]
    public void Csv_quotes_fields_with_commas_and_quotes()
    {
        string csv = TableExporter.Format(Table, ExportFormat.Csv);

        Assert.Equal("id,note\nA1,\"a, \"\"b\"\"\"\nA2,x|y\n", csv);
    }

    [Fact]
    public void Json_has_one_object_per_row_keyed_by_header()
    {
        using JsonDocument json = JsonDocument.Parse(TableExporter.Format(Table, ExportFormat.Json));

        JsonElement rows = json.RootElement.GetProperty("rows");
        Assert.Equal(2, rows.GetArrayLength());
        Assert.Equal("a, \"b\"", rows[0].GetProperty("note").GetString());
    }

    [Fact]
    public void Markdown_escapes_pipes()
    {
        Assert.Contains("| A2 | x\\|y |", TableExporter.Format(Table, ExportFormat.Markdown), StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("a.csv", ExportFormat.Csv)]
    [InlineData("a.JSON", ExportFormat.Json)]
    [InlineData("a.md", ExportFormat.Markdown)]
    [InlineData("a.svg", ExportFormat.Svg)]
    public void FormatFromPath_follows_the_extension(string path, ExportFormat expected)
    {
        Assert.Equal(expected, TableExporter.FormatFromPath(path));
    }
}
