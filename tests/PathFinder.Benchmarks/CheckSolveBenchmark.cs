using System.Diagnostics;
using System.Globalization;
using PathFinder.Analysis;
using PathFinder.Cli;
using PathFinder.Cli.Commands;
using PathFinder.Cli.Output;
using PathFinder.Routes;
using PathFinder.Solving;
using PathFinder.Synthetic;

namespace PathFinder.Benchmarks;

/// <summary>Times <c>pathfinder solve --no-adjust</c> and <c>pathfinder check</c> end to end through the real command code, CSV reading included.</summary>
/// <remarks>
/// The generated network is written to a temporary folder with <see cref="SyntheticNetworkGenerator.Write"/> and the
/// commands run as the CLI runs them (<see cref="SolveCommand.Run"/>, <see cref="CheckCommand.Run"/>) with output
/// discarded. The first run of each command in the process is "first in process": it includes JIT compilation of
/// the command's code, but the generator has already warmed the shared chemistry code, and check runs after solve.
/// The figures a user sees (a fresh process of the published CLI, start to exit) come from
/// <c>tests/PathFinder.Benchmarks/end-to-end.sh</c>, which the targets are judged on; this case shows the steps
/// (a breakdown repeats them one by one, warm) so the slow part is visible.
/// </remarks>
public static class CheckSolveBenchmark
{
    /// <summary>Runs the benchmark and returns the figures.</summary>
    /// <param name="output">Where the detailed figures go.</param>
    /// <param name="species">Number of species.</param>
    /// <param name="measurements">Number of measurements.</param>
    /// <param name="seed">Generator seed.</param>
    /// <param name="outlierFraction">Fraction of measurements given a gross error.</param>
    public static IReadOnlyList<Figure> Run(TextWriter output, int species, int measurements, int seed, double outlierFraction = 0.02)
    {
        ArgumentNullException.ThrowIfNull(output);
        string folder = Path.Combine(Path.GetTempPath(), "pathfinder-bench-" + Guid.NewGuid().ToString("N"));
        try
        {
            SyntheticNetwork synthetic = SyntheticNetworkGenerator.Generate(new SyntheticNetworkOptions
            {
                SpeciesCount = species,
                MeasurementCount = measurements,
                Seed = seed,
                OutlierFraction = outlierFraction,
            });
            SyntheticNetworkGenerator.Write(synthetic, folder);
            long bytes = new FileInfo(Path.Combine(folder, "measurements.csv")).Length;
            Line(output, $"check/solve: {species} species, {measurements} measurements, seed {seed}, {synthetic.OutlierIds.Count} injected outliers; CSV {bytes / 1e6:F1} MB in {folder}");
            Line(output, $"  native OpenBLAS available: {WeightedLeastSquares.IsNativeBackendAvailable} (kernels {WeightedLeastSquares.NativeKernelName ?? "-"}); {Environment.ProcessorCount} logical cores");
            synthetic = null!;
            return Measure(output, folder);
        }
        finally
        {
            try
            {
                Directory.Delete(folder, recursive: true);
            }
            catch (IOException)
            {
                // A leftover temp folder is harmless.
            }
        }
    }

    private static List<Figure> Measure(TextWriter output, string folder)
    {
        var figures = new List<Figure>();
        var context = new CommandContext(TextWriter.Null, TextWriter.Null);

        MemoryProbe.ResetPeak();
        TimeSpan cpu = Cpu();
        double solveCold = Time(() => Expect(SolveCommand.Run(folder, "dH", noAdjust: true, threshold: 2.0, format: "table", skipInvalid: false, context), ExitCodes.Success));
        double solvePeak = MemoryProbe.PeakMegabytes();
        double solveCpu = (Cpu() - cpu).TotalSeconds;
        Line(output, $"  solve --no-adjust, first in process (JIT included; generator ran before): {solveCold * 1000:F0} ms (CPU {solveCpu * 1000:F0} ms); peak resident {solvePeak:F0} MB{ResetNote()}; load average {LoadAverage():F1}");

        MemoryProbe.ResetPeak();
        cpu = Cpu();
        int checkExit = -1;
        double checkCold = Time(() => checkExit = CheckCommand.Run(folder, threshold: 2.0, inflation: 2.0, maxCycle: 6, showCycles: 10, json: false, skipInvalid: false, context));
        double checkPeak = MemoryProbe.PeakMegabytes();
        double checkCpu = (Cpu() - cpu).TotalSeconds;
        Line(output, $"  check, first in process (after solve): {checkCold * 1000:F0} ms (CPU {checkCpu * 1000:F0} ms, exit {checkExit}); peak resident {checkPeak:F0} MB{ResetNote()}; load average {LoadAverage():F1}");

        double solveWarm = Time(() => SolveCommand.Run(folder, "dH", noAdjust: true, threshold: 2.0, format: "table", skipInvalid: false, context));
        double checkWarm = Time(() => CheckCommand.Run(folder, threshold: 2.0, inflation: 2.0, maxCycle: 6, showCycles: 10, json: false, skipInvalid: false, context));
        Line(output, $"  warm repeats: solve --no-adjust {solveWarm * 1000:F0} ms, check {checkWarm * 1000:F0} ms");

        Breakdown(output, folder, context);

        figures.Add(Figure.Seconds("solve --no-adjust in process (end to end: end-to-end.sh)", solveCold, 1.5));
        figures.Add(Figure.Seconds("check in process (end to end: end-to-end.sh)", checkCold, 3.0));
        figures.Add(Figure.Info("  same, process CPU time (less sensitive to a loaded machine)", string.Create(CultureInfo.InvariantCulture, $"solve {solveCpu:0.000} s, check {checkCpu:0.000} s")));
        figures.Add(Figure.Megabytes("peak memory of solve", solvePeak, 500));
        figures.Add(Figure.Megabytes("peak memory of check", checkPeak, 500));
        return figures;
    }

    private static void Breakdown(TextWriter output, string folder, CommandContext context)
    {
        var options = new ConsistencyOptions();
        var clock = new StageClock();
        AnalysisSession session = AnalysisSession.Open(folder, context, skipInvalid: false, out _) ?? throw new InvalidOperationException("the generated data did not load");
        string read = clock.Lap();
        ThermoModel model = ThermoModel.Build(session.Network, session.HeatCapacities, session.Systematics);
        string build = clock.Lap();
        ObservationSystem system = model.ToObservationSystem();
        string toSystem = clock.Lap();
        LeastSquaresSolution asGiven = WeightedLeastSquares.Solve(system);
        string solve = clock.Lap();
        SolveReport solveReport = NetworkSolver.Report(new JointSolution(model, asGiven, false, [], []), PropertyFamily.Enthalpy)!;
        SolveOutput.Write(TextWriter.Null, solveReport, "table");
        string solveOutput = clock.Lap();
        OutlierResult outliers = OutlierProcedure.Run(system, new OutlierOptions { Threshold = options.Threshold, InflationFactor = options.InflationFactor });
        string suspects = clock.Lap();
        RouteNetwork routes = model.ToRouteNetwork();
        string routeNetwork = clock.Lap();
        CycleSearchResult cycles = FindCycles.In(routes, new CycleSearchOptions { MaxSize = options.MaxCycleSize, MaxCycles = options.MaxCycles, TimeBudget = options.CycleTimeBudget, WorkBudget = options.CycleWorkBudget });
        string cycleSearch = clock.Lap();
        ConsistencyReport report = ConsistencyCheck.Run(session.Network, session.HeatCapacities, options);
        string wholeAnalysis = clock.Lap();
        CheckOutput.WriteText(TextWriter.Null, report, 10);
        string checkOutput = clock.Lap();

        Line(output, $"  breakdown (warm, steps of the commands run one by one; wall time, then process CPU time over all threads):");
        Line(output, $"    read CSV + curation               {read} ({session.Network.Measurements.Count} measurements)");
        Line(output, $"    model build                       {build} ({model.Unknowns.Count} unknowns)");
        Line(output, $"    observation system                {toSystem}");
        Line(output, $"    solve incl. all uncertainties     {solve} (backend {asGiven.BackendUsed}, {asGiven.ComponentCount} components, Birge ratio {asGiven.BirgeRatio:F2})");
        Line(output, $"    solve report + table output       {solveOutput}");
        Line(output, $"    suspect procedure                 {suspects} ({outliers.Adjustments.Count} adjustments, {outliers.Suspects.Count} suspects; its own initial factorization included)");
        Line(output, $"    route network for cycles          {routeNetwork}");
        Line(output, $"    cycle search ({options.CycleWorkBudget / 1000}k steps)         {cycleSearch} ({cycles.CyclesFound} cycles found, cut {cycles.Cut}, {cycles.IndependentCycleCount} independent)");
        Line(output, $"    ConsistencyCheck.Run as a whole   {wholeAnalysis} (model + solve + suspects + cycles + cross check)");
        Line(output, $"    check text output                 {checkOutput}");
    }

    /// <summary>Wall and process CPU time between laps.</summary>
    private sealed class StageClock
    {
        private readonly Stopwatch _watch = Stopwatch.StartNew();
        private TimeSpan _cpu = Cpu();
        private long _allocated = GC.GetTotalAllocatedBytes();
        private int _fullCollections = GC.CollectionCount(2);

        public string Lap()
        {
            double wall = _watch.Elapsed.TotalMilliseconds;
            TimeSpan cpu = Cpu();
            double used = (cpu - _cpu).TotalMilliseconds;
            long allocated = GC.GetTotalAllocatedBytes();
            int fullCollections = GC.CollectionCount(2);
            string text = string.Create(CultureInfo.InvariantCulture, $"{wall,7:F0} ms (CPU {used,6:F0} ms, {(allocated - _allocated) / 1e6,4:F0} MB allocated, {fullCollections - _fullCollections} full GC)");
            _cpu = cpu;
            _allocated = allocated;
            _fullCollections = fullCollections;
            _watch.Restart();
            return text;
        }
    }

    /// <summary>The process's CPU time over all threads so far.</summary>
    internal static TimeSpan Cpu()
    {
        using Process process = Process.GetCurrentProcess();
        return process.TotalProcessorTime;
    }

    /// <summary>The 1-minute load average, or NaN where it cannot be read (the machine is shared; figures inflate with load).</summary>
    internal static double LoadAverage()
    {
        try
        {
            return double.Parse(File.ReadAllText("/proc/loadavg").Split(' ')[0], CultureInfo.InvariantCulture);
        }
        catch (Exception exception) when (exception is IOException or UnauthorizedAccessException or FormatException)
        {
            return double.NaN;
        }
    }

    private static void Expect(int actual, int expected)
    {
        if (actual != expected)
        {
            throw new InvalidOperationException($"the command returned exit code {actual}, expected {expected}");
        }
    }

    private static string ResetNote() => MemoryProbe.CanReset ? " (peak reset before the run)" : " (process-wide peak: reset not supported here)";

    private static double Time(Action action)
    {
        var watch = Stopwatch.StartNew();
        action();
        return watch.Elapsed.TotalSeconds;
    }

    private static void Line(TextWriter output, FormattableString text) => output.WriteLine(text.ToString(CultureInfo.InvariantCulture));
}
