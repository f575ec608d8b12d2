using PathFinder.Chemistry;

namespace PathFinder.Tests.Chemistry;

public sealed class SpeciesTests
{
    [Theory]
    [InlineData("CH3OH(l)", "CH4O(l)")]
    [InlineData("C(graphite)", "C(cr,graphite)")]
    [InlineData("SO4^2-(aq)", "O4S^2-(aq)")]
    [InlineData("NaCl(s)", "ClNa(cr)")]
    public void Key_IsCanonicalCompositionAndState(string text, string key)
    {
        Assert.Equal(key, Species.Parse(text).Key);
    }

    [Fact]
    public void Name_IsTheSpeciesAsWritten()
    {
        Species species = Species.Parse("CH3CH2OH(l)");

        Assert.Equal("CH3CH2OH(l)", species.Name);
        Assert.Equal("CH3CH2OH(l)", species.ToString());
    }

    [Theory]
    [InlineData("NH3(gas)", "NH3(g)")]
    [InlineData("H2O(liquid)", "H2O(l)")]
    [InlineData("NaCl(s)", "NaCl(cr)")]
    [InlineData("C(graphite)", "C(cr,graphite)")]
    [InlineData("S(cr, Rhombic)", "S(cr,rhombic)")]
    public void Name_KeepsTheFormulaAsWrittenAndShowsTheCanonicalState(string text, string name)
    {
        Assert.Equal(name, Species.Parse(text).Name);
    }

    [Fact]
    public void Label_TellsIsomersApart()
    {
        // Given ethanol and dimethyl ether, both C2H6O(g)
        Formula formula = Formula.Parse("C2H6O");
        Species ethanol = Species.Create(formula, PhysicalState.Gas, "EtOH");
        Species ether = Species.Create(formula, PhysicalState.Gas, "DME", "dimethyl ether(g)");

        // Then the labels make them different species with labelled keys
        Assert.NotEqual(ethanol, ether);
        Assert.Equal("C2H6O(g)[DME]", ether.Key);
        Assert.Equal("dimethyl ether(g)", ether.Name);
        Assert.NotEqual(Species.Create(formula, PhysicalState.Gas), ethanol);
    }

    [Fact]
    public void WithName_KeepsTheIdentity()
    {
        Species species = Species.Parse("H2O(l)");
        Species renamed = species.WithName("water");

        Assert.Equal(species, renamed);
        Assert.Equal("water", renamed.Name);
    }

    [Fact]
    public void IsGas_IsTrueOnlyForTheGasPhase()
    {
        Assert.True(Species.Parse("CO2(g)").IsGas);
        Assert.False(Species.Parse("H2O(l)").IsGas);
        Assert.False(Species.Parse("Na+(aq)").IsGas);
    }

    [Fact]
    public void Parse_ThrowsFormatExceptionOnBadInput()
    {
        Assert.Throws<FormatException>(() => Species.Parse("CH4"));
    }
}
