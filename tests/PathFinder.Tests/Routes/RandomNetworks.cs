using Fractions;
using PathFinder.Algebra;
using PathFinder.Routes;

namespace PathFinder.Tests.Routes;

/// <summary>Seeded random small networks and a brute-force subset oracle for routes and cycles.</summary>
internal static class RandomNetworks
{
    private static readonly Fraction[] Coefficients =
        [new(1, 2), new(1), new(3, 2), new(2), new(-1, 2), new(-1), new(-3, 2), new(-2)];

    public static (RouteNetwork Network, SparseVector Target) Create(int seed)
    {
        var random = new Random(seed);
        int species = random.Next(2, 5);
        int m = random.Next(1, 11);
        var vectors = new List<SparseVector>();
        for (int i = 0; i < m; i++)
        {
            double roll = random.NextDouble();
            if (vectors.Count > 0 && roll < 0.15)
            {
                vectors.Add(vectors[random.Next(vectors.Count)]); // duplicate measurement
            }
            else if (vectors.Count > 0 && roll < 0.3)
            {
                vectors.Add(vectors[random.Next(vectors.Count)].Scale(Coefficients[random.Next(Coefficients.Length)])); // parallel
            }
            else
            {
                vectors.Add(RandomVector(random, species, random.Next(1, 4)));
            }
        }

        double[] values = [.. vectors.Select(_ => Math.Round((random.NextDouble() * 200) - 100, 1))];
        double[] uncertainties = [.. vectors.Select(_ => Math.Round(0.1 + (random.NextDouble() * 2), 2))];
        SparseVector target = RandomVector(random, species + 1, random.Next(1, 3)); // may use a species nobody holds
        return (RouteNetwork.Create(vectors, values, uncertainties), target);
    }

    /// <summary>A complete-ish graph: each pair of <paramref name="species"/> species is joined by A → B with probability 0.8, a fifth of the edges measured twice (once doubled); the target is species 0 → species 1.</summary>
    /// <remarks>Minimal routes are the simple paths from 0 to 1, so their number grows about (species − 2) times per step:
    /// the shape on which a depth-first search to the full step bound once spent its whole budget on long routes.</remarks>
    public static (RouteNetwork Network, SparseVector Target) CompleteIsh(int species, int seed)
    {
        var random = new Random(seed);
        var vectors = new List<SparseVector>();
        for (int a = 0; a < species; a++)
        {
            for (int b = a + 1; b < species; b++)
            {
                if (random.NextDouble() < 0.8)
                {
                    SparseVector edge = SparseVector.Create((a, -1), (b, 1));
                    vectors.Add(edge);
                    if (random.NextDouble() < 0.2)
                    {
                        vectors.Add(edge.Scale(new Fraction(2)));
                    }
                }
            }
        }

        double[] values = [.. vectors.Select(_ => Math.Round((random.NextDouble() * 200) - 100, 1))];
        double[] uncertainties = [.. vectors.Select(_ => Math.Round(0.1 + (random.NextDouble() * 2), 2))];
        return (RouteNetwork.Create(vectors, values, uncertainties), SparseVector.Create((0, -1), (1, 1)));
    }

    private static SparseVector RandomVector(Random random, int species, int count)
    {
        var entries = new List<(int, Fraction)>();
        foreach (int s in Enumerable.Range(0, species).OrderBy(_ => random.Next()).Take(count))
        {
            entries.Add((s, Coefficients[random.Next(Coefficients.Length)]));
        }

        return SparseVector.Create([.. entries]);
    }

    /// <summary>All routes by subset enumeration: independent sets S with t = Σ c·r and every c nonzero.</summary>
    public static List<(int[] Members, Fraction[] Factors)> BruteForceRoutes(RouteNetwork network, SparseVector target)
    {
        var result = new List<(int[], Fraction[])>();
        foreach (int[] subset in Subsets(network.Count))
        {
            SparseVector[] vectors = [.. subset.Select(i => network.Vectors[i])];
            if (ExactSolve.TryUnique(vectors, target, out Fraction[] factors) && factors.All(f => !f.IsZero))
            {
                result.Add((subset, factors));
            }
        }

        return result;
    }

    /// <summary>All circuits by subset enumeration: dependent sets whose every one-smaller subset is independent.</summary>
    public static List<(int[] Members, Fraction[] Factors)> BruteForceCycles(RouteNetwork network)
    {
        var result = new List<(int[], Fraction[])>();
        foreach (int[] subset in Subsets(network.Count))
        {
            SparseVector[] vectors = [.. subset.Select(i => network.Vectors[i])];
            if (Independent(vectors))
            {
                continue;
            }

            bool minimal = subset.Select((_, k) => vectors.Where((_, j) => j != k).ToArray()).All(Independent);
            if (!minimal)
            {
                continue;
            }

            NullSpaceResult ns = NullSpace.Of(vectors);
            SparseVector relation = ns.Basis.Single();
            result.Add((subset, [.. Enumerable.Range(0, subset.Length).Select(k => relation[k])]));
        }

        return result;
    }

    private static bool Independent(SparseVector[] vectors)
    {
        var echelon = new ExactEchelon();
        return vectors.All(v => echelon.Add(v));
    }

    private static IEnumerable<int[]> Subsets(int n)
    {
        for (int mask = 1; mask < (1 << n); mask++)
        {
            yield return [.. Enumerable.Range(0, n).Where(i => (mask & (1 << i)) != 0)];
        }
    }

    public static string Key(IEnumerable<int> members, IEnumerable<Fraction> factors) =>
        string.Join(" ", members.Zip(factors, (m, f) => $"{m}:{f}"));
}
