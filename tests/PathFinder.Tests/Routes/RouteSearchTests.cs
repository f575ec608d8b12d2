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

    [Theory]
    [InlineData(0.3)]
    [InlineData(1.0)]
    [InlineData(3.0)]
    public void MoreSteps_NeverFindFewerRoutes_WithinTheSameWorkBudget(double budgetOverFourStepSearch)
    {
        // Given a complete-ish network of 16 species (about 2,000 routes of at most 4 steps, far more of 5 and 6), and a
        // work budget that is a fraction or a multiple of what the complete 4-step search takes
        (RouteNetwork network, SparseVector target) = RandomNetworks.CompleteIsh(16, seed: 13);
        var four = new RouteSearchOptions { MaxSteps = 4, MaxRoutes = int.MaxValue };
        long stepsOfFour = FindRoutes.To(network, target, four).SearchSteps;
        four = four with { WorkBudget = (long)(budgetOverFourStepSearch * stepsOfFour) };

        // When searched up to 4 and up to 6 steps with that budget
        RouteSearchResult shallow = FindRoutes.To(network, target, four);
        RouteSearchResult deep = FindRoutes.To(network, target, four with { MaxSteps = 6 });

        // Then every route of the 4-step search is among the 6-step search's, which was cut by the budget
        var deepKeys = deep.Routes.Select(r => RandomNetworks.Key(r.Measurements, r.Factors)).ToHashSet(StringComparer.Ordinal);
        Assert.All(shallow.Routes, r => Assert.Contains(RandomNetworks.Key(r.Measurements, r.Factors), deepKeys));
        Assert.True(shallow.RoutesFound > 100, $"{shallow.RoutesFound} routes");
        Assert.True(deep.RoutesFound >= shallow.RoutesFound);
        Assert.Equal(SearchCut.WorkBudget, deep.Cut);
        Assert.True(deep.CompleteUpToSteps >= shallow.CompleteUpToSteps);

        // and each says what cut it: the budget before all 4-step routes were found, else the 4-step bound
        if (budgetOverFourStepSearch < 1)
        {
            Assert.Equal(SearchCut.WorkBudget, shallow.Cut);
            Assert.True(shallow.CompleteUpToSteps < 4);
            Assert.Equal(shallow.RoutesFound, deep.RoutesFound);
        }
        else
        {
            Assert.Equal(SearchCut.StepBound, shallow.Cut);
            Assert.Equal(4, shallow.CompleteUpToSteps);
            Assert.Equal(4, deep.CompleteUpToSteps);
        }

        if (budgetOverFourStepSearch > 1)
        {
            Assert.True(deep.RoutesFound > shallow.RoutesFound);
            Assert.Contains(deep.Routes, r => r.Steps == 5);
        }
    }

    [Fact]
    public void WorkBudget_CutsAtTheSamePointOnEveryRun_AndEveryShorterRouteIsFound()
    {
        // Given a complete-ish network and every route of at most 3 steps (a complete search)
        (RouteNetwork network, SparseVector target) = RandomNetworks.CompleteIsh(12, seed: 5);
        RouteSearchResult three = FindRoutes.To(network, target, new RouteSearchOptions { MaxSteps = 3, MaxRoutes = int.MaxValue });

        // When a 6-step search runs twice with a budget that ends during the longer routes
        var options = new RouteSearchOptions { MaxSteps = 6, MaxRoutes = int.MaxValue, WorkBudget = three.SearchSteps + 2_000 };
        RouteSearchResult first = FindRoutes.To(network, target, options);
        RouteSearchResult second = FindRoutes.To(network, target, options);

        // Then both runs agree route for route, the cut is the work budget, and the 3-step routes are all there
        Assert.Equal(SearchCut.StepBound, three.Cut);
        Assert.Equal(SearchCut.WorkBudget, first.Cut);
        Assert.False(first.Complete);
        Assert.Equal(first.RoutesFound, second.RoutesFound);
        Assert.Equal(first.Routes.Select(r => RandomNetworks.Key(r.Measurements, r.Factors)), second.Routes.Select(r => RandomNetworks.Key(r.Measurements, r.Factors)));
        Assert.Equal(options.WorkBudget + 1, first.SearchSteps);
        Assert.True(first.CompleteUpToSteps >= 3);
        var keys = first.Routes.Select(r => RandomNetworks.Key(r.Measurements, r.Factors)).ToHashSet(StringComparer.Ordinal);
        Assert.All(three.Routes, r => Assert.Contains(RandomNetworks.Key(r.Measurements, r.Factors), keys));
    }

    [Fact]
    public void FirstRouteFound_IsAShortestRoute()
    {
        for (int seed = 0; seed < Networks; seed++)
        {
            // Given a random network whose shortest route has n steps
            (RouteNetwork network, SparseVector target) = RandomNetworks.Create(seed);
            var all = RandomNetworks.BruteForceRoutes(network, target);
            if (all.Count == 0)
            {
                continue;
            }

            // When the search stops after its first route
            RouteSearchResult result = FindRoutes.To(network, target, new RouteSearchOptions { MaxSteps = 10, StopAfter = 1 });

            // Then that route has n steps and every shorter size is reported complete
            int shortest = all.Min(e => e.Members.Length);
            Assert.Equal(shortest, result.Routes[0].Steps);
            Assert.True(result.CompleteUpToSteps >= shortest - 1, $"seed {seed}");
        }
    }

    [Fact]
    public void ChainRoute_OfTwoHundredSteps_IsFound_WithABoundOfAThousand()
    {
        // Given a chain A0 → A1 → … → A200
        var vectors = Enumerable.Range(0, 200).Select(i => SparseVector.Create((i, -1), (i + 1, 1))).ToList();
        var network = RouteNetwork.Create(vectors, [.. vectors.Select(_ => 1.0)], [.. vectors.Select(_ => 0.1)]);

        // When A0 → A200 is searched with a bound of 1,000 (the CLI's largest)
        RouteSearchResult result = FindRoutes.To(network, SparseVector.Create((0, -1), (200, 1)), new RouteSearchOptions { MaxSteps = 1000 });

        // Then its one route is found with every factor 1, and the search is complete: it never went past 200 steps
        Route route = Assert.Single(result.Routes);
        Assert.Equal(200, route.Steps);
        Assert.All(route.Factors, f => Assert.Equal(Fraction.One, f));
        Assert.Equal(200.0, route.Value, 9);
        Assert.True(result.Complete);
        Assert.Equal(1000, result.CompleteUpToSteps);
    }
}
