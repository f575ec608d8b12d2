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
    public void Csv_guards_text_cells_a_spreadsheet_would_run_but_keeps_number_columns_numbers()
    {
        // Given a table with hostile text and a column of numbers (z)
        var table = new TableSnapshot("T", ["id", "r", "value ± u", "source"],
        [
            ["=HYPERLINK(\"http://x\")", "-1.25", "-393.51 ± 0.30", "@src"],
            ["m2", "+2.00", "—", "-cmd|' /C calc'!A0"],
            ["m3", "=1+1", "1.0", "\tx"],
        ], NumberColumns: [1]);

        // When it is exported as CSV
        string csv = TableExporter.Format(table, ExportFormat.Csv);

        // Then text cells starting with = + - @ or a tab get an apostrophe, numbers in the number column stay numbers
        Assert.Equal(
            "id,r,value ± u,source\n" +
            "\"'=HYPERLINK(\"\"http://x\"\")\",-1.25,'-393.51 ± 0.30,'@src\n" +
            "m2,+2.00,—,'-cmd|' /C calc'!A0\n" +
            "m3,'=1+1,1.0,'\tx\n",
            csv);
    }

    [Fact]
    public void Markdown_escapes_html_backticks_and_backslashes()
    {
        var table = new TableSnapshot("T", ["id", "note"], [["m1", "|<script>alert(1)</script> `x` a\\b\nnext"]]);

        string markdown = TableExporter.Format(table, ExportFormat.Markdown);

        Assert.Contains("| m1 | \\|\\<script\\>alert(1)\\</script\\> \\`x\\` a\\\\b next |\n", markdown, StringComparison.Ordinal);
        Assert.DoesNotContain("<script>", markdown, StringComparison.Ordinal);
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
