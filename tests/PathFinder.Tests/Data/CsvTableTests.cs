using System.Text;
using PathFinder.Data;
using PathFinder.Diagnostics;

namespace PathFinder.Tests.Data;

public sealed class CsvTableTests
{
    [Fact]
    public void Parse_ReadsHeaderRowsAndFieldColumns()
    {
        // Given a header and a row with a quoted field holding a comma
        List<Diagnostic> diagnostics = [];
        CsvTable table = Parse("id,note,value\nm1,\"a, b\",2.5\n", diagnostics)!;

        // Then fields are unquoted and each column points at the field's content (inside the quotes)
        Assert.Empty(diagnostics);
        Assert.Equal(["id", "note", "value"], table.Header);
        Assert.Equal([1, 4, 9], table.HeaderColumns);
        CsvRow row = Assert.Single(table.Rows);
        Assert.Equal(["m1", "a, b", "2.5"], row.Fields);
        Assert.Equal([1, 5, 11], row.Columns);
        Assert.Equal(2, row.Line);
        Assert.Equal(',', table.Delimiter);
        Assert.False(table.DecimalComma);
    }

    [Fact]
    public void Parse_ReportsAStrayQuote_AndLeavesThatRowOut()
    {
        // Given a row whose unquoted field holds a quote (a common spreadsheet slip)
        List<Diagnostic> diagnostics = [];
        CsvTable table = Parse("id,note,value\nm1,a \"b\" c,2.5\nm2,fine,3.0\n", diagnostics)!;

        // Then one located error names the field, and only the sound row is kept
        Diagnostic error = Assert.Single(diagnostics);
        Assert.Equal(("bad-csv", 2, 6), (error.Code, error.Location.Line, error.Location.Column));
        Assert.Contains("stray quote", error.Message, StringComparison.Ordinal);
        CsvRow row = Assert.Single(table.Rows);
        Assert.Equal("m2", row.Fields[0]);
    }

    [Theory]
    [InlineData("id,note,value\nm1,fine,1.0\nm2,\"never closed,2.5\nm3,lost,3.0\n", 3, 4, 2)]
    [InlineData("id,note,value\nm1,fine,1.0\nm2,x,  \"2.5", 3, 8, 1)]
    [InlineData("id,note,value\r\nm1,\"a\"\"b\",1\r\nm2,\"open\r\n\r\nm3,x,3\r\n", 3, 4, 3)]
    public void Parse_PointsAnUnclosedQuoteAtItsOpeningLineAndColumn(string text, int line, int column, int lines)
    {
        // Given a field whose opening quote is never closed (it used to be reported at the end of the file, without a column)
        List<Diagnostic> diagnostics = [];
        Parse(text, diagnostics);

        // Then the error points at the opening quote and says how much of the file it swallowed
        Diagnostic error = Assert.Single(diagnostics);
        Assert.Equal(("bad-csv", line, column), (error.Code, error.Location.Line, error.Location.Column));
        Assert.Equal($"the quote opened here is never closed: the rest of the file ({lines} line(s)) reads as one field", error.Message);
    }

    [Fact]
    public void Parse_UnescapesDoubledQuotes()
    {
        CsvTable table = Parse("id,note\nm1,\"the \"\"hot\"\" cell\"\n", [])!;

        Assert.Equal("the \"hot\" cell", table.Rows[0].Fields[1]);
    }

    [Fact]
    public void Parse_SkipsCommentsAndBlankLinesButCountsThem()
    {
        CsvTable table = Parse("# a comment\n\nid,value\n# another\nm1,1\n\n   \nm2,2\n", [])!;

        Assert.Equal(3, table.HeaderLine);
        Assert.Equal([5, 8], table.Rows.Select(row => row.Line));
    }

    [Theory]
    [InlineData("id;value;unit\nm1;1,5;kJ/mol\n", ';', true)]
    [InlineData("id\tvalue\tunit\nm1\t1.5\tkJ/mol\n", '\t', false)]
    [InlineData("id,value,unit\nm1,1.5,kJ/mol\n", ',', false)]
    public void Parse_DetectsTheDelimiterFromTheHeader(string content, char delimiter, bool decimalComma)
    {
        CsvTable table = Parse(content, [])!;

        Assert.Equal(delimiter, table.Delimiter);
        Assert.Equal(decimalComma, table.DecimalComma);
        Assert.Equal(3, table.Rows[0].Fields.Count);
    }

    [Fact]
    public void Parse_StripsTheByteOrderMark()
    {
        byte[] bytes = [0xEF, 0xBB, 0xBF, .. Encoding.UTF8.GetBytes("id,value\nm1,1\n")];

        CsvTable table = CsvTable.Parse(bytes, "bom.csv", [])!;

        Assert.Equal("id", table.Header[0]);
        Assert.Equal(0, table.IndexOf("ID"));
        Assert.Equal(1, table.HeaderColumns[0]);
    }

    [Fact]
    public void IndexOf_IsCaseInsensitiveAndMinusOneWhenAbsent()
    {
        CsvTable table = Parse("Id,Value\n", [])!;

        Assert.Equal(1, table.IndexOf("value"));
        Assert.Equal(-1, table.IndexOf("unit"));
        Assert.Empty(table.Rows);
    }

    [Theory]
    [InlineData(new byte[] { 0x69, 0x64, 0x00, 0x0A }, "binary-file")]
    [InlineData(new byte[] { 0x69, 0x64, 0x0A, 0xC3, 0x28, 0x0A }, "not-utf8")]
    [InlineData(new byte[] { }, "empty-file")]
    [InlineData(new byte[] { 0x23, 0x20, 0x78, 0x0A }, "empty-file")]
    public void Parse_RefusesUnreadableContentWithOneDiagnostic(byte[] bytes, string code)
    {
        List<Diagnostic> diagnostics = [];

        CsvTable? table = CsvTable.Parse(bytes, "bad.csv", diagnostics);

        Assert.Null(table);
        Diagnostic diagnostic = Assert.Single(diagnostics);
        Assert.Equal(code, diagnostic.Code);
        Assert.Equal(new SourceLocation("bad.csv"), diagnostic.Location);
    }

    [Fact]
    public void Read_ReportsAMissingFileAsUnreadable()
    {
        List<Diagnostic> diagnostics = [];

        CsvTable? table = CsvTable.Read(Path.Combine(Path.GetTempPath(), Guid.NewGuid().ToString("N") + ".csv"), "gone.csv", diagnostics);

        Assert.Null(table);
        Assert.Equal("unreadable-file", Assert.Single(diagnostics).Code);
    }

    [Fact]
    public void CsvRow_LocationOfAMissingFieldFallsBackToTheLastField()
    {
        CsvTable table = Parse("a,b,c\nx,y\n", [])!;
        CsvRow row = table.Rows[0];

        Assert.Equal(new SourceLocation("t.csv", 2, 3, "c"), row.LocationOf(2, "c"));
        Assert.Equal("", row.FieldOrEmpty(2));
    }

    private static CsvTable? Parse(string content, List<Diagnostic> diagnostics) =>
        CsvTable.Parse(Encoding.UTF8.GetBytes(content), "t.csv", diagnostics);
}
