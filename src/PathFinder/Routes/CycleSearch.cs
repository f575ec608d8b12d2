using Fractions;
using PathFinder.Algebra;

namespace PathFinder.Routes;

/// <summary>Finds every minimal cycle (circuit of measurement vectors) up to a size bound, each exactly once.</summary>
/// <remarks>
/// <para>A circuit of measurements is either a zero vector alone, two members of one class of parallel vectors, or one
/// member from each class of a circuit of classes. Class circuits are enumerated by their smallest class i as routes
/// to the primitive vector of class i among classes with larger numbers (<see cref="CircuitEngine"/>), so each is
/// found once. Every member choice is then expanded and ranked by |z|.</para>
/// <para>Factors are normalised to coprime integers with the factor of the lowest-numbered measurement positive.</para>
/// </remarks>
public sealed class CycleSearch
{
    private readonly RouteNetwork _network;
    private readonly CycleSearchOptions _options;

    /// <summary>Prepares a search over <paramref name="network"/> with <paramref name="options"/>.</summary>
    public CycleSearch(RouteNetwork network, CycleSearchOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(network);
        _network = network;
        _options = options ?? new CycleSearchOptions();
        ArgumentOutOfRangeException.ThrowIfLessThan(_options.MaxSize, 1);
        ArgumentOutOfRangeException.ThrowIfLessThan(_options.MaxCycles, 0);
        if (_options.WorkBudget is < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(options), _options.WorkBudget, "The work budget must not be negative.");
        }
    }

    /// <summary>Runs the search.</summary>
    public CycleSearchResult Run()
    {
        var budget = new SearchBudget(_options.TimeBudget, _options.CancellationToken, _options.WorkBudget);
        var kept = new PriorityQueue<Candidate, (double, int, long)>();
        long found = 0, order = 0;

        void Offer(int[] measurements, Fraction[] factors)
        {
            found = found == long.MaxValue ? found : found + 1;
            if (_options.MaxCycles == 0)
            {
                return;
            }

            double residual = 0, variance = 0;
            for (int k = 0; k < measurements.Length; k++)
            {
                double f = factors[k].ToDouble();
                residual += f * _network.Values[measurements[k]];
                variance += f * f * _network.Uncertainties[measurements[k]] * _network.Uncertainties[measurements[k]];
            }

            double absZ = Math.Abs(ZScore(residual, Math.Sqrt(variance)));
            var key = (absZ, -measurements.Length, -order++);
            if (kept.Count < _options.MaxCycles)
            {
                kept.Enqueue(new Candidate(measurements, factors), key);
            }
            else if (kept.TryPeek(out _, out (double, int, long) worst) && Comparer<(double, int, long)>.Default.Compare(key, worst) > 0)
            {
                kept.DequeueEnqueue(new Candidate(measurements, factors), key);
            }
        }

        foreach (int z in _network.ZeroMeasurements)
        {
            Offer([z], [Fraction.One]);
        }

        if (_options.MaxSize >= 2)
        {
            foreach (NetworkClass cls in _network.Classes)
            {
                for (int a = 0; a < cls.Members.Length && !budget.ShouldStop(); a++)
                {
                    for (int b = a + 1; b < cls.Members.Length; b++)
                    {
                        int ma = cls.Members[a], mb = cls.Members[b];
                        Offer([ma, mb], [Fraction.One / _network.ScaleOfMeasurement[ma], -Fraction.One / _network.ScaleOfMeasurement[mb]]);
                    }
                }
            }
        }

        bool certified = true;
        if (_options.MaxSize >= 2 && _network.ClassCount > 0)
        {
            double[] norms = [.. _network.Classes.Select(c => c.Norm).OrderByDescending(n => n).Take(_options.MaxSize)];
            certified = norms.Aggregate(1.0, (p, n) => p * n) < Mersenne61.Prime;
            var engine = new CircuitEngine(_network, budget);
            for (int i = 0; i < _network.ClassCount && !budget.Stopped; i++)
            {
                NetworkClass target = _network.Classes[i];
                engine.Run(target.Species, target.Modular, i + 1, _options.MaxSize - 1, minSteps: 1, (classes, relation) =>
                {
                    Fraction[] k = ClassCircuit.FactorsOf(_network, classes, relation, target.Primitive);
                    int[] cls = [i, .. classes];
                    Fraction[] alpha = [Fraction.One, .. k.Select(f => -f)];
                    ExpandAll(cls, alpha, Offer, budget);
                    return true;
                });
                if (engine.CutByStepBound)
                {
                    budget.Mark(SearchCut.StepBound);
                }
            }
        }

        var cycles = kept.UnorderedItems.Select(x => Build(x.Element)).ToList();
        cycles.Sort(CompareCycles);
        int rank = ExactRank.Of(_network.Vectors);
        return new CycleSearchResult
        {
            Cycles = cycles,
            CyclesFound = found,
            Cut = budget.Cut,
            IndependentCycleCount = _network.Count - rank,
            ExactnessCertified = certified,
            SearchSteps = budget.Steps,
            Elapsed = budget.Clock.Elapsed,
        };
    }

    private void ExpandAll(int[] classes, Fraction[] alpha, Action<int[], Fraction[]> offer, SearchBudget budget)
    {
        int[] choice = new int[classes.Length];
        while (true)
        {
            var measurements = new int[classes.Length];
            var factors = new Fraction[classes.Length];
            for (int j = 0; j < classes.Length; j++)
            {
                int m = _network.Classes[classes[j]].Members[choice[j]];
                measurements[j] = m;
                factors[j] = alpha[j] / _network.ScaleOfMeasurement[m];
            }

            offer(measurements, factors);
            int p = 0;
            while (p < choice.Length && ++choice[p] == _network.Classes[classes[p]].Members.Length)
            {
                choice[p++] = 0;
            }

            if (p == choice.Length || budget.ShouldStop())
            {
                return;
            }
        }
    }

    private Cycle Build(Candidate c)
    {
        SparseVector v = NullSpace.ToPrimitiveIntegers(SparseVector.Create([.. c.Measurements.Select((m, k) => (m, c.Factors[k]))]));
        int[] members = v.Indices.ToArray();
        Fraction[] factors = v.Values.ToArray();
        double residual = 0, variance = 0;
        for (int k = 0; k < members.Length; k++)
        {
            double f = factors[k].ToDouble();
            residual += f * _network.Values[members[k]];
            variance += f * f * _network.Uncertainties[members[k]] * _network.Uncertainties[members[k]];
        }

        double u = Math.Sqrt(variance);
        return new Cycle(members, factors, residual, u, ZScore(residual, u));
    }

    private static double ZScore(double residual, double uncertainty) =>
        uncertainty > 0 ? residual / uncertainty : residual == 0 ? 0 : residual > 0 ? double.PositiveInfinity : double.NegativeInfinity;

    private static int CompareCycles(Cycle a, Cycle b)
    {
        int c = Math.Abs(b.Z).CompareTo(Math.Abs(a.Z));
        if (c != 0)
        {
            return c;
        }

        c = a.Size.CompareTo(b.Size);
        if (c != 0)
        {
            return c;
        }

        for (int k = 0; k < a.Size; k++)
        {
            c = a.Measurements[k].CompareTo(b.Measurements[k]);
            if (c != 0)
            {
                return c;
            }
        }

        return 0;
    }

    private sealed record Candidate(int[] Measurements, Fraction[] Factors);
}
