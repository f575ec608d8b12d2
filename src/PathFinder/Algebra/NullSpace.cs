using System.Numerics;
using Fractions;

namespace PathFinder.Algebra;

/// <summary>Computes an exact integer basis of the relations Σ cⱼ·xⱼ = 0 among a set of rational vectors.</summary>
/// <remarks>
/// Vectors are processed in order with <see cref="ExactEchelon"/>; each vector dependent on the earlier ones gives one
/// basis relation (a fundamental cycle with respect to the greedy basis), so the basis has Count − rank members.
/// Each relation is scaled to coprime integers with its first nonzero factor positive. Exact rational elimination
/// can fill in badly; the work stops and reports <see cref="NullSpaceResult.TooLarge"/> once more than
/// <c>maxStoredEntries</c> nonzero rationals would be held (default 2,000,000, roughly a few hundred MB).
/// </remarks>
public static class NullSpace
{
    /// <summary>Default limit on stored nonzero entries.</summary>
    public const long DefaultMaxStoredEntries = 2_000_000;

    /// <summary>Returns an integer basis of the relations among <paramref name="vectors"/>, or a "too large" result.</summary>
    public static NullSpaceResult Of(IReadOnlyList<SparseVector> vectors, long maxStoredEntries = DefaultMaxStoredEntries)
    {
        ArgumentNullException.ThrowIfNull(vectors);
        var echelon = new ExactEchelon();
        var basis = new List<SparseVector>();
        long relationEntries = 0;
        foreach (SparseVector v in vectors)
        {
            if (!echelon.Add(v, out SparseVector relation))
            {
                SparseVector integral = ToPrimitiveIntegers(relation);
                basis.Add(integral);
                relationEntries += integral.Count;
            }

            if (echelon.StoredEntries + relationEntries > maxStoredEntries)
            {
                return new NullSpaceResult(true, [], echelon.Rank);
            }
        }

        return new NullSpaceResult(false, basis, echelon.Rank);
    }

    /// <summary>Scales a nonzero vector to coprime integers with a positive first entry.</summary>
    public static SparseVector ToPrimitiveIntegers(SparseVector vector)
    {
        ArgumentNullException.ThrowIfNull(vector);
        BigInteger[] ints = vector.ToPrimitive(out _);
        int[] idx = vector.Indices.ToArray();
        return SparseVector.Create(idx.Select((c, k) => (c, new Fraction(ints[k]))).ToArray());
    }
}
