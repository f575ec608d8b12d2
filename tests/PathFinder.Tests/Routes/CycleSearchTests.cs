using PathFinder.Algebra;
using PathFinder.Routes;

namespace PathFinder.Tests.Routes;

public class CycleSearchTests
{
    [Fact]
    public void Cycles_MatchBruteForceCircuits_OnSeededRandomNetworks()
    {
        for (int seed = 0; seed < 600; seed++)
        {
            // Given a small random network
            (RouteNetwork network, _) = RandomNetworks.Create(seed);
            var expected = RandomNetworks.BruteForceCycles(network);

            // When all cycles are searched
            CycleSearchResult result = FindCycles.In(network, new CycleSearchOptions { MaxSize = 11, MaxCycles = int.MaxValue });

            // Then the member sets and normalised integer factors equal the oracle's, and the count is m − rank
            Assert.True(result.Complete);
            Assert.Equal(
                expected.Select(e => RandomNetworks.Key(e.Members, e.Factors)).Order(StringComparer.Ordinal),
                result.Cycles.Select(c => RandomNetworks.Key(c.Measurements, c.Factors)).Order(StringComparer.Ordinal));
            Assert.Equal(expected.Count, result.CyclesFound);
            var echelon = new ExactEchelon();
            int rank = network.Vectors.Count(v => echelon.Add(v));
            Assert.Equal(network.Count - rank, result.IndependentCycleCount);
            foreach (Cycle c in result.Cycles)
            {
                double residual = c.Measurements.Select((m, k) => c.Factors[k].ToDouble() * network.Values[m]).Sum();
                Assert.Equal(residual, c.Residual, 9);
            }
        }
    }

    [Fact]
    public void CompleteFlag_AgreesWithLongerCircuits_UnderASizeBound()
    {
        int cut = 0;
        for (int seed = 0; seed < 600; seed++)
        {
            (RouteNetwork network, _) = RandomNetworks.Create(seed);
            var all = RandomNetworks.BruteForceCycles(network);
            int maxSize = 2 + (seed % 3);
            CycleSearchResult result = FindCycles.In(network, new CycleSearchOptions { MaxSize = maxSize, MaxCycles = int.MaxValue });
            Assert.Equal(all.Count(c => c.Members.Length <= maxSize), result.CyclesFound);
            bool longer = all.Any(c => c.Members.Length > maxSize);
            if (longer)
            {
                Assert.False(result.Complete);
                cut++;
            }

            if (result.Complete)
            {
                Assert.False(longer);
            }
        }

        Assert.True(cut > 10);
    }
}
