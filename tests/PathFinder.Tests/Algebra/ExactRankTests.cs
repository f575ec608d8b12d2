using Fractions;
using PathFinder.Algebra;

namespace PathFinder.Tests.Algebra;

public class ExactRankTests
{
    // Dense Gauss–Jordan over Fraction: the reference for the rank.
    private static int DenseRank(List<SparseVector> rows, int columns)
    {
        Fraction[][] a = [.. rows.Select(r => Enumerable.Range(0, columns).Select(c => r[c]).ToArray())];
        int rank = 0;
        for (int c = 0; c < columns && rank < a.Length; c++)
        {
            int p = Array.FindIndex(a, rank, row => !row[c].IsZero);
            if (p < 0)
            {
                continue;
            }

            (a[rank], a[p]) = (a[p], a[rank]);
            for (int i = 0; i < a.Length; i++)
            {
                if (i != rank && !a[i][c].IsZero)
                {
                    Fraction f = a[i][c] / a[rank][c];
                    for (int k = 0; k < columns; k++)
                    {
                        a[i][k] -= f * a[rank][k];
                    }
                }
            }

            rank++;
        }

        return rank;
    }

    private static List<SparseVector> RandomRows(Random random, int rows, int columns, int perRow)
    {
        var list = new List<SparseVector>();
        for (int i = 0; i < rows; i++)
        {
            if (list.Count > 1 && random.NextDouble() < 0.2)
            {
                // A combination of two earlier rows keeps the rank deficient.
                list.Add(list[random.Next(list.Count)].Combine(new Fraction(random.Next(-3, 4), 2), list[random.Next(list.Count)], new Fraction(random.Next(1, 4))));
                continue;
            }

            list.Add(SparseVector.Create([.. Enumerable.Range(0, perRow).Select(_ => (random.Next(columns), new Fraction(random.Next(-4, 5), random.Next(1, 3))))]));
        }

        return list;
    }

    [Fact]
    public void Of_EqualsDenseFractionElimination_OnRandomSparseMatrices()
    {
        var random = new Random(7);
        for (int t = 0; t < 300; t++)
        {
            // Given random sparse rational rows, some of them combinations of others
            int columns = random.Next(1, 12);
            List<SparseVector> rows = RandomRows(random, random.Next(0, 20), columns, random.Next(1, 4));

            // When ranked modulo random primes, incrementally over ℚ and densely over ℚ
            var echelon = new ExactEchelon();
            int incremental = rows.Count(v => echelon.Add(v));

            // Then all three agree
            int dense = DenseRank(rows, columns);
            Assert.Equal(dense, ExactRank.Of(rows));
            Assert.Equal(dense, incremental);
        }
    }

    [Fact]
    public void NullSpace_HasCountMinusRankIntegerRelations_ThatVanish()
    {
        var random = new Random(11);
        for (int t = 0; t < 100; t++)
        {
            List<SparseVector> rows = RandomRows(random, random.Next(1, 15), random.Next(1, 8), 2);
            NullSpaceResult ns = NullSpace.Of(rows);
            Assert.False(ns.TooLarge);
            Assert.Equal(rows.Count - ns.Rank, ns.Basis.Count);
            foreach (SparseVector relation in ns.Basis)
            {
                SparseVector sum = relation.Entries.Aggregate(SparseVector.Zero, (acc, e) => acc + e.Value * rows[e.Key]);
                Assert.True(sum.IsZero);
                Assert.True(relation.Values.ToArray().All(f => f.Denominator.IsOne));
                Assert.True(relation.Values[0] > Fraction.Zero);
            }
        }
    }

    [Fact]
    public void NullSpace_ReportsTooLarge_WhenTheEntryLimitIsExceeded()
    {
        List<SparseVector> rows = RandomRows(new Random(3), 50, 10, 3);
        Assert.True(NullSpace.Of(rows, maxStoredEntries: 5).TooLarge);
    }

    [Fact]
    public void ExactSolve_FindsUniqueFactors_AndRejectsDependentVectors()
    {
        // Given x = (1, 1) and y = (0, 2) and target (1, 5)
        SparseVector x = SparseVector.Create((0, 1), (1, 1));
        SparseVector y = SparseVector.Create((1, new Fraction(2)));
        Assert.True(ExactSolve.TryUnique([x, y], SparseVector.Create((0, 1), (1, 5)), out Fraction[] c));
        Assert.Equal([Fraction.One, new Fraction(2)], c);
        Assert.False(ExactSolve.TryUnique([x, x], x, out _));
    }
}
