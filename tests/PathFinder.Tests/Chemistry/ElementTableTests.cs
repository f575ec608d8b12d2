using PathFinder.Chemistry;

namespace PathFinder.Tests.Chemistry;

public sealed class ElementTableTests
{
    [Fact]
    public void All_Holds118ElementsPlusDeuteriumAndTritium()
    {
        // IUPAC periodic table (2016 names): elements 1..118, each once
        Assert.Equal(120, ElementTable.All.Count);
        Assert.Equal(Enumerable.Range(1, 118), ElementTable.All.Take(118).Select(element => element.AtomicNumber));
        Assert.Equal(ElementTable.All.Count, ElementTable.All.Select(element => element.Symbol).Distinct(StringComparer.Ordinal).Count());
        Assert.Equal(["D", "T"], ElementTable.All.Skip(118).Select(element => element.Symbol));
    }

    [Theory]
    [InlineData("Fe", 26)]
    [InlineData("Co", 27)]
    [InlineData("Og", 118)]
    [InlineData("W", 74)]
    public void TryGet_FindsSymbolsCaseSensitively(string symbol, int atomicNumber)
    {
        // Atomic numbers per the IUPAC periodic table (from memory)
        Assert.True(ElementTable.TryGet(symbol, out Element element));
        Assert.Equal(atomicNumber, element.AtomicNumber);
        Assert.Equal(symbol, element.ToString());
    }

    [Theory]
    [InlineData("CO")]
    [InlineData("fe")]
    [InlineData("Xy")]
    [InlineData("")]
    public void Contains_IsFalseForNonSymbols(string symbol)
    {
        Assert.False(ElementTable.Contains(symbol));
    }
}
