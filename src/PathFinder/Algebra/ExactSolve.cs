using Fractions;

namespace PathFinder.Algebra;

/// <summary>Solves small exact systems Σ cᵢ·vᵢ = t over ℚ.</summary>
public static class ExactSolve
{
    /// <summary>Finds the unique factors cᵢ with Σ cᵢ·vᵢ = <paramref name="target"/>, if the vᵢ are independent and t is in their span.</summary>
    /// <returns>False when the vectors are linearly dependent (no unique solution) or t is outside their span.</returns>
    public static bool TryUnique(IReadOnlyList<SparseVector> vectors, SparseVector target, out Fraction[] factors)
    {
        ArgumentNullException.ThrowIfNull(vectors);
        ArgumentNullException.ThrowIfNull(target);
        var echelon = new ExactEchelon();
        foreach (SparseVector v in vectors)
        {
            if (!echelon.Add(v))
            {
                factors = [];
                return false;
            }
        }

        if (!echelon.TryExpress(target, out SparseVector c))
        {
            factors = [];
            return false;
        }

        factors = [.. Enumerable.Range(0, vectors.Count).Select(i => c[i])];
        return true;
    }
}
