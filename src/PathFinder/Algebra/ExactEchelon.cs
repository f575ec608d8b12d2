using Fractions;

namespace PathFinder.Algebra;

/// <summary>An incremental exact row-echelon form over ℚ that remembers how each pivot row was combined.</summary>
/// <remarks>
/// Vectors are offered one at a time and numbered 0, 1, 2, … in the order offered. An independent vector becomes a
/// pivot row (pivot = its lowest remaining index, scaled to 1); a dependent one yields the relation
/// Σⱼ rⱼ·xⱼ = 0 with coefficient 1 on itself. Cost grows with fill-in; intended for moderate sizes
/// (hundreds of vectors or a few thousand very sparse ones). Use <see cref="ExactRank"/> for large rank queries.
/// </remarks>
public sealed class ExactEchelon
{
    private readonly Dictionary<int, (SparseVector Row, SparseVector Combination)> _pivots = [];
    private long _storedEntries;

    /// <summary>Number of vectors offered so far.</summary>
    public int Count { get; private set; }

    /// <summary>Number of linearly independent vectors offered so far.</summary>
    public int Rank => _pivots.Count;

    /// <summary>Total number of nonzero entries held in pivot rows and combinations (a measure of memory use).</summary>
    public long StoredEntries => _storedEntries;

    /// <summary>Offers the next vector; returns true if it is independent of those offered before.</summary>
    /// <param name="vector">The vector, numbered <see cref="Count"/> before the call.</param>
    /// <param name="relation">When dependent: factors over the offered vectors' numbers with Σ rⱼ·xⱼ = 0 and
    /// coefficient 1 on this vector; otherwise the zero vector.</param>
    public bool Add(SparseVector vector, out SparseVector relation)
    {
        ArgumentNullException.ThrowIfNull(vector);
        int id = Count++;
        (SparseVector remainder, SparseVector used) = Reduce(vector);
        SparseVector combination = SparseVector.Unit(id, Fraction.One) - used;
        if (remainder.IsZero)
        {
            relation = combination;
            return false;
        }

        Fraction inverse = Fraction.One / remainder.Values[0];
        SparseVector row = remainder.Scale(inverse);
        SparseVector comb = combination.Scale(inverse);
        _pivots.Add(row.Indices[0], (row, comb));
        _storedEntries += row.Count + comb.Count;
        relation = SparseVector.Zero;
        return true;
    }

    /// <summary>Offers the next vector; returns true if it is independent of those offered before.</summary>
    public bool Add(SparseVector vector) => Add(vector, out _);

    /// <summary>Expresses <paramref name="target"/> as Σ cⱼ·xⱼ over the independent offered vectors, if it lies in their span.</summary>
    /// <param name="target">The vector to express.</param>
    /// <param name="factors">The factors cⱼ indexed by offered vector number (unique: only independent vectors are used).</param>
    public bool TryExpress(SparseVector target, out SparseVector factors)
    {
        ArgumentNullException.ThrowIfNull(target);
        (SparseVector remainder, SparseVector used) = Reduce(target);
        factors = remainder.IsZero ? used : SparseVector.Zero;
        return remainder.IsZero;
    }

    /// <summary>Returns true if <paramref name="vector"/> lies in the span of the vectors offered so far.</summary>
    public bool InSpan(SparseVector vector) => TryExpress(vector, out _);

    // Returns the remainder after elimination and the combination of offered vectors subtracted from the input.
    private (SparseVector Remainder, SparseVector Used) Reduce(SparseVector vector)
    {
        SparseVector v = vector;
        SparseVector used = SparseVector.Zero;
        int start = 0;
        while (true)
        {
            int found = -1;
            ReadOnlySpan<int> idx = v.Indices;
            for (int k = 0; k < idx.Length; k++)
            {
                if (idx[k] >= start && _pivots.ContainsKey(idx[k]))
                {
                    found = k;
                    break;
                }
            }

            if (found < 0)
            {
                return (v, used);
            }

            int col = idx[found];
            Fraction f = v.Values[found];
            (SparseVector row, SparseVector comb) = _pivots[col];
            v = v.Combine(Fraction.One, row, -f);
            used = used.Combine(Fraction.One, comb, f);
            start = col + 1;
        }
    }
}
