using PathFinder.Chemistry;
using PathFinder.Diagnostics;

namespace PathFinder.Tests.Chemistry;

public sealed class SpeciesParserTests
{
    [Theory]
    [InlineData("CH4(g)", "CH4", Phase.Gas, "")]
    [InlineData("H2O(l)", "H2O", Phase.Liquid, "")]
    [InlineData("NaCl(cr)", "NaCl", Phase.Crystal, "")]
    [InlineData("NaCl(s)", "NaCl", Phase.Crystal, "")]
    [InlineData("Na+(aq)", "Na+", Phase.Aqueous, "")]
    [InlineData("SiO2(am)", "SiO2", Phase.Amorphous, "")]
    [InlineData("C(cr,graphite)", "C", Phase.Crystal, "graphite")]
    [InlineData("C(graphite)", "C", Phase.Crystal, "graphite")]
    [InlineData("S(cr, rhombic)", "S", Phase.Crystal, "rhombic")]
    [InlineData("Ca(OH)2(cr)", "Ca(OH)2", Phase.Crystal, "")]
    [InlineData("K4[Fe(CN)6](cr)", "K4[Fe(CN)6]", Phase.Crystal, "")]
    [InlineData("SO4^2-(aq)", "SO4^2-", Phase.Aqueous, "")]
    [InlineData("CuSO4·5H2O(cr)", "CuSO4·5H2O", Phase.Crystal, "")]
    public void Parse_SplitsFormulaAndState(string text, string formula, Phase phase, string modification)
    {
        // Given a species written as formula(state)
        Species species = SpeciesParser.Parse(text).Value;

        // Then the last parenthesised group starting with a small letter is the state, the rest the formula
        Assert.Equal(formula, species.Formula.Text);
        Assert.Equal(new PhysicalState(phase, modification), species.State);
    }

    [Theory]
    [InlineData("NaCl(s)", "NaCl(cr)")]
    [InlineData("C(graphite)", "C(cr,graphite)")]
    [InlineData("C(cr,Graphite)", "C(cr,graphite)")]
    [InlineData("CH3CH2OH(l)", "C2H5OH(l)")]
    [InlineData("H2O(liquid)", "H2O(l)")]
    public void Parse_GivesTheSameSpeciesForEquivalentSpellings(string left, string right)
    {
        Species a = SpeciesParser.Parse(left).Value;
        Species b = SpeciesParser.Parse(right).Value;

        Assert.Equal(a.Key, b.Key);
        Assert.Equal(a, b);
    }

    [Fact]
    public void Parse_KeepsGasAndLiquidWaterApart()
    {
        Assert.NotEqual(SpeciesParser.Parse("H2O(g)").Value, SpeciesParser.Parse("H2O(l)").Value);
    }

    [Theory]
    [InlineData("e-")]
    [InlineData("e^-")]
    [InlineData("e-(g)")]
    public void Parse_ReadsTheElectronWithoutAState(string text)
    {
        Species electron = SpeciesParser.Parse(text).Value;

        Assert.True(electron.Formula.IsElectron);
        Assert.Equal(ReferenceStates.Electron, electron);
    }

    [Theory]
    [InlineData("CH4", 3, "missing-state")]
    [InlineData("Ca(OH)2", 7, "missing-state")]
    [InlineData("Ca(OH)", 6, "missing-state")]
    [InlineData("CH4(x)", 4, "bad-state")]
    [InlineData("CH4(aq,graphite)", 4, "bad-state")]
    [InlineData("C(cr,)", 2, "bad-state")]
    [InlineData("Xy2O(g)", 0, "unknown-element")]
    [InlineData("Fe3+(aq)", 2, "ambiguous-charge")]
    [InlineData("", 0, "bad-formula")]
    [InlineData("Ca(OH2(cr)", 2, "bad-formula")]
    public void Parse_ReportsTheProblemAtTheExactOffset(string text, int offset, string code)
    {
        ParseResult<Species> result = SpeciesParser.Parse(text);

        Assert.False(result.Success);
        Assert.Equal(code, result.Failure.Code);
        Assert.Equal(offset, result.Failure.Offset);
    }

    [Fact]
    public void Parse_HintsAtTheStatesForAMissingState()
    {
        ParseFailure failure = SpeciesParser.Parse("CH4").Failure!;

        Assert.Equal("'CH4' has no state", failure.Message);
        Assert.Contains("CH4(g)", failure.Hint, StringComparison.Ordinal);
    }
}
