using PathFinder.Diagnostics;

namespace PathFinder.Tests.Diagnostics;

public sealed class DiagnosticTests
{
    [Fact]
    public void ToString_WritesFileLineColumnKindCodeMessageAndHint()
    {
        Diagnostic diagnostic = Diagnostic.Error("unknown-unit", new SourceLocation("lab.csv", 7, 46, "unit"), "unknown unit 'kJ/fortnight'", "use kJ/mol");

        Assert.Equal("lab.csv:7:46: error unknown-unit: unknown unit 'kJ/fortnight' Fix: use kJ/mol", diagnostic.ToString());
    }

    [Fact]
    public void ToString_OfAWarningWithoutHintOrPosition()
    {
        Diagnostic diagnostic = Diagnostic.Warning("decimal-comma", new SourceLocation("lab.csv"), "semicolons");

        Assert.Equal("lab.csv: warning decimal-comma: semicolons", diagnostic.ToString());
        Assert.Equal(Severity.Warning, diagnostic.Severity);
    }

    [Theory]
    [InlineData(0, 0, "a.csv")]
    [InlineData(3, 0, "a.csv:3")]
    [InlineData(3, 9, "a.csv:3:9")]
    public void SourceLocation_DropsUnknownParts(int line, int column, string expected)
    {
        Assert.Equal(expected, new SourceLocation("a.csv", line, column).ToString());
    }

    [Fact]
    public void SourceLocation_ShiftMovesOnlyKnownColumns()
    {
        Assert.Equal(12, new SourceLocation("a.csv", 2, 5).Shift(7).Column);
        Assert.Equal(0, new SourceLocation("a.csv", 2).Shift(7).Column);
    }

    [Fact]
    public void ParseResult_ValueOfAFailureThrowsWithTheOffset()
    {
        ParseResult<string> failed = ParseResult<string>.Fail(4, "bad-formula", "broken");

        FormatException exception = Assert.Throws<FormatException>(() => failed.Value);
        Assert.Equal("broken (at offset 4)", exception.Message);
        Assert.False(failed.TryGetValue(out _));
        Assert.Equal(9, failed.Failure!.Shift(5).Offset);
    }
}
