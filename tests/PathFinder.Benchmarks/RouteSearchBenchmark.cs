using System.Diagnostics;
using System.Globalization;
using Fractions;
using PathFinder.Algebra;
using PathFinder.Routes;

namespace PathFinder.Benchmarks;

/// <summary>Times route search, cycle counting and exact rank on a random chemistry-shaped network.</summary>
/// <remarks>
/// The network: species in families of 8 (most reactions stay inside a family, a fifth bridge two neighbouring
/// families), 2–4 species per reaction, coefficients 1–3 and ½; each distinct reaction is measured 1–5 times, some
/// reversed or doubled, with random values and uncertainties. Fully random reactions over 2,000 species almost never
/// close short routes, which is not what thermochemical networks look like.
/// </remarks>
public static class RouteSearchBenchmark
{
    /// <summary>Runs the benchmark and prints figures to <paramref name="output"/>.</summary>
    public static void Run(TextWriter output, int species = 2000, int measurements = 30000, int seed = 1)
    {
        ArgumentNullException.ThrowIfNull(output);
        var random = new Random(seed);
        (List<SparseVector> vectors, List<double> values, List<double> uncertainties) = Generate(random, species, measurements);
        var clock = Stopwatch.StartNew();
        RouteNetwork network = RouteNetwork.Create(vectors, values, uncertainties);
        Line(output, $"network: {species} species, {measurements} measurements, {network.ClassCount} classes; prepared in {clock.Elapsed.TotalMilliseconds:F0} ms");

        clock.Restart();
        int rank = ExactRank.Of(vectors);
        Line(output, $"exact rank (2 primes): {rank} in {clock.Elapsed.TotalMilliseconds:F0} ms; independent cycles = {measurements - rank}");

        // Formation target: the most connected species of family 3; a two-species target inside family 5.
        int x = Enumerable.Range(24, 8).OrderByDescending(s => vectors.Count(v => v.Contains(s))).First();
        SparseVector formation = SparseVector.Unit(x, Fraction.One);
        SparseVector pair = SparseVector.Create((40, -1), (41, 1));
        foreach ((string name, SparseVector target) in new[] { ("formation {X:1}", formation), ("two-species {A:-1, B:1}", pair) })
        {
            RouteSearchResult first = FindRoutes.To(network, target, new RouteSearchOptions { MaxSteps = 6, StopAfter = 1, MaxRoutes = 1, TimeBudget = TimeSpan.FromSeconds(10) });
            Line(output, $"{name}: first route after {Ms(first.FirstRouteElapsed)} ms ({(first.Routes.Count > 0 ? first.Routes[0].Steps : 0)} steps)");
            RouteSearchResult top = FindRoutes.To(network, target, new RouteSearchOptions { MaxSteps = 4, MaxRoutes = 20, TimeBudget = TimeSpan.FromSeconds(30) });
            Line(output, $"{name}: top 20 with MaxSteps 4 in {top.Elapsed.TotalMilliseconds:F0} ms, {top.RoutesFound} routes found, cut = {top.Cut}, best u = {(top.Routes.Count > 0 ? top.Routes[0].Uncertainty : double.NaN):G4}, independent = {top.IndependentRouteCount}, certified = {top.ExactnessCertified}");
            for (int steps = 3; steps <= 6; steps++)
            {
                RouteSearchResult all = FindRoutes.To(network, target, new RouteSearchOptions { MaxSteps = steps, MaxRoutes = 20, TimeBudget = TimeSpan.FromSeconds(10) });
                Line(output, $"{name}: full enumeration MaxSteps {steps}: {all.RoutesFound} routes in {all.Elapsed.TotalMilliseconds:F0} ms, cut = {all.Cut}");
            }
        }

        CompleteGraph(output, 200, 1_000_000);

        Process process = Process.GetCurrentProcess();
        process.Refresh();
        Line(output, $"peak working set: {process.PeakWorkingSet64 / (1024.0 * 1024.0):F0} MB; GC heap now {GC.GetTotalMemory(false) / (1024.0 * 1024.0):F0} MB");
    }

    /// <summary>Issue 13: on a complete graph (every pair of species joined), a larger step bound must not find fewer routes within the same work budget.</summary>
    private static void CompleteGraph(TextWriter output, int species, long workBudget)
    {
        var random = new Random(7);
        var vectors = new List<SparseVector>();
        for (int a = 0; a < species; a++)
        {
            for (int b = a + 1; b < species; b++)
            {
                vectors.Add(SparseVector.Create((a, -1), (b, 1)));
            }
        }

        RouteNetwork network = RouteNetwork.Create(vectors, [.. vectors.Select(_ => (random.NextDouble() * 200) - 100)], [.. vectors.Select(_ => 0.1 + random.NextDouble())]);
        SparseVector target = SparseVector.Create((0, -1), (1, 1));
        foreach (int steps in new[] { 4, 6 })
        {
            RouteSearchResult result = FindRoutes.To(network, target, new RouteSearchOptions { MaxSteps = steps, MaxRoutes = 20, WorkBudget = workBudget });
            Line(output, $"complete graph of {species} species ({vectors.Count} measurements), max steps {steps}, work budget {workBudget}: {result.RoutesFound} routes in {result.Elapsed.TotalMilliseconds:F0} ms, complete up to {result.CompleteUpToSteps} steps, cut = {result.Cut}");
        }
    }

    private static string Ms(TimeSpan? t) => t is { } v ? v.TotalMilliseconds.ToString("F1", CultureInfo.InvariantCulture) : "none";

    private static void Line(TextWriter output, FormattableString text) => output.WriteLine(text.ToString(CultureInfo.InvariantCulture));

    private static (List<SparseVector>, List<double>, List<double>) Generate(Random random, int species, int measurements)
    {
        const int family = 8;
        int families = Math.Max(1, species / family);
        Fraction[] coefficients = [new(1), new(1), new(1), new(2), new(3), new(1, 2)];
        var vectors = new List<SparseVector>(measurements);
        var values = new List<double>(measurements);
        var uncertainties = new List<double>(measurements);
        while (vectors.Count < measurements)
        {
            int f = random.Next(families);
            int g = random.NextDouble() < 0.2 ? (f + 1) % families : f;
            int count = random.Next(2, 5);
            var entries = new List<(int, Fraction)>();
            var used = new HashSet<int>();
            for (int k = 0; k < count; k++)
            {
                int s = ((k % 2 == 0 ? f : g) * family) + random.Next(family);
                if (used.Add(s))
                {
                    Fraction c = coefficients[random.Next(coefficients.Length)];
                    entries.Add((s, k == 0 || random.NextDouble() < 0.5 ? -c : c));
                }
            }

            SparseVector reaction = SparseVector.Create([.. entries]);
            double trueValue = (random.NextDouble() * 400) - 200;
            int repeats = random.Next(1, 6);
            for (int r = 0; r < repeats && vectors.Count < measurements; r++)
            {
                double scale = random.NextDouble() switch { < 0.15 => -1, < 0.25 => 2, _ => 1 };
                double u = 0.2 + (random.NextDouble() * 4);
                vectors.Add(reaction.Scale(Fraction.FromDouble(scale)));
                values.Add(scale * (trueValue + (u * (random.NextDouble() - 0.5))));
                uncertainties.Add(u * Math.Abs(scale));
            }
        }

        return (vectors, values, uncertainties);
    }
}
