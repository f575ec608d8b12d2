using PathFinder.IO;

namespace PathFinder.Tests.IO;

public sealed class TerminalTextTests
{
    [Theory]
    [InlineData("\u001b]0;pwned\u0007", "\\u001B]0;pwned\\u0007")] // window title change (OSC ... BEL)
    [InlineData("\u001b[2J\u001b[H", "\\u001B[2J\\u001B[H")] // screen clear, cursor home
    [InlineData("\u009b31m", "\\u009B31m")] // C1 CSI
    [InlineData("ok\rFAIL", "ok\\u000DFAIL")] // carriage return overwrites the line
    [InlineData("a\bb\u007f", "a\\u0008b\\u007F")]
    [InlineData("line\nfake", "line\\u000Afake")]
    [InlineData("tab\tx", "tab\\u0009x")]
    [InlineData("\u202egnp.exe", "\\u202Egnp.exe")] // right-to-left override
    public void Visible_ShowsControlCharactersOfAOneLineField(string text, string expected)
    {
        Assert.Equal(expected, TerminalText.Visible(text));
    }

    [Theory]
    [InlineData("CO2(g)")]
    [InlineData("ΔfH° ± u → 𝛥 Fe^3+(aq)")]
    [InlineData("")]
    public void Visible_KeepsOrdinaryTextTheSameInstance(string text)
    {
        Assert.Same(text, TerminalText.Visible(text));
    }

    [Fact]
    public void Visible_KeepsLineBreaksAndTabsOfTextOfSeveralLinesWhenAsked()
    {
        // Given program text of several lines with an escape sequence from the data in it
        string text = "a\tb\nc\r\nd\u001b[2J\re";

        // Then line breaks and tabs stay, the escape and a lone CR are shown
        Assert.Equal("a\tb\nc\r\nd\\u001B[2J\\u000De", TerminalText.Visible(text, keepLineBreaks: true));
    }

    [Fact]
    public void Visible_ShowsAnUnpairedSurrogateButKeepsAPair()
    {
        Assert.Equal("x\\uD835y𝛥", TerminalText.Visible("x\uD835y𝛥"));
    }

    [Fact]
    public void Visible_LeavesNoControlCharacterInAnyText()
    {
        // Given every UTF-16 code unit once (seeded order irrelevant: all are tried)
        string all = new(Enumerable.Range(0, 0x10000).Select(i => (char)i).ToArray());

        // When it is made visible
        string visible = TerminalText.Visible(all);

        // Then no control character, bidi override or lone surrogate is left
        Assert.Equal(-1, TerminalText.FirstUnsafe(visible, keepLineBreaks: false));
        Assert.DoesNotContain(visible, char.IsControl);
    }
}
