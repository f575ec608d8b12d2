using PathFinder.Algebra;
using PathFinder.Analysis;
using PathFinder.Routes;
using PathFinder.Synthetic;

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

    [Fact]
    public void WorkBudget_CutsAtTheSamePointOnEveryRun_AndMoreWorkFindsMore()
    {
        // Given a network with far more minimal cycles than a small budget reaches
        SyntheticNetwork synthetic = SyntheticNetworkGenerator.Generate(new SyntheticNetworkOptions { Seed = 3, SpeciesCount = 150, MeasurementCount = 1500 });
        RouteNetwork network = PropertyModel.Build(synthetic.Network, PropertyFamily.Enthalpy).ToRouteNetwork();

        // When searched twice with the same work budget, and once with a larger one
        var options = new CycleSearchOptions { WorkBudget = 3_000 };
        CycleSearchResult first = FindCycles.In(network, options);
        CycleSearchResult second = FindCycles.In(network, options);
        CycleSearchResult larger = FindCycles.In(network, options with { WorkBudget = 12_000 });

        // Then the cut is the work budget, both runs keep exactly the same cycles, and the larger budget finds more
        Assert.True(first.Cut.HasFlag(SearchCut.WorkBudget));
        Assert.False(first.Complete);
        Assert.Equal(3_001, first.SearchSteps);
        Assert.Equal(first.CyclesFound, second.CyclesFound);
        Assert.Equal(
            first.Cycles.Select(c => RandomNetworks.Key(c.Measurements, c.Factors)),
            second.Cycles.Select(c => RandomNetworks.Key(c.Measurements, c.Factors)));
        Assert.True(larger.CyclesFound > first.CyclesFound, $"{larger.CyclesFound} vs {first.CyclesFound}");
    }

    [Fact]
    public void WorkBudget_AboveTheWholeSearch_ChangesNothing()
    {
        for (int seed = 0; seed < 100; seed++)
        {
            (RouteNetwork network, _) = RandomNetworks.Create(seed);
            CycleSearchResult unbounded = FindCycles.In(network, new CycleSearchOptions { MaxSize = 11, MaxCycles = int.MaxValue });
            CycleSearchResult budgeted = FindCycles.In(network, new CycleSearchOptions { MaxSize = 11, MaxCycles = int.MaxValue, WorkBudget = unbounded.SearchSteps });
            Assert.Equal(unbounded.Cut, budgeted.Cut);
            Assert.Equal(unbounded.CyclesFound, budgeted.CyclesFound);
        }
    }

    [Fact]
    public void WorkBudget_Negative_IsRefused()
    {
        (RouteNetwork network, _) = RandomNetworks.Create(1);
        Assert.Throws<ArgumentOutOfRangeException>(() => new CycleSearch(network, new CycleSearchOptions { WorkBudget = -1 }));
    }

    [Fact]
    public void Memory_DoesNotGrowWithTheSizeBound()
    {
        // Given a small random network
        (RouteNetwork network, _) = RandomNetworks.Create(7);
        var small = new CycleSearchOptions { MaxSize = 20 };
        new CycleSearch(network, small).Run();

        // When the cycles are searched with a size bound of 20 and of 20,000
        long before = GC.GetAllocatedBytesForCurrentThread();
        CycleSearchResult bounded = new CycleSearch(network, small).Run();
        long boundedBytes = GC.GetAllocatedBytesForCurrentThread() - before;
        before = GC.GetAllocatedBytesForCurrentThread();
        CycleSearchResult huge = new CycleSearch(network, small with { MaxSize = 20_000 }).Run();
        long hugeBytes = GC.GetAllocatedBytesForCurrentThread() - before;

        // Then the results agree and the allocation does not depend on the bound
        Assert.True(bounded.CyclesFound > 0);
        Assert.Equal(bounded.CyclesFound, huge.CyclesFound);
        Assert.True(hugeBytes < boundedBytes + 1_000_000, $"{hugeBytes:N0} bytes with 20,000, {boundedBytes:N0} with 20");
    }

    [Fact]
    public void CycleOfAThousandMeasurements_IsFound_ThroughAWalkAThousandDeep()
    {
        // Given a chain A0 → … → A999 closed by A0 → A999: one cycle of 1,000 measurements, which the recursive walk
        // (shared with route search) reaches 999 levels deep; the routes CLI accepts bounds up to 1,000 for this reason
        var vectors = Enumerable.Range(0, 999).Select(i => SparseVector.Create((i, -1), (i + 1, 1))).ToList();
        vectors.Add(SparseVector.Create((0, -1), (999, 1)));
        var network = RouteNetwork.Create(vectors, [.. vectors.Select(_ => 1.0)], [.. vectors.Select(_ => 0.1)]);

        // When the cycles are searched with a size bound of 1,000 on a test thread (a smaller stack than the main thread's)
        CycleSearchResult result = new CycleSearch(network, new CycleSearchOptions { MaxSize = 1000 }).Run();

        // Then the one cycle is found, completely
        Cycle cycle = Assert.Single(result.Cycles);
        Assert.Equal(1000, cycle.Size);
        Assert.True(result.Complete);
    }
}
