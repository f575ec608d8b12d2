using PathFinder.Diagnostics;

namespace PathFinder.Tests.Diagnostics;

public sealed class DiagnosticTextTests
{
    [Theory]
    [InlineData(0)]
    [InlineData(80)]
    public void Excerpt_KeepsShortTextWhole(int length)
    {
        string text = new('a', length);

        Assert.Equal(text, DiagnosticText.Excerpt(text));
    }

    [Fact]
    public void Excerpt_CutsLongTextTo80CharactersWithAnEllipsis()
    {
        string excerpt = DiagnosticText.Excerpt(new string('a', 100_000));

        Assert.Equal(new string('a', 79) + "…", excerpt);
    }

    [Fact]
    public void Excerpt_NeverSplitsASurrogatePair()
    {
        // Given text whose 79th character starts a surrogate pair (𝛥, U+1D6E5)
        string text = new string('a', 78) + "𝛥" + new string('b', 10);

        // Then the pair is dropped whole
        Assert.Equal(new string('a', 78) + "…", DiagnosticText.Excerpt(text));
    }
}
