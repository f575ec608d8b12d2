using System.Globalization;
using PathFinder.IO;
using PathFinder.Tests.TestSupport;

namespace PathFinder.Tests.IO;

public sealed class CsvCellTests
{
    [Theory]
    [InlineData("=HYPERLINK(\"http://x\")", "\"'=HYPERLINK(\"\"http://x\"\")\"")]
    [InlineData("@SUM(A1)", "'@SUM(A1)")]
    [InlineData("+cmd", "'+cmd")]
    [InlineData("-2+3", "'-2+3")]
    [InlineData("-393.51", "'-393.51")] // text that looks like a number is still text: the type decides
    [InlineData("\tx", "'\tx")]
    [InlineData("\r=1", "\"'\r=1\"")]
    [InlineData("＝1+1", "'＝1+1")]
    public void Text_PutsAnApostropheBeforeTextASpreadsheetWouldRun(string text, string expected)
    {
        Assert.Equal(expected, CsvCell.Text(text));
    }

    [Theory]
    [InlineData("CO2(g)", "CO2(g)")]
    [InlineData("C(cr,graphite)", "\"C(cr,graphite)\"")]
    [InlineData("a \"b\"", "\"a \"\"b\"\"\"")]
    [InlineData("two\nlines", "\"two\nlines\"")]
    [InlineData("x=1", "x=1")]
    [InlineData("", "")]
    public void Text_QuotesOnlyWhenNeeded(string text, string expected)
    {
        Assert.Equal(expected, CsvCell.Text(text));
    }

    [Theory]
    [InlineData(-393.51, "-393.51")]
    [InlineData(0.1, "0.1")]
    [InlineData(-1e-300, "-1E-300")]
    [InlineData(double.NaN, "")]
    [InlineData(double.NegativeInfinity, "")]
    public void Number_WritesANumberAsItIs(double value, string expected)
    {
        Assert.Equal(expected, CsvCell.Number(value));
    }

    [Fact]
    public void Number_IsCultureInvariantAndReadsBack()
    {
        using var culture = new CultureScope("de-DE");

        string cell = CsvCell.Number(-393.5275590551182);

        Assert.Equal("-393.5275590551182", cell);
        Assert.Equal(-393.5275590551182, double.Parse(cell, CultureInfo.InvariantCulture));
    }

    [Theory]
    [InlineData("-1.25", "-1.25")]
    [InlineData("+2.00", "+2.00")]
    [InlineData("12", "12")]
    [InlineData("—", "—")]
    [InlineData("-1.25 ± 0.30", "'-1.25 ± 0.30")]
    [InlineData("-Infinity", "'-Infinity")]
    [InlineData("=1+1", "'=1+1")]
    public void NumberOrText_KeepsNumbersAndGuardsEverythingElse(string formatted, string expected)
    {
        Assert.Equal(expected, CsvCell.NumberOrText(formatted));
    }

    [Fact]
    public void Field_OnlyQuotes_ForFilesPathFinderReadsBack()
    {
        Assert.Equal("-x", CsvCell.Field("-x"));
        Assert.Equal("\"a,b\"", CsvCell.Field("a,b"));
        Assert.Equal("\" padded \"", CsvCell.Field(" padded "));
    }
}
