using PathFinder.Analysis;

namespace PathFinder.Tests.Analysis;

public sealed class SlipKindsTests
{
    [Theory]
    [InlineData(SlipKind.Sign, "sign", "sign slip")]
    [InlineData(SlipKind.Calorie, "calorie", "calorie slip")]
    [InlineData(SlipKind.Factor, "factor", "factor slip")]
    [InlineData(SlipKind.Phase, "phase", "phase slip")]
    [InlineData(SlipKind.PerParticle, "per-particle", "per-particle unit slip")]
    public void CodeAndDescribe_GiveTheDataCodeAndTheName(SlipKind kind, string code, string name)
    {
        Assert.Equal(code, kind.Code());
        Assert.Equal(name, kind.Describe());
    }

    [Fact]
    public void Code_IsDistinct_When_TakenOverAllKinds()
    {
        // Given every kind
        SlipKind[] kinds = Enum.GetValues<SlipKind>();

        // When coded
        var codes = kinds.Select(kind => kind.Code()).ToHashSet(StringComparer.Ordinal);

        // Then no two share a code
        Assert.Equal(kinds.Length, codes.Count);
    }
}
