using System.Globalization;
using System.Numerics;
using System.Text;
using Fractions;

namespace PathFinder.Algebra;

/// <summary>An immutable sparse vector of exact rationals indexed by non-negative integers (e.g. species indices).</summary>
/// <remarks>
/// Entries are stored sorted by index and never hold a zero value, so two vectors are equal exactly when
/// they have the same entries. Arithmetic is exact (<see cref="Fraction"/>, BigInteger based).
/// </remarks>
public sealed class SparseVector : IEquatable<SparseVector>
{
    private readonly int[] _indices;
    private readonly Fraction[] _values;

    private SparseVector(int[] indices, Fraction[] values)
    {
        _indices = indices;
        _values = values;
    }

    /// <summary>The zero vector (no entries).</summary>
    public static SparseVector Zero { get; } = new([], []);

    /// <summary>Creates a vector from (index, value) pairs; repeated indices are summed and zeros dropped.</summary>
    public static SparseVector Create(IEnumerable<KeyValuePair<int, Fraction>> entries)
    {
        ArgumentNullException.ThrowIfNull(entries);
        (int Index, Fraction Value)[] buffer = entries is ICollection<KeyValuePair<int, Fraction>> collection
            ? new (int, Fraction)[collection.Count]
            : [];
        int n = 0;
        foreach (KeyValuePair<int, Fraction> e in entries)
        {
            if (n == buffer.Length)
            {
                Array.Resize(ref buffer, Math.Max(4, n * 2));
            }

            buffer[n++] = (e.Key, e.Value);
        }

        return FromEntries(buffer.AsSpan(0, n));
    }

    /// <summary>Creates a vector from (index, value) entries, sorting and netting them in place (the caller's buffer).</summary>
    internal static SparseVector FromEntries(Span<(int Index, Fraction Value)> entries)
    {
        foreach ((int index, _) in entries)
        {
            ArgumentOutOfRangeException.ThrowIfNegative(index, nameof(entries));
        }

        int distinct = IndexedEntries.SortAndSum(entries, static (a, b) => a + b);
        int kept = 0;
        for (int i = 0; i < distinct; i++)
        {
            if (!entries[i].Value.IsZero)
            {
                kept++;
            }
        }

        var indices = new int[kept];
        var values = new Fraction[kept];
        int next = 0;
        for (int i = 0; i < distinct; i++)
        {
            if (!entries[i].Value.IsZero)
            {
                indices[next] = entries[i].Index;
                values[next++] = Normalize(entries[i].Value);
            }
        }

        return new SparseVector(indices, values);
    }

    /// <summary>Creates a vector from (index, value) tuples; repeated indices are summed and zeros dropped.</summary>
    public static SparseVector Create(params (int Index, Fraction Value)[] entries)
    {
        ArgumentNullException.ThrowIfNull(entries);
        return FromEntries(entries.ToArray());
    }

    /// <summary>Creates the vector value·e_index.</summary>
    public static SparseVector Unit(int index, Fraction value)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(index);
        return value.IsZero ? Zero : new SparseVector([index], [Normalize(value)]);
    }

    private static SparseVector FromSorted(IEnumerable<(int Index, Fraction Value)> sorted)
    {
        var list = sorted.ToList();
        return new SparseVector([.. list.Select(e => e.Index)], [.. list.Select(e => Normalize(e.Value))]);
    }

    private static Fraction Normalize(Fraction f) => new(f.Numerator, f.Denominator);

    /// <summary>Number of nonzero entries.</summary>
    public int Count => _indices.Length;

    /// <summary>True when the vector has no nonzero entry.</summary>
    public bool IsZero => _indices.Length == 0;

    /// <summary>Indices of the nonzero entries, ascending.</summary>
    public ReadOnlySpan<int> Indices => _indices;

    /// <summary>Values of the nonzero entries, in the order of <see cref="Indices"/>.</summary>
    public ReadOnlySpan<Fraction> Values => _values;

    /// <summary>The (index, value) entries, ascending by index.</summary>
    public IEnumerable<KeyValuePair<int, Fraction>> Entries
    {
        get
        {
            for (int i = 0; i < _indices.Length; i++)
            {
                yield return new KeyValuePair<int, Fraction>(_indices[i], _values[i]);
            }
        }
    }

    /// <summary>The value at <paramref name="index"/> (zero when absent).</summary>
    public Fraction this[int index]
    {
        get
        {
            int k = Array.BinarySearch(_indices, index);
            return k >= 0 ? _values[k] : Fraction.Zero;
        }
    }

    /// <summary>True when the vector has a nonzero entry at <paramref name="index"/>.</summary>
    public bool Contains(int index) => Array.BinarySearch(_indices, index) >= 0;

    /// <summary>Returns this + other.</summary>
    public SparseVector Add(SparseVector other) => Combine(Fraction.One, other, Fraction.One);

    /// <summary>Returns this − other.</summary>
    public SparseVector Subtract(SparseVector other) => Combine(Fraction.One, other, Fraction.MinusOne);

    /// <summary>Returns factor·this.</summary>
    public SparseVector Scale(Fraction factor)
    {
        if (factor.IsZero)
        {
            return Zero;
        }

        var values = new Fraction[_values.Length];
        for (int i = 0; i < values.Length; i++)
        {
            values[i] = Normalize(_values[i] * factor);
        }

        return new SparseVector(_indices, values);
    }

    /// <summary>Returns a·this + b·other.</summary>
    public SparseVector Combine(Fraction a, SparseVector other, Fraction b)
    {
        ArgumentNullException.ThrowIfNull(other);
        var result = new List<(int, Fraction)>(_indices.Length + other._indices.Length);
        int i = 0, j = 0;
        while (i < _indices.Length || j < other._indices.Length)
        {
            if (j >= other._indices.Length || (i < _indices.Length && _indices[i] < other._indices[j]))
            {
                Append(result, _indices[i], a * _values[i]);
                i++;
            }
            else if (i >= _indices.Length || other._indices[j] < _indices[i])
            {
                Append(result, other._indices[j], b * other._values[j]);
                j++;
            }
            else
            {
                Append(result, _indices[i], (a * _values[i]) + (b * other._values[j]));
                i++;
                j++;
            }
        }

        return FromSorted(result);
    }

    private static void Append(List<(int, Fraction)> list, int index, Fraction value)
    {
        if (!value.IsZero)
        {
            list.Add((index, value));
        }
    }

    /// <summary>Sum of vectors.</summary>
    public static SparseVector operator +(SparseVector a, SparseVector b) => a.Add(b);

    /// <summary>Difference of vectors.</summary>
    public static SparseVector operator -(SparseVector a, SparseVector b) => a.Subtract(b);

    /// <summary>Scalar multiple.</summary>
    public static SparseVector operator *(Fraction factor, SparseVector v) => v.Scale(factor);

    /// <summary>Splits the vector as scale·primitive, where primitive has coprime integer entries and a positive first entry.</summary>
    /// <remarks>For the zero vector the scale is zero and the primitive entries are empty.</remarks>
    public BigInteger[] ToPrimitive(out Fraction scale)
    {
        if (IsZero)
        {
            scale = Fraction.Zero;
            return [];
        }

        BigInteger lcm = BigInteger.One;
        foreach (Fraction v in _values)
        {
            lcm = lcm / BigInteger.GreatestCommonDivisor(lcm, v.Denominator) * v.Denominator;
        }

        var ints = new BigInteger[_values.Length];
        BigInteger gcd = BigInteger.Zero;
        for (int i = 0; i < ints.Length; i++)
        {
            ints[i] = _values[i].Numerator * (lcm / _values[i].Denominator);
            gcd = BigInteger.GreatestCommonDivisor(gcd, ints[i]);
        }

        if (ints[0].Sign < 0)
        {
            gcd = -gcd;
        }

        for (int i = 0; i < ints.Length; i++)
        {
            ints[i] /= gcd;
        }

        scale = new Fraction(gcd, lcm);
        return ints;
    }

    /// <summary>Exact dot product.</summary>
    public Fraction Dot(SparseVector other)
    {
        ArgumentNullException.ThrowIfNull(other);
        Fraction sum = Fraction.Zero;
        int i = 0, j = 0;
        while (i < _indices.Length && j < other._indices.Length)
        {
            if (_indices[i] == other._indices[j])
            {
                sum += _values[i] * other._values[j];
                i++;
                j++;
            }
            else if (_indices[i] < other._indices[j])
            {
                i++;
            }
            else
            {
                j++;
            }
        }

        return sum;
    }

    /// <inheritdoc/>
    public bool Equals(SparseVector? other)
    {
        if (other is null || other._indices.Length != _indices.Length)
        {
            return false;
        }

        for (int i = 0; i < _indices.Length; i++)
        {
            if (_indices[i] != other._indices[i] || _values[i].CompareTo(other._values[i]) != 0)
            {
                return false;
            }
        }

        return true;
    }

    /// <inheritdoc/>
    public override bool Equals(object? obj) => obj is SparseVector v && Equals(v);

    /// <inheritdoc/>
    public override int GetHashCode()
    {
        var hash = new HashCode();
        for (int i = 0; i < _indices.Length; i++)
        {
            hash.Add(_indices[i]);
            hash.Add(_values[i].Numerator);
            hash.Add(_values[i].Denominator);
        }

        return hash.ToHashCode();
    }

    /// <summary>Formats as "{index: value, ...}" with invariant culture.</summary>
    public override string ToString()
    {
        var sb = new StringBuilder("{");
        for (int i = 0; i < _indices.Length; i++)
        {
            if (i > 0)
            {
                sb.Append(", ");
            }

            sb.Append(_indices[i].ToString(CultureInfo.InvariantCulture)).Append(": ")
              .Append(_values[i].ToString(CultureInfo.InvariantCulture));
        }

        return sb.Append('}').ToString();
    }
}
