using PathFinder.Chemistry;

namespace PathFinder.Tests.Chemistry;

public sealed class PhysicalStateTests
{
    [Theory]
    [InlineData("g", Phase.Gas, "")]
    [InlineData("gas", Phase.Gas, "")]
    [InlineData("l", Phase.Liquid, "")]
    [InlineData("liq", Phase.Liquid, "")]
    [InlineData("cr", Phase.Crystal, "")]
    [InlineData("s", Phase.Crystal, "")]
    [InlineData("c", Phase.Crystal, "")]
    [InlineData("am", Phase.Amorphous, "")]
    [InlineData("aq", Phase.Aqueous, "")]
    [InlineData("cr,graphite", Phase.Crystal, "graphite")]
    [InlineData("graphite", Phase.Crystal, "graphite")]
    [InlineData("s,diamond", Phase.Crystal, "diamond")]
    [InlineData("CR, Rhombic", Phase.Crystal, "rhombic")]
    [InlineData("am,glass", Phase.Amorphous, "glass")]
    public void Parse_ReadsPhaseAndModification(string text, Phase phase, string modification)
    {
        ParseStateResult result = PhysicalState.Parse(text);

        Assert.Null(result.Error);
        Assert.Equal(new PhysicalState(phase, modification), result.State);
    }

    [Theory]
    [InlineData("x", "unknown state '(x)'")]
    [InlineData("aq,graphite", "state '(aq,graphite)': only solids take a modification name")]
    [InlineData("g,", "state '(g,)' has an empty or extra part")]
    [InlineData("cr,a,b", "state '(cr,a,b)' has an empty or extra part")]
    [InlineData("", "state '()' has an empty or extra part")]
    [InlineData("glass", "unknown state '(glass)'")]
    public void Parse_RefusesUnknownStatesWithAMessage(string text, string message)
    {
        Assert.Equal(message, PhysicalState.Parse(text).Error);
    }

    [Theory]
    [InlineData("s", "cr")]
    [InlineData("graphite", "cr,graphite")]
    [InlineData("gas", "g")]
    [InlineData("aq", "aq")]
    public void ToString_WritesTheCanonicalCode(string text, string expected)
    {
        Assert.Equal(expected, PhysicalState.Parse(text).State.ToString());
    }

    [Fact]
    public void CrystalModification_EqualsTheParsedShortForm()
    {
        Assert.Equal(PhysicalState.CrystalModification("graphite"), PhysicalState.Parse("graphite").State);
        Assert.NotEqual(PhysicalState.Crystal, PhysicalState.CrystalModification("graphite"));
    }
}
