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
