using PathFinder.Analysis;
using PathFinder.Chemistry;
using PathFinder.Diagnostics;

namespace PathFinder.Tests.Analysis;

public sealed class TargetReactionTests
{
    private static ReactionNetwork Network() => new("t", []);

    [Fact]
    public void Parse_ElementInItsReferenceState_GivesATargetHintNotARowHint()
    {
        // When the target is an element in its reference state, whose formation reaction is empty
        ParseFailure failure = TargetReaction.Parse("O2(g)", Network()).Failure!;

        // Then the hint speaks of the target, not of a data row to drop
        Assert.Equal("reference-formation", failure.Code);
        Assert.DoesNotContain("drop this row", failure.Hint, StringComparison.Ordinal);
        Assert.Contains("target", failure.Hint, StringComparison.Ordinal);
    }

    [Fact]
    public void Parse_ReadsVulgarFractionsAndTheEquilibriumArrow()
    {
        ChemicalEquation equation = TargetReaction.Parse("NO(g) + ½ O2(g) ⇌ NO2(g)", Network()).Value;

        Assert.Empty(equation.FindImbalances());
        Assert.Equal(3, equation.Terms.Count);
    }
}
