using Fractions;
using PathFinder.Algebra;

namespace PathFinder.Routes;

/// <summary>A circuit found over classes: the classes of S (ascending) with exact factors on their primitive vectors.</summary>
internal sealed class ClassCircuit
{
    public ClassCircuit(int[] classes, Fraction[] factors, double bestVariance, long order)
    {
        Classes = classes;
        Factors = factors;
        FactorSquares = [.. factors.Select(f => f.ToDouble() * f.ToDouble())];
        BestVariance = bestVariance;
        Order = order;
    }

    public int[] Classes { get; }

    public Fraction[] Factors { get; }

    public double[] FactorSquares { get; }

    public double BestVariance { get; }

    public long Order { get; }

    public static readonly IComparer<ClassCircuit> ByQuality = Comparer<ClassCircuit>.Create((a, b) =>
    {
        int c = a.BestVariance.CompareTo(b.BestVariance);
        if (c != 0)
        {
            return c;
        }

        c = a.Classes.Length.CompareTo(b.Classes.Length);
        return c != 0 ? c : a.Order.CompareTo(b.Order);
    });

    /// <summary>Turns an engine relation over T (index 0 = the target) into exact factors on S: −relⱼ/rel₀.</summary>
    /// <remarks>Uses rational reconstruction modulo 2^61 − 1 checked exactly against <paramref name="target"/>; falls back to an exact solve.</remarks>
    public static Fraction[] FactorsOf(RouteNetwork network, ReadOnlySpan<int> classes, ReadOnlySpan<ulong> relation, SparseVector target)
    {
        var factors = new Fraction[classes.Length];
        ulong inv = Mersenne61.Inverse(relation[0]);
        bool ok = true;
        for (int j = 0; j < classes.Length; j++)
        {
            ulong a = Mersenne61.Negate(Mersenne61.Multiply(relation[j + 1], inv));
            if (!Mersenne61.TryReconstruct(a, out long n, out long d))
            {
                ok = false;
                break;
            }

            factors[j] = new Fraction(n, d);
        }

        SparseVector[] vectors = [.. classes.ToArray().Select(c => network.Classes[c].Primitive)];
        if (ok)
        {
            SparseVector sum = SparseVector.Zero;
            for (int j = 0; j < vectors.Length; j++)
            {
                sum = sum.Combine(Fraction.One, vectors[j], factors[j]);
            }

            if (sum.Equals(target))
            {
                return factors;
            }
        }

        if (!ExactSolve.TryUnique(vectors, target, out Fraction[] exact))
        {
            throw new InvalidOperationException("Internal error: a circuit found modulo p has no exact solution.");
        }

        return exact;
    }

    public static long SaturatingProduct(RouteNetwork network, IEnumerable<int> classes)
    {
        long product = 1;
        foreach (int c in classes)
        {
            long size = network.Classes[c].Members.Length;
            product = product > long.MaxValue / size ? long.MaxValue : product * size;
        }

        return product;
    }
}
