using System.Diagnostics;
using System.Globalization;
using PathFinder.Analysis;
using PathFinder.Chemistry;
using PathFinder.Routes;
using PathFinder.Synthetic;

namespace PathFinder.Benchmarks;

/// <summary>Times route search the way the library is used: generated network → property model → <see cref="RouteAnalysis.Find"/> of formation targets.</summary>
/// <remarks>
/// Each timing is the wall-clock time of one <see cref="RouteAnalysis.Find"/> call, which builds the route network of
/// the model, searches and explains the routes. Targets are formation reactions of species drawn with a fixed seed
/// from the model's unknowns; figures are averaged over the targets and the worst target is shown beside the mean.
/// The first call of the process is made on a throw-away target so JIT compilation is not charged to a target.
/// </remarks>
public static class RouteEndToEndBenchmark
{
    /// <summary>The requirement figures at one size: first route, top 20 up to 4 steps, peak memory.</summary>
    /// <param name="output">Where the detailed figures go.</param>
    /// <param name="species">Number of species.</param>
    /// <param name="measurements">Number of measurements.</param>
    /// <param name="seed">Generator seed.</param>
    /// <param name="targets">Number of formation targets averaged over.</param>
    public static IReadOnlyList<Figure> Run(TextWriter output, int species, int measurements, int seed, int targets = 8)
    {
        ArgumentNullException.ThrowIfNull(output);
        (PropertyModel model, double buildSeconds) = Model(species, measurements, seed);
        Line(output, $"routes: {species} species, {measurements} measurements, seed {seed}; model {model.Unknowns.Count} unknowns, built in {buildSeconds * 1000:F0} ms");
        ChemicalEquation[] chosen = Targets(model, targets, seed);
        MemoryProbe.ResetPeak();
        var watch = Stopwatch.StartNew();
        model.ToRouteNetwork();
        double networkSeconds = watch.Elapsed.TotalSeconds;
        Line(output, $"  route network of the model (built once per model, then shared by every search): {networkSeconds * 1000:F0} ms");
        RouteAnalysis.Find(model, ChemicalEquation.Formation(model.Unknowns[0]), new RouteSearchOptions { MaxSteps = 3, StopAfter = 1, TimeBudget = TimeSpan.FromSeconds(5) });

        var first = new List<double>();
        var top = new List<double>();
        var firstCpu = new List<double>();
        var topCpu = new List<double>();
        foreach (ChemicalEquation target in chosen)
        {
            (RouteReport firstReport, double firstSeconds, double firstCpuSeconds) = Find(model, target, new RouteSearchOptions { MaxSteps = 6, MaxRoutes = 1, StopAfter = 1, TimeBudget = TimeSpan.FromSeconds(10) });
            (RouteReport topReport, double topSeconds, double topCpuSeconds) = Find(model, target, new RouteSearchOptions { MaxSteps = 4, MaxRoutes = 20, TimeBudget = TimeSpan.FromSeconds(10) });
            first.Add(firstSeconds);
            top.Add(topSeconds);
            firstCpu.Add(firstCpuSeconds);
            topCpu.Add(topCpuSeconds);
            Line(output, $"  {target,-58} first route {firstSeconds * 1000,6:F0} ms ({Steps(firstReport)}); top 20 ≤ 4 steps {topSeconds * 1000,6:F0} ms ({topReport.RoutesFound} routes found, cut {topReport.Cut}, best ±{Best(topReport)})");
        }

        double peak = MemoryProbe.PeakMegabytes();
        Line(output, $"  first route: mean {first.Average() * 1000:F0} ms, worst {first.Max() * 1000:F0} ms; top 20 ≤ 4 steps: mean {top.Average() * 1000:F0} ms, worst {top.Max() * 1000:F0} ms (wall)");
        Line(output, $"  process CPU time: first route mean {firstCpu.Average() * 1000:F0} ms, worst {firstCpu.Max() * 1000:F0} ms; top 20 mean {topCpu.Average() * 1000:F0} ms, worst {topCpu.Max() * 1000:F0} ms; load average {CheckSolveBenchmark.LoadAverage():F1}");
        Line(output, $"  peak resident memory during the searches: {peak:F0} MB{(MemoryProbe.CanReset ? " (peak reset after building the model)" : " (process-wide peak)")}; now {MemoryProbe.CurrentMegabytes():F0} MB");
        string size = string.Create(CultureInfo.InvariantCulture, $"{species}/{measurements}");
        return
        [
            Figure.Seconds($"first route, formation target, {size} (worst of {chosen.Length})", first.Max(), 0.5),
            Figure.Info("  same, plus the one-off route network build of a fresh model", string.Create(CultureInfo.InvariantCulture, $"{first.Max() + networkSeconds:0.000} s")),
            Figure.Seconds($"top 20 routes ≤ 4 steps, {size} (worst of {chosen.Length})", top.Max(), 2.0),
            Figure.Info("  same two, process CPU time (mean / worst)", string.Create(CultureInfo.InvariantCulture, $"first {firstCpu.Average():0.000} / {firstCpu.Max():0.000} s, top 20 {topCpu.Average():0.000} / {topCpu.Max():0.000} s")),
            Figure.Megabytes($"peak memory of route search, {size}", peak, 300),
        ];
    }

    /// <summary>How time grows with network size and with the step bound, averaged over formation targets.</summary>
    /// <param name="output">Where the table goes.</param>
    /// <param name="sizes">Species counts; each has 15 measurements per species.</param>
    /// <param name="seed">Generator seed.</param>
    /// <param name="targets">Number of formation targets averaged over.</param>
    /// <param name="budget">Time budget of each full enumeration in the step-bound sweep.</param>
    public static IReadOnlyList<Figure> Scaling(TextWriter output, IReadOnlyList<int> sizes, int seed, int targets, TimeSpan budget)
    {
        ArgumentNullException.ThrowIfNull(output);
        ArgumentNullException.ThrowIfNull(sizes);
        var figures = new List<Figure>();
        Line(output, $"route scaling with network size ({targets} formation targets each; mean / worst wall time of RouteAnalysis.Find):");
        Line(output, $"  {"species/measurements",-22} {"model build",12} {"first route",20} {"top 20 ≤ 4 steps",20} {"routes found (mean)",20}");
        PropertyModel? largest = null;
        int largestSize = 0;
        foreach (int species in sizes)
        {
            int measurements = species * 15;
            (PropertyModel model, double buildSeconds) = Model(species, measurements, seed);
            ChemicalEquation[] chosen = Targets(model, targets, seed);
            RouteAnalysis.Find(model, ChemicalEquation.Formation(model.Unknowns[0]), new RouteSearchOptions { MaxSteps = 3, StopAfter = 1, TimeBudget = TimeSpan.FromSeconds(5) });
            var first = new List<double>();
            var top = new List<double>();
            var found = new List<long>();
            foreach (ChemicalEquation target in chosen)
            {
                first.Add(Find(model, target, new RouteSearchOptions { MaxSteps = 6, MaxRoutes = 1, StopAfter = 1, TimeBudget = TimeSpan.FromSeconds(10) }).Seconds);
                (RouteReport report, double seconds, _) = Find(model, target, new RouteSearchOptions { MaxSteps = 4, MaxRoutes = 20, TimeBudget = TimeSpan.FromSeconds(10) });
                top.Add(seconds);
                found.Add(report.RoutesFound);
            }

            string size = string.Create(CultureInfo.InvariantCulture, $"{species}/{measurements}");
            Line(output, $"  {size,-22} {buildSeconds * 1000,9:F0} ms {first.Average() * 1000,8:F1} / {first.Max() * 1000,6:F1} ms {top.Average() * 1000,8:F1} / {top.Max() * 1000,6:F1} ms {found.Average(),20:F0}");
            figures.Add(Figure.Info($"scaling {size}: first route / top 20 ≤ 4 steps (mean)", string.Create(CultureInfo.InvariantCulture, $"{first.Average() * 1000:F0} ms / {top.Average() * 1000:F0} ms")));
            if (species >= largestSize)
            {
                largest = model;
                largestSize = species;
            }
        }

        if (largest is null)
        {
            return figures;
        }

        ChemicalEquation[] sweepTargets = Targets(largest, targets, seed);
        Line(output, $"route search with the step bound, {largestSize} species ({sweepTargets.Length} targets, full enumeration of all routes, top 20 kept, budget {budget.TotalSeconds:F0} s each):");
        Line(output, $"  {"max steps",10} {"mean time",12} {"worst time",12} {"routes found (mean)",20} {"hit the budget",15}");
        for (int steps = 3; steps <= 6; steps++)
        {
            var times = new List<double>();
            var found = new List<long>();
            int cut = 0;
            foreach (ChemicalEquation target in sweepTargets)
            {
                (RouteReport report, double seconds, _) = Find(largest, target, new RouteSearchOptions { MaxSteps = steps, MaxRoutes = 20, TimeBudget = budget });
                times.Add(seconds);
                found.Add(report.RoutesFound);
                cut += report.Cut.HasFlag(SearchCut.TimeBudget) ? 1 : 0;
            }

            Line(output, $"  {steps,10} {times.Average() * 1000,9:F0} ms {times.Max() * 1000,9:F0} ms {found.Average(),20:F0} {cut,8} of {sweepTargets.Length}");
            figures.Add(Figure.Info($"step bound {steps}, {largestSize} species: full enumeration (mean)", string.Create(CultureInfo.InvariantCulture, $"{times.Average() * 1000:F0} ms, {found.Average():F0} routes, {cut}/{sweepTargets.Length} at budget")));
        }

        return figures;
    }

    private static (PropertyModel Model, double Seconds) Model(int species, int measurements, int seed)
    {
        SyntheticNetwork synthetic = SyntheticNetworkGenerator.Generate(new SyntheticNetworkOptions { SpeciesCount = species, MeasurementCount = measurements, Seed = seed });
        var watch = Stopwatch.StartNew();
        PropertyModel model = PropertyModel.Build(synthetic.Network, PropertyFamily.Enthalpy);
        return (model, watch.Elapsed.TotalSeconds);
    }

    /// <summary>Formation targets of species drawn with a fixed seed from the unknowns (the same draw for a given model and seed).</summary>
    private static ChemicalEquation[] Targets(PropertyModel model, int count, int seed)
    {
        var random = new Random(seed + 1000);
        return Enumerable.Range(0, model.Unknowns.Count)
            .OrderBy(_ => random.Next())
            .Take(Math.Min(count, model.Unknowns.Count))
            .Select(index => ChemicalEquation.Formation(model.Unknowns[index]))
            .ToArray();
    }

    private static (RouteReport Report, double Seconds, double CpuSeconds) Find(PropertyModel model, ChemicalEquation target, RouteSearchOptions options)
    {
        TimeSpan cpu = CheckSolveBenchmark.Cpu();
        var watch = Stopwatch.StartNew();
        RouteReport report = RouteAnalysis.Find(model, target, options);
        return (report, watch.Elapsed.TotalSeconds, (CheckSolveBenchmark.Cpu() - cpu).TotalSeconds);
    }

    private static string Steps(RouteReport report) => report.Routes.Count > 0 ? $"{report.Routes[0].Steps.Count} steps" : "no route";

    private static string Best(RouteReport report) => report.Routes.Count > 0 ? report.Routes[0].Uncertainty.ToString("0.##", CultureInfo.InvariantCulture) + " kJ/mol" : "–";

    private static void Line(TextWriter output, FormattableString text) => output.WriteLine(text.ToString(CultureInfo.InvariantCulture));
}
