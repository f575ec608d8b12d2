using System.Diagnostics;
using System.Globalization;
using PathFinder.Solving;

namespace PathFinder.Benchmarks;

/// <summary>Times the weighted least-squares solver on a seeded random network and prints the figures.</summary>
public static class SolverBenchmark
{
    /// <summary>Builds a random connected system, solves it with each available backend and prints timings and peak memory.</summary>
    /// <param name="output">Where the figures go.</param>
    /// <param name="unknowns">Number of unknowns n.</param>
    /// <param name="observations">Number of observations m.</param>
    /// <param name="seed">Random seed (the same seed gives the same system).</param>
    public static void Run(TextWriter output, int unknowns, int observations, int seed)
    {
        ArgumentNullException.ThrowIfNull(output);
        CultureInfo inv = CultureInfo.InvariantCulture;
        var watch = Stopwatch.StartNew();
        ObservationSystem system = CreateSystem(unknowns, observations, seed);
        output.WriteLine(string.Create(inv, $"solver: n = {unknowns}, m = {observations}, seed = {seed}; system built in {watch.Elapsed.TotalMilliseconds:F0} ms"));
        output.WriteLine(string.Create(inv, $"native OpenBLAS available: {WeightedLeastSquares.IsNativeBackendAvailable} (kernels {WeightedLeastSquares.NativeKernelName ?? "-"})"));

        var backends = new List<LinearAlgebraBackend> { LinearAlgebraBackend.Managed };
        if (WeightedLeastSquares.IsNativeBackendAvailable)
        {
            backends.Insert(0, LinearAlgebraBackend.Native);
        }

        foreach (LinearAlgebraBackend backend in backends)
        {
            var options = new SolverOptions { Backend = backend };
            for (int run = 1; run <= 2; run++)
            {
                GC.Collect();
                long before = GC.GetTotalAllocatedBytes(precise: true);
                watch.Restart();
                LeastSquaresSolution solution = WeightedLeastSquares.Solve(system, options);
                double sum = 0.0;
                for (int j = 0; j < unknowns; j++)
                {
                    sum += solution.StandardUncertainties[j];
                }

                double seconds = watch.Elapsed.TotalSeconds;
                long allocated = GC.GetTotalAllocatedBytes(precise: true) - before;
                output.WriteLine(string.Create(inv,
                    $"  {backend,-7} run {run}: solve incl. all uncertainties and observation diagnostics {seconds * 1000:F0} ms; allocated {allocated / 1e6:F0} MB; rank {solution.Rank}, χ²/dof {solution.ChiSquared / solution.DegreesOfFreedom:F3}, mean u {sum / unknowns:F4}"));
            }
        }

        GC.Collect();
        LeastSquaresSolution native = WeightedLeastSquares.Solve(system);
        watch.Restart();
        QuantityProvenance provenance = native.Provenance(SparseRow.Difference(0, unknowns - 1));
        output.WriteLine(string.Create(inv, $"  provenance of x0 − x{unknowns - 1}: {watch.Elapsed.TotalMilliseconds:F1} ms ({provenance.Contributions.Count} entries)"));
        watch.Restart();
        IReadOnlyList<RemeasurementOption> plans = ExperimentPlanning.Remeasurements(native, SparseRow.Difference(0, unknowns - 1), 0.5);
        output.WriteLine(string.Create(inv, $"  re-measurement planning for the same quantity: {watch.Elapsed.TotalMilliseconds:F1} ms ({plans.Count} options)"));

        ObservationSystem spoiled = Spoil(system, count: 10, seed);
        watch.Restart();
        OutlierResult outliers = OutlierProcedure.Run(spoiled);
        output.WriteLine(string.Create(inv,
            $"  outlier procedure, 10 injected outliers: {watch.Elapsed.TotalMilliseconds:F0} ms, {outliers.Adjustments.Count} adjustments, {outliers.Suspects.Count} suspects, converged {outliers.Converged}"));
        output.WriteLine(string.Create(inv, $"  peak working set of the process: {Process.GetCurrentProcess().PeakWorkingSet64 / 1e6:F0} MB"));
    }

    /// <summary>A chemistry-like random network: anchor rows of one unknown, the rest 2–6 unknowns with small rational coefficients.</summary>
    private static ObservationSystem CreateSystem(int n, int m, int seed)
    {
        var random = new Random(seed);
        double[] truth = Enumerable.Range(0, n).Select(_ => (random.NextDouble() * 800.0) - 400.0).ToArray();
        double[] coefficients = [1.0, -1.0, 2.0, -2.0, 0.5, -0.5, 3.0, -1.5];
        var rows = new List<Observation>(m);
        for (int i = 0; i < m; i++)
        {
            var entries = new List<(int, double)>();
            if (i < n)
            {
                // A chain through every unknown keeps the network connected; every 20th is tied to the references.
                entries.Add((i, 1.0));
                if (i % 20 != 0)
                {
                    entries.Add((i - 1, -1.0));
                }
            }
            else
            {
                int size = 2 + random.Next(5);
                int centre = random.Next(n);
                for (int p = 0; p < size; p++)
                {
                    int j = Math.Clamp(centre + random.Next(-40, 41), 0, n - 1);
                    entries.Add((j, coefficients[random.Next(coefficients.Length)]));
                }
            }

            SparseRow row = SparseRow.Of(entries.ToArray());
            if (row.Count == 0)
            {
                row = SparseRow.Unit(random.Next(n));
            }

            double u = 0.2 + (random.NextDouble() * 4.0);
            double value = row.Dot(truth) + (u * Gaussian(random));
            rows.Add(new Observation(row, value, u));
        }

        return new ObservationSystem(n, rows);
    }

    private static ObservationSystem Spoil(ObservationSystem system, int count, int seed)
    {
        var random = new Random(seed + 1);
        Observation[] rows = system.Observations.ToArray();
        for (int k = 0; k < count; k++)
        {
            int i = random.Next(rows.Length);
            rows[i] = new Observation(rows[i].Row, rows[i].Value + (15.0 * rows[i].Uncertainty), rows[i].Uncertainty);
        }

        return new ObservationSystem(system.UnknownCount, rows);
    }

    private static double Gaussian(Random random)
    {
        double u1 = 1.0 - random.NextDouble();
        double u2 = random.NextDouble();
        return Math.Sqrt(-2.0 * Math.Log(u1)) * Math.Cos(2.0 * Math.PI * u2);
    }
}
