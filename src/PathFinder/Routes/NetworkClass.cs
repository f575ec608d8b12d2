using System.Numerics;
using Fractions;
using PathFinder.Algebra;

namespace PathFinder.Routes;

/// <summary>A class of parallel measurement vectors: the shared primitive integer vector and its members.</summary>
internal sealed class NetworkClass
{
    public NetworkClass(int[] species, BigInteger[] integers, int[] members, double[] unitUncertainties)
    {
        Species = species;
        Integers = integers;
        Members = members;
        UnitUncertainties = unitUncertainties;
        Modular = [.. integers.Select(Mersenne61.FromBigInteger)];
        Norm = Math.Sqrt(integers.Sum(x => (double)x * (double)x));
        Primitive = SparseVector.Create([.. species.Select((s, k) => (s, new Fraction(integers[k])))]);
    }

    /// <summary>Internal species indices, ascending.</summary>
    public int[] Species { get; }

    /// <summary>Coprime integer coefficients (first positive).</summary>
    public BigInteger[] Integers { get; }

    /// <summary>The coefficients modulo 2^61 − 1.</summary>
    public ulong[] Modular { get; }

    /// <summary>Euclidean norm of the integer vector.</summary>
    public double Norm { get; }

    /// <summary>The primitive vector over internal species indices.</summary>
    public SparseVector Primitive { get; }

    /// <summary>Member measurements, cheapest first.</summary>
    public int[] Members { get; }

    /// <summary>uᵢ/|sᵢ| of each member, ascending.</summary>
    public double[] UnitUncertainties { get; }
}
