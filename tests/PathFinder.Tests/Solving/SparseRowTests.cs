using PathFinder.Solving;

namespace PathFinder.Tests.Solving;

public sealed class SparseRowTests
{
    [Fact]
    public void Of_MergesDuplicatesSortsAndDropsCancelledEntries()
    {
        // Given entries out of order, with a duplicate and a pair that cancels
        // When building the row
        SparseRow row = SparseRow.Of((5, 1.0), (2, -1.0), (5, 0.5), (7, 2.0), (7, -2.0));

        // Then indices are sorted and unique, and the cancelled index is gone
        Assert.Equal([2, 5], row.Indices.ToArray());
        Assert.Equal([-1.0, 1.5], row.Coefficients.ToArray());
        Assert.Equal(6, row.MinimumUnknownCount);
    }

    [Fact]
    public void Dot_ComputesInnerProduct()
    {
        SparseRow row = SparseRow.Of((0, 2.0), (2, -0.5));
        Assert.Equal(2.0 * 3.0 - (0.5 * 8.0), row.Dot([3.0, 100.0, 8.0]), 12);
    }

    [Fact]
    public void Of_RejectsNegativeIndexAndNonFiniteCoefficient()
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => SparseRow.Of((-1, 1.0)));
        Assert.Throws<ArgumentOutOfRangeException>(() => SparseRow.Of((0, double.NaN)));
    }
}
