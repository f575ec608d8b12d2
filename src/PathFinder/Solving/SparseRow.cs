using PathFinder.Algebra;

namespace PathFinder.Solving;

/// <summary>An immutable sparse vector over the unknowns: sorted column indices with non-zero coefficients.</summary>
/// <remarks>
/// Used both for an observation's design row a_i (the observed quantity is a_iᵀx) and for a derived linear
/// combination a whose estimate aᵀx̂ is wanted. Duplicate indices are merged by adding their coefficients;
/// coefficients that are exactly zero after merging are dropped (an exact structural zero, not a tolerance).
/// </remarks>
public sealed class SparseRow
{
    private readonly int[] _indices;
    private readonly double[] _coefficients;

    private SparseRow(int[] indices, double[] coefficients)
    {
        _indices = indices;
        _coefficients = coefficients;
    }

    /// <summary>The column (unknown) indices, strictly increasing.</summary>
    public ReadOnlySpan<int> Indices => _indices;

    /// <summary>The coefficients, parallel to <see cref="Indices"/>.</summary>
    public ReadOnlySpan<double> Coefficients => _coefficients;

    /// <summary>The number of stored non-zero entries.</summary>
    public int Count => _indices.Length;

    /// <summary>The largest index plus one (0 for an empty row).</summary>
    public int MinimumUnknownCount => _indices.Length == 0 ? 0 : _indices[^1] + 1;

    /// <summary>Creates a row from (index, coefficient) pairs in any order.</summary>
    /// <exception cref="ArgumentOutOfRangeException">An index is negative or a coefficient is not finite.</exception>
    public static SparseRow Of(params ReadOnlySpan<(int Index, double Coefficient)> entries)
    {
        foreach ((int index, double coefficient) in entries)
        {
            ArgumentOutOfRangeException.ThrowIfNegative(index, nameof(entries));
            if (!double.IsFinite(coefficient))
            {
                throw new ArgumentOutOfRangeException(nameof(entries), coefficient, "Coefficients must be finite.");
            }
        }

        (int Index, double Value)[] buffer = entries.ToArray();
        int distinct = IndexedEntries.SortAndSum(buffer.AsSpan(), static (a, b) => a + b);
        var indices = new List<int>(distinct);
        var coefficients = new List<double>(distinct);
        for (int i = 0; i < distinct; i++)
        {
            // Exact zero on purpose: only a coefficient that cancelled exactly is structurally absent.
            if (buffer[i].Value != 0.0)
            {
                indices.Add(buffer[i].Index);
                coefficients.Add(buffer[i].Value);
            }
        }

        return new SparseRow(indices.ToArray(), coefficients.ToArray());
    }

    /// <summary>Creates a row from parallel arrays of indices and coefficients.</summary>
    public static SparseRow Of(IReadOnlyList<int> indices, IReadOnlyList<double> coefficients)
    {
        ArgumentNullException.ThrowIfNull(indices);
        ArgumentNullException.ThrowIfNull(coefficients);
        if (indices.Count != coefficients.Count)
        {
            throw new ArgumentException("Indices and coefficients must have the same length.", nameof(coefficients));
        }

        var entries = new (int, double)[indices.Count];
        for (int k = 0; k < entries.Length; k++)
        {
            entries[k] = (indices[k], coefficients[k]);
        }

        return Of(entries);
    }

    /// <summary>The unit vector e_j (selects unknown <paramref name="index"/>).</summary>
    public static SparseRow Unit(int index) => Of((index, 1.0));

    /// <summary>The difference e_first − e_second.</summary>
    public static SparseRow Difference(int first, int second) => Of((first, 1.0), (second, -1.0));

    /// <summary>Computes the dot product aᵀx with a dense vector.</summary>
    public double Dot(ReadOnlySpan<double> x)
    {
        double sum = 0.0;
        for (int k = 0; k < _indices.Length; k++)
        {
            sum += _coefficients[k] * x[_indices[k]];
        }

        return sum;
    }

    /// <summary>Formats as <c>+1·x3 −2·x7</c> with invariant culture.</summary>
    public override string ToString()
    {
        if (_indices.Length == 0)
        {
            return "0";
        }

        var parts = new string[_indices.Length];
        for (int k = 0; k < _indices.Length; k++)
        {
            parts[k] = string.Create(System.Globalization.CultureInfo.InvariantCulture, $"{_coefficients[k]:+0.###;-0.###}·x{_indices[k]}");
        }

        return string.Join(" ", parts);
    }
}
