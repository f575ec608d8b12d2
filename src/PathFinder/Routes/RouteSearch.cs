using Fractions;
using PathFinder.Algebra;

namespace PathFinder.Routes;

/// <summary>Finds the minimal Hess's-law routes from measurements to a target reaction, best (lowest uncertainty) first.</summary>
/// <remarks>
/// <para>A route is a set S of measurements with nonzero exact factors cᵢ such that Σ cᵢ·rᵢ = t and no proper subset
/// can make t (S ∪ {t} is a circuit of the vector matroid). Its value is Σ cᵢ·vᵢ and its uncertainty √(Σ cᵢ²uᵢ²).</para>
/// <para>The search runs over classes of parallel measurements (<see cref="RouteNetwork"/>); a class-level route
/// expands into one route per choice of member in each class, and the cheapest members give its smallest uncertainty.
/// Only the <see cref="RouteSearchOptions.MaxRoutes"/> class routes with the smallest such best uncertainty are kept,
/// which provably contain the best routes over measurements; those are expanded best first. The order is exact once
/// the search is complete; with a cut, it is the order among the routes found.</para>
/// <para>Routes are searched by increasing size (iterative deepening): every route of n steps is found before any of
/// n + 1, so a budget that cuts the search leaves every route up to <see cref="RouteSearchResult.CompleteUpToSteps"/>
/// steps found, and raising <see cref="RouteSearchOptions.MaxSteps"/> never finds fewer routes within the same work
/// budget.</para>
/// </remarks>
public sealed class RouteSearch
{
    private readonly RouteNetwork _network;
    private readonly RouteSearchOptions _options;

    /// <summary>Prepares a search over <paramref name="network"/> with <paramref name="options"/>.</summary>
    public RouteSearch(RouteNetwork network, RouteSearchOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(network);
        _network = network;
        _options = options ?? new RouteSearchOptions();
        ArgumentOutOfRangeException.ThrowIfLessThan(_options.MaxSteps, 1);
        ArgumentOutOfRangeException.ThrowIfLessThan(_options.MaxRoutes, 0);
        if (_options.WorkBudget is < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(options), _options.WorkBudget, "The work budget must not be negative.");
        }
    }

    /// <summary>Runs the search for <paramref name="target"/> (a nonzero vector over species).</summary>
    public RouteSearchResult Run(SparseVector target)
    {
        ArgumentNullException.ThrowIfNull(target);
        if (target.IsZero)
        {
            throw new ArgumentException("The target must be a nonzero vector; use the cycle search for closures.", nameof(target));
        }

        var budget = new SearchBudget(_options.TimeBudget, _options.CancellationToken, _options.WorkBudget);
        int[] unreachable = [.. target.Indices.ToArray().Where(s => !_network.SpeciesIndex.ContainsKey(s))];
        if (unreachable.Length > 0)
        {
            return Empty(unreachable, budget, certified: true);
        }

        // Target over internal species indices, as scale · primitive.
        SparseVector internalTarget = SparseVector.Create(target.Entries.Select(e => new KeyValuePair<int, Fraction>(_network.SpeciesIndex[e.Key], e.Value)));
        System.Numerics.BigInteger[] targetInts = internalTarget.ToPrimitive(out Fraction targetScale);
        int[] targetSpecies = internalTarget.Indices.ToArray();
        ulong[] targetModular = [.. targetInts.Select(Mersenne61.FromBigInteger)];
        SparseVector primitiveTarget = internalTarget.Scale(Fraction.One / targetScale);
        bool certified = HadamardBound(targetInts.Sum(x => (double)x * (double)x), _options.MaxSteps) < Mersenne61.Prime;

        var kept = new PriorityQueue<ClassCircuit, ClassCircuit>(Comparer<ClassCircuit>.Create((a, b) => ClassCircuit.ByQuality.Compare(b, a)));
        long found = 0, order = 0;
        TimeSpan? first = null;
        int maxRoutes = _options.MaxRoutes;

        bool Offer(ReadOnlySpan<int> classes, ReadOnlySpan<ulong> relation)
        {
            first ??= budget.Clock.Elapsed;
            long count = ClassCircuit.SaturatingProduct(_network, classes.ToArray());
            found = found > long.MaxValue - count ? long.MaxValue : found + count;
            if (maxRoutes > 0)
            {
                Fraction[] k = ClassCircuit.FactorsOf(_network, classes, relation, primitiveTarget);
                int[] sorted = classes.ToArray();
                Fraction[] factors = [.. k.Select(f => f * targetScale)];
                Array.Sort(sorted, factors);
                double variance = 0;
                for (int j = 0; j < sorted.Length; j++)
                {
                    double f = factors[j].ToDouble();
                    double u = _network.Classes[sorted[j]].UnitUncertainties[0];
                    variance += f * f * u * u;
                }

                var circuit = new ClassCircuit(sorted, factors, variance, order++);
                kept.Enqueue(circuit, circuit);
                if (kept.Count > maxRoutes)
                {
                    kept.Dequeue();
                }
            }

            return _options.StopAfter is not { } stop || found < stop;
        }

        // Iterative deepening by route size: round n walks the tree to depth n and reports the routes of exactly n
        // steps. Rounds 1..n take the same steps whatever the step bound, so a larger bound never finds fewer routes
        // within the same work budget (the depth-first walk to the full bound could spend a budget on long routes before
        // reaching short ones). On a branching network the rounds before the last cost a fraction of it, as the tree
        // widens with depth; on a long chain (a route of d steps and nothing else) the rounds add up to O(d³) work, the
        // price of that guarantee (larger increments would break it for bounds between two rounds). The search stops
        // early once a round reaches no branch cut by its bound: no longer route exists.
        var engine = new CircuitEngine(_network, budget);
        int completeUpTo = 0;
        for (int size = 1; size <= _options.MaxSteps; size++)
        {
            engine.Run(targetSpecies, targetModular, 0, size, completeUpTo + 1, Offer);
            if (budget.Stopped)
            {
                break;
            }

            if (!engine.CutByStepBound)
            {
                completeUpTo = _options.MaxSteps;
                break;
            }

            completeUpTo = size;
            if (size == _options.MaxSteps)
            {
                budget.Mark(SearchCut.StepBound);
            }
        }

        List<Route> routes = Expand([.. kept.UnorderedItems.Select(x => x.Element)], maxRoutes);
        (List<Route> marked, int rank) = MarkIndependent(routes);
        return new RouteSearchResult
        {
            Routes = marked,
            RoutesFound = found,
            Cut = budget.Cut,
            IndependentRouteCount = rank,
            UnreachableSpecies = [],
            ExactnessCertified = certified,
            Elapsed = budget.Clock.Elapsed,
            FirstRouteElapsed = first,
            CompleteUpToSteps = completeUpTo,
            SearchSteps = budget.Steps,
        };
    }

    // Product of the target norm and the largest class norms: bounds every minor met by the search.
    private double HadamardBound(double targetNormSquared, int steps)
    {
        double bound = Math.Sqrt(targetNormSquared);
        foreach (double n in _network.Classes.Select(c => c.Norm).OrderByDescending(n => n).Take(steps))
        {
            bound *= n;
        }

        return bound;
    }

    private RouteSearchResult Empty(int[] unreachable, SearchBudget budget, bool certified) => new()
    {
        Routes = [],
        RoutesFound = 0,
        Cut = SearchCut.None,
        IndependentRouteCount = 0,
        UnreachableSpecies = unreachable,
        ExactnessCertified = certified,
        Elapsed = budget.Clock.Elapsed,
        FirstRouteElapsed = null,
        CompleteUpToSteps = _options.MaxSteps,
        SearchSteps = budget.Steps,
    };

    // Best-first expansion of class routes into measurement routes: each class route's member choices are enumerated
    // in increasing variance with the usual successor rule (raise one position at or after the last raised one).
    private List<Route> Expand(List<ClassCircuit> circuits, int maxRoutes)
    {
        var heap = new PriorityQueue<(int Circuit, int[] Choice, int Last), (double, int, long)>();
        foreach ((ClassCircuit c, int i) in circuits.Select((c, i) => (c, i)))
        {
            int[] choice = new int[c.Classes.Length];
            heap.Enqueue((i, choice, 0), (Variance(c, choice), c.Classes.Length, c.Order));
        }

        var routes = new List<Route>();
        while (routes.Count < maxRoutes && heap.TryDequeue(out (int Circuit, int[] Choice, int Last) item, out _))
        {
            ClassCircuit c = circuits[item.Circuit];
            routes.Add(BuildRoute(c, item.Choice));
            for (int p = item.Last; p < item.Choice.Length; p++)
            {
                if (item.Choice[p] + 1 < _network.Classes[c.Classes[p]].Members.Length)
                {
                    int[] next = (int[])item.Choice.Clone();
                    next[p]++;
                    heap.Enqueue((item.Circuit, next, p), (Variance(c, next), c.Classes.Length, c.Order));
                }
            }
        }

        routes.Sort(CompareRoutes);
        return routes;
    }

    private double Variance(ClassCircuit c, int[] choice)
    {
        double v = 0;
        for (int j = 0; j < choice.Length; j++)
        {
            double u = _network.Classes[c.Classes[j]].UnitUncertainties[choice[j]];
            v += c.FactorSquares[j] * u * u;
        }

        return v;
    }

    private Route BuildRoute(ClassCircuit c, int[] choice)
    {
        var pairs = new List<(int Measurement, Fraction Factor)>(choice.Length);
        for (int j = 0; j < choice.Length; j++)
        {
            int m = _network.Classes[c.Classes[j]].Members[choice[j]];
            pairs.Add((m, c.Factors[j] / _network.ScaleOfMeasurement[m]));
        }

        pairs.Sort((a, b) => a.Measurement.CompareTo(b.Measurement));
        double value = 0, variance = 0;
        foreach ((int m, Fraction f) in pairs)
        {
            double fd = f.ToDouble();
            value += fd * _network.Values[m];
            variance += fd * fd * _network.Uncertainties[m] * _network.Uncertainties[m];
        }

        return new Route([.. pairs.Select(p => p.Measurement)], [.. pairs.Select(p => new Fraction(p.Factor.Numerator, p.Factor.Denominator))], value, Math.Sqrt(variance), false);
    }

    internal static int CompareRoutes(Route a, Route b)
    {
        int c = a.Uncertainty.CompareTo(b.Uncertainty);
        if (c != 0)
        {
            return c;
        }

        c = a.Steps.CompareTo(b.Steps);
        if (c != 0)
        {
            return c;
        }

        for (int k = 0; k < a.Steps; k++)
        {
            c = a.Measurements[k].CompareTo(b.Measurements[k]);
            if (c != 0)
            {
                return c;
            }
        }

        return 0;
    }

    private static (List<Route> Routes, int Rank) MarkIndependent(List<Route> routes)
    {
        var echelon = new ExactEchelon();
        var marked = new List<Route>(routes.Count);
        foreach (Route r in routes)
        {
            SparseVector v = SparseVector.Create([.. r.Measurements.Select((m, k) => (m, r.Factors[k]))]);
            marked.Add(r with { IsIndependent = echelon.Add(v) });
        }

        return (marked, echelon.Rank);
    }
}
