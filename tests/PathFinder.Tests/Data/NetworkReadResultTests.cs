using PathFinder.Data;
using PathFinder.Diagnostics;

namespace PathFinder.Tests.Data;

public class NetworkReadResultTests
{
    [Fact]
    public void NetworkWarnings_AreFoundOnce_OnlyWhenAskedFor_AndMergedInFileOrder()
    {
        // Given a result with one row error (line 7) and network warnings found later (lines 9 and 3)
        int calls = 0;
        var result = new NetworkReadResult(
            new ReactionNetwork("demo", []),
            [Diagnostic.Error("bad-number", new SourceLocation("a.csv", 7, 2), "not a number")],
            () =>
            {
                calls++;
                return [Diagnostic.Warning("single-use-species", new SourceLocation("a.csv", 9, 1), "used once"), Diagnostic.Warning("repeated-measurement", new SourceLocation("a.csv", 3, 1), "repeated")];
            },
            ["a.csv"],
            null,
            null,
            new Dictionary<PathFinder.Chemistry.Species, PathFinder.Thermodynamics.IHeatCapacity>());

        // When only the errors are asked for, the warnings are not worked out
        Assert.True(result.HasErrors);
        Assert.Single(result.Errors);
        Assert.Equal(0, calls);

        // Then all diagnostics come in line order, and asking again does not search again
        Assert.Equal([3, 7, 9], result.Diagnostics.Select(d => d.Location.Line));
        Assert.Equal(2, result.Warnings.Count());
        Assert.Equal(1, calls);
    }
}
