using PathFinder.IO;

namespace PathFinder.Tests.IO;

public sealed class MarkdownCellTests
{
    [Theory]
    [InlineData("x|y", "x\\|y")]
    [InlineData("|<script>alert(1)</script>", "\\|\\<script\\>alert(1)\\</script\\>")]
    [InlineData("`code`", "\\`code\\`")]
    [InlineData("a\\b", "a\\\\b")]
    [InlineData("*bold* _it_ ~s~", "\\*bold\\* \\_it\\_ \\~s\\~")]
    [InlineData("[x](http://evil)", "\\[x\\](http://evil)")]
    [InlineData("&lt;", "\\&lt;")]
    [InlineData("two\nlines\r\nhere", "two lines here")]
    [InlineData("\u001b[2J", "\\\\u001B\\[2J")]
    [InlineData("CO2(g)", "CO2(g)")]
    [InlineData("", "")]
    public void Text_EscapesEverythingMarkdownWouldActOn(string text, string expected)
    {
        Assert.Equal(expected, MarkdownCell.Text(text));
    }

    [Fact]
    public void Text_KeepsATableRowToItsColumns()
    {
        // Given a row whose data cell holds pipes and a line break
        string row = "| " + MarkdownCell.Text("a|b\n| c |") + " | 1 |";

        // Then the row is still one line, and only its own unescaped pipes separate cells
        Assert.DoesNotContain('\n', row);
        Assert.Equal(3, System.Text.RegularExpressions.Regex.Matches(row, @"(?<!\\)\|").Count);
    }
}
