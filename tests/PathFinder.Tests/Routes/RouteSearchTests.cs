using Fractions;
using PathFinder.Algebra;
using PathFinder.Routes;

namespace PathFinder.Tests.Routes;

public class RouteSearchTests
{
    private const int Networks = 600;

    [Fact]
    public void Routes_MatchBruteForceSubsetEnumeration_OnSeededRandomNetworks()
    {
        long total = 0, multiStep = 0;
        for (int seed = 0; seed < Networks; seed++)
        {
            // Given a small random network with duplicates and parallel measurements
            (RouteNetwork network, SparseVector target) = RandomNetworks.Create(seed);
            var expected = RandomNetworks.BruteForceRoutes(network, target);

            // When every route is searched without an effective bound
            RouteSearchResult result = FindRoutes.To(network, target, new RouteSearchOptions { MaxSteps = 10, MaxRoutes = int.MaxValue });

            // Then the routes, factors and values equal the oracle's and the search is complete
            Assert.True(result.Complete, $"seed {seed}");
            Assert.Equal(expected.Count, result.RoutesFound);
            total += expected.Count;
            multiStep += expected.Count(e => e.Members.Length >= 3);
            Assert.Equal(
                expected.Select(e => RandomNetworks.Key(e.Members, e.Factors)).Order(StringComparer.Ordinal),
                result.Routes.Select(r => RandomNetworks.Key(r.Measurements, r.Factors)).Order(StringComparer.Ordinal));
            foreach (Route r in result.Routes)
            {
                double value = r.Measurements.Select((m, k) => r.Factors[k].ToDouble() * network.Values[m]).Sum();
                Assert.Equal(value, r.Value, 9);
            }
        }

        // The corpus is not vacuous: many routes, including routes of three or more steps.
        Assert.True(total > 500 && multiStep > 50, $"{total} routes, {multiStep} with ≥ 3 steps");
    }

    [Fact]
    public void CompleteFlag_IsFalseWhenALongerRouteExists_AndTrueOnlyWhenNoneDoes()
    {
        int cutSeen = 0, completeSeen = 0;
        for (int seed = 0; seed < Networks; seed++)
        {
            // Given a random network and a random step bound
            (RouteNetwork network, SparseVector target) = RandomNetworks.Create(seed);
            var all = RandomNetworks.BruteForceRoutes(network, target);
            int maxSteps = 1 + (seed % 3);

            // When searched with that bound
            RouteSearchResult result = FindRoutes.To(network, target, new RouteSearchOptions { MaxSteps = maxSteps, MaxRoutes = int.MaxValue });

            // Then the routes are exactly the oracle's short ones, and the flag agrees with the longer ones
            Assert.Equal(all.Count(e => e.Members.Length <= maxSteps), result.RoutesFound);
            bool longerExists = all.Any(e => e.Members.Length > maxSteps);
            if (longerExists)
            {
                Assert.False(result.Complete, $"seed {seed}");
                cutSeen++;
            }

            if (result.Complete)
            {
                Assert.False(longerExists);
                completeSeen++;
            }
            else
            {
                Assert.Equal(SearchCut.StepBound, result.Cut);
            }
        }

        Assert.True(cutSeen > 10 && completeSeen > 10);
    }

    [Fact]
    public void Routes_AreSortedByUncertaintyThenSteps_AndTopKIsAPrefixOfTheFullList()
    {
        for (int seed = 0; seed < 200; seed++)
        {
            // Given a network
            (RouteNetwork network, SparseVector target) = RandomNetworks.Create(seed);

            // When all routes and then only the best three are requested
            var all = FindRoutes.To(network, target, new RouteSearchOptions { MaxSteps = 10, MaxRoutes = int.MaxValue }).Routes;
            var top = FindRoutes.To(network, target, new RouteSearchOptions { MaxSteps = 10, MaxRoutes = 3 }).Routes;

            // Then the order holds and the best three have the uncertainties of the first three of the full list
            for (int k = 1; k < all.Count; k++)
            {
                Assert.True(all[k - 1].Uncertainty <= all[k].Uncertainty);
            }

            Assert.Equal(all.Take(3).Select(r => r.Uncertainty), top.Select(r => r.Uncertainty));
        }
    }

    [Fact]
    public void IndependentRouteCount_EqualsExactRankOfFactorVectors_AndMarkedSubsetIsABasis()
    {
        for (int seed = 0; seed < 200; seed++)
        {
            (RouteNetwork network, SparseVector target) = RandomNetworks.Create(seed);
            RouteSearchResult result = FindRoutes.To(network, target, new RouteSearchOptions { MaxSteps = 10, MaxRoutes = int.MaxValue });
            SparseVector[] vectors = [.. result.Routes.Select(r => SparseVector.Create([.. r.Measurements.Select((m, k) => (m, r.Factors[k]))]))];
            var echelon = new ExactEchelon();
            foreach (SparseVector v in vectors)
            {
                echelon.Add(v);
            }

            Assert.Equal(echelon.Rank, result.IndependentRouteCount);
            Assert.Equal(result.IndependentRouteCount, result.Routes.Count(r => r.IsIndependent));
        }
    }

    [Fact]
    public void UnreachableSpecies_AreListed_WhenNoMeasurementHoldsThem()
    {
        // Given measurements over species 0 and 1 and a target on species 7
        var network = RouteNetwork.Create([SparseVector.Create((0, 1), (1, -1))], [1.0], [0.1]);

        // When searching
        RouteSearchResult result = FindRoutes.To(network, SparseVector.Create((0, 1), (7, 1)));

        // Then species 7 is reported and no route exists
        Assert.Equal([7], result.UnreachableSpecies);
        Assert.Empty(result.Routes);
    }

    [Fact]
    public void TwoStepRoute_HasExactFactorsValueAndUncertainty()
    {
        // Given A→B (v=10, u=1), B→C measured twice (v=5 u=2 and, doubled, v=9.8 u=1), target A→C
        var ab = SparseVector.Create((0, -1), (1, 1));
        var bc = SparseVector.Create((1, -1), (2, 1));
        var network = RouteNetwork.Create([ab, bc, bc.Scale(new Fraction(2))], [10, 5, 9.8], [1, 2, 1]);

        // When searching for A→C
        RouteSearchResult result = FindRoutes.To(network, SparseVector.Create((0, -1), (2, 1)));

        // Then the best route uses the halved doubled measurement: u = √(1 + 0.25)
        Route best = result.Routes[0];
        Assert.Equal([0, 2], best.Measurements);
        Assert.Equal([Fraction.One, new Fraction(1, 2)], best.Factors);
        Assert.Equal(14.9, best.Value, 12);
        Assert.Equal(Math.Sqrt(1.25), best.Uncertainty, 12);
        Assert.Equal(2, result.RoutesFound);
        Assert.Equal(2, result.IndependentRouteCount);
    }

    [Fact]
    public void StopAfter_StopsEarly_AndReportsIt()
    {
        var ab = SparseVector.Create((0, -1), (1, 1));
        var network = RouteNetwork.Create([ab, ab, ab], [1, 1, 1], [1, 1, 1]);
        RouteSearchResult result = FindRoutes.To(network, ab, new RouteSearchOptions { StopAfter = 1 });
        Assert.Equal(SearchCut.StoppedEarly, result.Cut);
        Assert.False(result.Complete);
    }

    [Fact]
    public void Memory_DoesNotGrowWithTheStepBound_BeyondWhatTheSearchReaches()
    {
        // Given a chain A0 → A1 → … → A12 (the route to A0 → A12 has 12 steps) plus a few shortcuts
        var vectors = Enumerable.Range(0, 12).Select(i => SparseVector.Create((i, -1), (i + 1, 1))).ToList();
        vectors.Add(SparseVector.Create((0, -1), (6, 1)));
        vectors.Add(SparseVector.Create((6, -1), (12, 1)));
        var network = RouteNetwork.Create(vectors, [.. vectors.Select(_ => 1.0)], [.. vectors.Select(_ => 0.5)]);
        SparseVector target = SparseVector.Create((0, -1), (12, 1));
        var small = new RouteSearchOptions { MaxSteps = 20, MaxRoutes = int.MaxValue };
        FindRoutes.To(network, target, small); // JIT and first-use allocations are not charged below

        // When searched with a bound of 20 and with a bound of 20,000 (which once allocated gigabytes)
        long before = GC.GetAllocatedBytesForCurrentThread();
        RouteSearchResult bounded = FindRoutes.To(network, target, small);
        long boundedBytes = GC.GetAllocatedBytesForCurrentThread() - before;
        before = GC.GetAllocatedBytesForCurrentThread();
        RouteSearchResult huge = FindRoutes.To(network, target, small with { MaxSteps = 20_000 });
        long hugeBytes = GC.GetAllocatedBytesForCurrentThread() - before;

        // Then both find the same four routes, completely, and allocate about the same (well under a megabyte more)
        Assert.True(bounded.Complete && huge.Complete);
        Assert.Equal(4, bounded.RoutesFound);
        Assert.Equal(bounded.RoutesFound, huge.RoutesFound);
        Assert.True(hugeBytes < boundedBytes + 1_000_000, $"{hugeBytes:N0} bytes with 20,000 steps, {boundedBytes:N0} with 20");
    }
}
