using Fractions;
using PathFinder.Algebra;

namespace PathFinder.Tests.Algebra;

public class SparseVectorTests
{
    [Fact]
    public void Create_SumsRepeatedIndices_AndDropsZeros()
    {
        SparseVector v = SparseVector.Create((3, 1), (1, 2), (3, -1));
        Assert.Equal([1], v.Indices.ToArray());
        Assert.Equal(new Fraction(2), v[1]);
        Assert.Equal(Fraction.Zero, v[3]);
    }

    [Fact]
    public void ToPrimitive_GivesCoprimeIntegersWithPositiveFirstEntry_AndTheScale()
    {
        SparseVector v = SparseVector.Create((0, new Fraction(-1, 2)), (4, new Fraction(3, 4)));
        var ints = v.ToPrimitive(out Fraction scale);
        Assert.Equal([2, -3], ints.Select(i => (int)i));
        Assert.Equal(new Fraction(-1, 4), scale);
        Assert.Equal(v, SparseVector.Create((0, new Fraction(2)), (4, new Fraction(-3))).Scale(scale));
    }

    [Fact]
    public void Arithmetic_RoundTrips_AndEqualityIsByValue()
    {
        SparseVector a = SparseVector.Create((0, 1), (2, new Fraction(1, 3)));
        SparseVector b = SparseVector.Create((1, 5), (2, new Fraction(-1, 3)));
        Assert.Equal(a, (a + b) - b);
        Assert.Equal((a + b).GetHashCode(), (b + a).GetHashCode());
        Assert.True((a - a).IsZero);
        Assert.Equal(new Fraction(-1, 9), a.Dot(b));
        Assert.Equal("{0: 1, 2: 1/3}", a.ToString());
    }
}
