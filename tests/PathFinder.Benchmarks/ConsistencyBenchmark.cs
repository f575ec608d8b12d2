using System.Diagnostics;
using System.Globalization;
using PathFinder.Analysis;
using PathFinder.Solving;
using PathFinder.Synthetic;

namespace PathFinder.Benchmarks;

/// <summary>Times the consistency check (solve plus suspect procedure) on a generated network with known outliers.</summary>
public static class ConsistencyBenchmark
{
    /// <summary>Generates a network with 2 % outliers of 8–30 σ, solves it, runs the suspect procedure and prints timings and quality.</summary>
    /// <param name="output">Where the figures go.</param>
    /// <param name="species">Number of species.</param>
    /// <param name="measurements">Number of measurements.</param>
    /// <param name="seed">Generator seed.</param>
    /// <param name="runs">How often the procedure is run (the fastest run is reported too: this machine's speed drifts).</param>
    public static void Run(TextWriter output, int species, int measurements, int seed, int runs = 2)
    {
        ArgumentNullException.ThrowIfNull(output);
        CultureInfo inv = CultureInfo.InvariantCulture;
        SyntheticNetwork synthetic = SyntheticNetworkGenerator.Generate(new SyntheticNetworkOptions
        {
            SpeciesCount = species,
            MeasurementCount = measurements,
            Seed = seed,
            OutlierFraction = 0.02,
        });
        output.WriteLine(string.Create(inv, $"consistency: {species} species, {measurements} measurements, seed {seed}, {synthetic.OutlierIds.Count} injected outliers"));
        output.WriteLine(string.Create(inv, $"  native OpenBLAS available: {WeightedLeastSquares.IsNativeBackendAvailable} (kernels {WeightedLeastSquares.NativeKernelName ?? "-"})"));

        var watch = Stopwatch.StartNew();
        PropertyModel model = PropertyModel.Build(synthetic.Network, PropertyFamily.Enthalpy);
        // Measurements whose species all cancel (the generator can emit one) carry no information: leave them out.
        int[] kept = Enumerable.Range(0, model.Measurements.Count).Where(i => !model.Vectors[i].IsZero).ToArray();
        var system = new ObservationSystem(
            model.Unknowns.Count,
            kept.Select(i => new Observation(PropertyModel.RowOf(model.Vectors[i]), model.Measurements[i].Value, model.Measurements[i].Uncertainty)));
        double buildMs = watch.Elapsed.TotalMilliseconds;
        output.WriteLine(string.Create(inv, $"  model build: {buildMs:F0} ms ({system.UnknownCount} unknowns, {system.ObservationCount} observations; {model.Measurements.Count - kept.Length} measurements without unknowns left out)"));

        double birgeBefore = double.NaN;
        double solveMs = double.NaN;
        for (int run = 1; run <= 2; run++)
        {
            GC.Collect();
            TimeSpan cpu = Process.GetCurrentProcess().TotalProcessorTime;
            watch.Restart();
            LeastSquaresSolution solution = WeightedLeastSquares.Solve(system);
            double sum = 0.0;
            for (int j = 0; j < solution.UnknownCount; j++)
            {
                sum += solution.StandardUncertainties[j];
            }

            solveMs = watch.Elapsed.TotalMilliseconds;
            birgeBefore = solution.BirgeRatio;
            output.WriteLine(string.Create(inv,
                $"  solve incl. all uncertainties and diagnostics (run {run}): {solveMs:F0} ms (process CPU {CpuSince(cpu):F0} ms); Birge ratio {solution.BirgeRatio:F3}, mean u {sum / solution.UnknownCount:F4}"));
        }

        double fastest = double.PositiveInfinity;
        for (int run = 1; run <= runs; run++)
        {
            GC.Collect();
            TimeSpan cpu = Process.GetCurrentProcess().TotalProcessorTime;
            watch.Restart();
            OutlierResult result = OutlierProcedure.Run(system);
            double procedureMs = watch.Elapsed.TotalMilliseconds;
            fastest = Math.Min(fastest, procedureMs);
            double procedureCpu = CpuSince(cpu);
            var suspects = result.Suspects.Select(s => model.Measurements[kept[s.ObservationIndex]].Id).ToHashSet(StringComparer.Ordinal);
            int truePositives = suspects.Count(synthetic.OutlierIds.Contains);
            double recall = synthetic.OutlierIds.Count == 0 ? double.NaN : (double)truePositives / synthetic.OutlierIds.Count;
            double precision = suspects.Count == 0 ? double.NaN : (double)truePositives / suspects.Count;
            output.WriteLine(string.Create(inv,
                $"  suspect procedure incl. its own initial solve (run {run}): {procedureMs:F0} ms (process CPU {procedureCpu:F0} ms), about {procedureMs - solveMs:F0} ms on top of the solve"));
            output.WriteLine(string.Create(inv,
                $"    {result.Adjustments.Count} adjustments ({result.Adjustments.Select(a => a.ObservationIndex).Distinct().Count()} measurements), {result.Suspects.Count} suspects at |z| > {result.CriticalValue:F2} (m = {result.CheckableCount}), converged {result.Converged}"));
            output.WriteLine(string.Create(inv,
                $"    recall {recall:P1} and precision {precision:P1} against all injected outliers; Birge ratio before {birgeBefore:F3}, after {result.Solution.BirgeRatio:F3}"));
        }

        output.WriteLine(string.Create(inv, $"  fastest of {runs} procedure runs: {fastest:F0} ms"));
        output.WriteLine(string.Create(inv, $"  peak working set of the process: {Process.GetCurrentProcess().PeakWorkingSet64 / 1e6:F0} MB"));
    }

    private static double CpuSince(TimeSpan start) => (Process.GetCurrentProcess().TotalProcessorTime - start).TotalMilliseconds;
}
