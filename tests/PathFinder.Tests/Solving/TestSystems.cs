using MathNet.Numerics.LinearAlgebra;
using PathFinder.Solving;

namespace PathFinder.Tests.Solving;

/// <summary>Seeded random systems and a dense reference solver (MathNet QR of √W·A) for the solver tests.</summary>
internal static class TestSystems
{
    private static readonly double[] s_coefficients = [1.0, -1.0, 2.0, -2.0, 0.5, -0.5];

    /// <summary>A connected full-rank system: x0 anchored, a chain xⱼ − xⱼ₋₁, then random rows of 1–4 unknowns.</summary>
    public static ObservationSystem RandomFullRank(int seed, int unknowns, int extraRows, double noise = 1.0)
    {
        var random = new Random(seed);
        double[] truth = Enumerable.Range(0, unknowns).Select(_ => (random.NextDouble() * 200.0) - 100.0).ToArray();
        var rows = new List<Observation>();
        for (int j = 0; j < unknowns; j++)
        {
            SparseRow row = j == 0 ? SparseRow.Unit(0) : SparseRow.Difference(j, j - 1);
            rows.Add(Measure(row, truth, random, noise));
        }

        for (int k = 0; k < extraRows; k++)
        {
            int size = 1 + random.Next(4);
            var entries = new (int, double)[size];
            for (int p = 0; p < size; p++)
            {
                entries[p] = (random.Next(unknowns), s_coefficients[random.Next(s_coefficients.Length)]);
            }

            SparseRow row = SparseRow.Of(entries);
            if (row.Count > 0)
            {
                rows.Add(Measure(row, truth, random, noise));
            }
        }

        return new ObservationSystem(unknowns, rows);
    }

    /// <summary>An observation of row·truth with a random uncertainty in [0.5, 3] and Gaussian noise of noise·u.</summary>
    public static Observation Measure(SparseRow row, double[] truth, Random random, double noise)
    {
        double u = 0.5 + (random.NextDouble() * 2.5);
        return new Observation(row, row.Dot(truth) + (noise * u * Gaussian(random)), u);
    }

    public static double Gaussian(Random random)
    {
        double u1 = 1.0 - random.NextDouble();
        double u2 = random.NextDouble();
        return Math.Sqrt(-2.0 * Math.Log(u1)) * Math.Cos(2.0 * Math.PI * u2);
    }

    /// <summary>Dense reference for a full-rank system: x̂ by QR of √W·A, covariance (AᵀWA)⁻¹.</summary>
    public static (Vector<double> Values, Matrix<double> Covariance) DenseReference(ObservationSystem system)
    {
        int m = system.ObservationCount;
        int n = system.UnknownCount;
        Matrix<double> aw = Matrix<double>.Build.Dense(m, n);
        Vector<double> vw = Vector<double>.Build.Dense(m);
        for (int i = 0; i < m; i++)
        {
            Observation o = system.Observations[i];
            double sw = 1.0 / o.Uncertainty;
            for (int p = 0; p < o.Row.Count; p++)
            {
                aw[i, o.Row.Indices[p]] = sw * o.Row.Coefficients[p];
            }

            vw[i] = sw * o.Value;
        }

        Vector<double> x = aw.QR().Solve(vw);
        Matrix<double> covariance = aw.TransposeThisAndMultiply(aw).Inverse();
        return (x, covariance);
    }
}
