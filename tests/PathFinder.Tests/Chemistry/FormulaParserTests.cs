using Fractions;
using PathFinder.Chemistry;
using PathFinder.Diagnostics;

namespace PathFinder.Tests.Chemistry;

public sealed class FormulaParserTests
{
    /// <summary>Composition written as "El:count El:count", counts as integers or fractions.</summary>
    [Theory]
    [InlineData("H2O", "H:2 O:1")]
    [InlineData("Ca(OH)2", "Ca:1 O:2 H:2")]
    [InlineData("K4[Fe(CN)6]", "K:4 Fe:1 C:6 N:6")]
    [InlineData("CuSO4·5H2O", "Cu:1 S:1 O:9 H:10")]
    [InlineData("CuSO4*5H2O", "Cu:1 S:1 O:9 H:10")]
    [InlineData("CaSO4·0.5H2O", "Ca:1 S:1 O:9/2 H:1")]
    [InlineData("Co", "Co:1")]
    [InlineData("CO", "C:1 O:1")]
    [InlineData("Al2(SO4)3", "Al:2 S:3 O:12")]
    [InlineData("[Co(NH3)6]Cl3", "Co:1 N:6 H:18 Cl:3")]
    [InlineData("((CH3)3C)2O", "C:8 H:18 O:1")]
    [InlineData("Ca10(PO4)6(OH)2", "Ca:10 P:6 O:26 H:2")]
    [InlineData("CH3COOH", "C:2 H:4 O:2")]
    [InlineData("D2O", "D:2 O:1")]
    public void Parse_ReadsTrickyFormulas(string text, string expected)
    {
        // Given a formula with groups, brackets or a hydrate separator
        // When it is read
        Formula formula = FormulaParser.Parse(text).Value;

        // Then every element count is exact
        Assert.Equal(Composition(expected), formula.Composition.OrderBy(pair => pair.Key, StringComparer.Ordinal).Select(pair => $"{pair.Key}:{RationalText.Format(pair.Value)}"));
        Assert.Equal(0, formula.Charge);
    }

    [Theory]
    [InlineData("Na+", 1, "Na:1")]
    [InlineData("Cl-", -1, "Cl:1")]
    [InlineData("NH4+", 1, "N:1 H:4")]
    [InlineData("SO4^2-", -2, "S:1 O:4")]
    [InlineData("Fe^3+", 3, "Fe:1")]
    [InlineData("H+", 1, "H:1")]
    [InlineData("OH-", -1, "O:1 H:1")]
    [InlineData("PO4^3-", -3, "P:1 O:4")]
    [InlineData("Hg2^2+", 2, "Hg:2")]
    public void Parse_ReadsCharges(string text, int charge, string expected)
    {
        // Given an ion in one of the two accepted charge notations
        Formula formula = FormulaParser.Parse(text).Value;

        // Then the charge and composition are read, the sign not taken as part of the body
        Assert.Equal(charge, formula.Charge);
        Assert.Equal(Composition(expected), formula.Composition.OrderBy(pair => pair.Key, StringComparer.Ordinal).Select(pair => $"{pair.Key}:{RationalText.Format(pair.Value)}"));
    }

    [Theory]
    [InlineData("e-")]
    [InlineData("e^-")]
    public void Parse_ReadsTheElectron(string text)
    {
        Formula formula = FormulaParser.Parse(text).Value;

        Assert.True(formula.IsElectron);
        Assert.Equal(-1, formula.Charge);
        Assert.Empty(formula.Composition);
    }

    [Theory]
    [InlineData("Fe3+", 2)]
    [InlineData("SO42-", 2)]
    [InlineData("O2-", 1)]
    [InlineData("Cu2+", 2)]
    public void Parse_RefusesAmbiguousChargeAtTheDigits(string text, int offset)
    {
        // Given a charge written after digits that could be an atom count (Fe3+: Fe^3+ or an Fe3 cluster?)
        ParseResult<Formula> result = FormulaParser.Parse(text);

        // Then it is refused where the digits start, with a hint naming the unambiguous spelling
        Assert.False(result.Success);
        Assert.Equal("ambiguous-charge", result.Failure.Code);
        Assert.Equal(offset, result.Failure.Offset);
        Assert.Contains("^", result.Failure.Hint, StringComparison.Ordinal);
    }

    [Fact]
    public void Parse_SuggestsBothReadingsOfFe3Plus()
    {
        ParseFailure failure = FormulaParser.Parse("Fe3+").Failure!;

        Assert.Equal("write Fe^3+ if the charge is 3+, or Fe3^+ for a count of 3 with charge 1+", failure.Hint);
    }

    [Theory]
    [InlineData("Xy2O", 0, "unknown-element")]
    [InlineData("CH3Qz", 3, "unknown-element")]
    [InlineData("h2o", 0, "unknown-element")]
    [InlineData("Ca(OH2", 2, "bad-formula")]
    [InlineData("K4[Fe(CN)6", 2, "bad-formula")]
    [InlineData("K4[Fe(CN)6)", 10, "bad-formula")]
    [InlineData("H2O)", 3, "bad-formula")]
    [InlineData("2H2O", 0, "bad-formula")]
    [InlineData("H(2)O", 2, "bad-formula")]
    [InlineData("", 0, "bad-formula")]
    [InlineData("H2O!", 3, "bad-formula")]
    [InlineData("H0", 1, "bad-formula")]
    [InlineData("Ca()", 2, "bad-formula")]
    [InlineData("CuSO4·", 6, "bad-formula")]
    [InlineData("CuSO4·0H2O", 6, "bad-formula")]
    [InlineData("C99999999999H4", 1, "bad-formula")]
    [InlineData("Fe^3", 2, "bad-charge")]
    [InlineData("Fe^x+", 3, "bad-charge")]
    [InlineData("Na++", 2, "bad-charge")]
    public void Parse_ReportsMalformedFormulasAtTheExactOffset(string text, int offset, string code)
    {
        // Given a malformed formula
        ParseResult<Formula> result = FormulaParser.Parse(text);

        // Then reading fails (without throwing) at the 0-based offset of the first bad character
        Assert.False(result.Success);
        Assert.Equal(offset, result.Failure.Offset);
        Assert.Equal(code, result.Failure.Code);
    }

    [Fact]
    public void Parse_SuggestsTheCapitalForALowerCaseStart()
    {
        ParseFailure failure = FormulaParser.Parse("h2o").Failure!;

        Assert.Equal("'h' cannot start an element symbol", failure.Message);
        Assert.Contains("did you mean 'H'?", failure.Hint, StringComparison.Ordinal);
    }

    [Fact]
    public void Parse_NamesTheUnknownSymbol()
    {
        Assert.Equal("'Xy' is not an element symbol", FormulaParser.Parse("Xy2O").Failure!.Message);
    }

    [Fact]
    public void Parse_CountsHydrateWaterExactly()
    {
        // CaSO4·0.5H2O: half a water per formula unit, so half a hydrogen... times two
        Formula formula = FormulaParser.Parse("CaSO4·0.5H2O").Value;

        Assert.Equal(new Fraction(9, 2), formula.CountOf("O"));
        Assert.Equal(Fraction.One, formula.CountOf("H"));
    }

    private static IEnumerable<string> Composition(string expected) =>
        expected.Split(' ').OrderBy(part => part[..part.IndexOf(':', StringComparison.Ordinal)], StringComparer.Ordinal);

    [Theory]
    [InlineData(FormulaParser.MaxNesting)]
    [InlineData(2)]
    public void Parse_ReadsBracketsNestedUpToTheLimit(int depth)
    {
        // Given H nested in the given number of bracket levels
        string text = new string('(', depth) + "H" + new string(')', depth) + "2";

        // When it is read, then it is 2 H
        Formula formula = FormulaParser.Parse(text).Value;
        Assert.Equal(2, (int)formula.CountOf("H").Numerator);
    }

    [Theory]
    [InlineData(FormulaParser.MaxNesting + 1)]
    [InlineData(6000)]
    [InlineData(100_000)]
    public void Parse_RefusesNestingBeyondTheLimitAtTheFirstBracketTooDeep(int depth)
    {
        // Given brackets nested deeper than the limit (6,000 levels once overflowed the stack)
        string text = new string('[', depth) + "H" + new string(']', depth);

        // When it is read
        ParseResult<Formula> result = FormulaParser.Parse(text);

        // Then it is refused at the first bracket beyond the limit, without a crash
        Assert.False(result.Success);
        Assert.Equal(("bad-formula", FormulaParser.MaxNesting), (result.Failure.Code, result.Failure.Offset));
        Assert.Contains("32 levels", result.Failure.Message, StringComparison.Ordinal);
    }
}
