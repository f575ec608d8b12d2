using System.Diagnostics;
using System.Globalization;
using System.Runtime.InteropServices;
using PathFinder.Solving;

namespace PathFinder.Benchmarks;

/// <summary>Prints benchmark figures; <c>all</c> runs every case in its own process and ends with the summary table.</summary>
internal static class Program
{
    private const string ChildVariable = "PATHFINDER_BENCH_CHILD";

    private const string Usage =
        "usage: PathFinder.Benchmarks <case> [arguments]\n" +
        "  all                                   every case below, each in its own process, then the summary table\n" +
        "  routes [species] [measurements] [seed]      route search end to end (default 2000 30000 1)\n" +
        "  scaling [seed] [targets] [budget-seconds]   route time against network size and step bound (default 1 5 5)\n" +
        "  check [species] [measurements] [seed]       'solve --no-adjust' and 'check' through the CLI code, CSV included (default 2000 30000 1)\n" +
        "  diagrams [nodes] [seed]                     diagram layout and SVG (default 300 1)\n" +
        "  explorer [species] [measurements] [seed]    terminal explorer analysis (default 2000 30000 1)\n" +
        "  consistency [species] [measurements] [seed] [runs]  solver + suspect procedure on the model alone (default 2000 30000 1 2)\n" +
        "  solver [unknowns] [observations] [seed]     least-squares solver alone (default 2000 20000 1)\n" +
        "  engine [species] [measurements] [seed]      route engine alone on a family-shaped random network (default 2000 30000 1)";

    private static int Main(string[] args)
    {
        string which = args.Length > 0 ? args[0] : "all";
        int Arg(int position, int fallback) => args.Length > position ? int.Parse(args[position], CultureInfo.InvariantCulture) : fallback;
        TextWriter output = Console.Out;
        switch (which)
        {
            case "all":
                return All();
            case "routes":
                Emit(output, RouteEndToEndBenchmark.Run(output, Arg(1, 2000), Arg(2, 30000), Arg(3, 1)));
                return 0;
            case "scaling":
                Emit(output, RouteEndToEndBenchmark.Scaling(output, [250, 500, 1000, 2000], Arg(1, 1), Arg(2, 5), TimeSpan.FromSeconds(Arg(3, 5))));
                return 0;
            case "check":
                Emit(output, CheckSolveBenchmark.Run(output, Arg(1, 2000), Arg(2, 30000), Arg(3, 1)));
                return 0;
            case "diagrams":
                DiagramBenchmark.Run(output, Arg(1, 300), Arg(2, 1));
                return 0;
            case "explorer":
                ExplorerBenchmark.Run(output, Arg(1, 2000), Arg(2, 30000), Arg(3, 1));
                return 0;
            case "consistency":
                ConsistencyBenchmark.Run(output, Arg(1, 2000), Arg(2, 30000), Arg(3, 1), Arg(4, 2));
                return 0;
            case "solver":
                SolverBenchmark.Run(output, Arg(1, 2000), Arg(2, 20000), Arg(3, 1));
                return 0;
            case "engine":
                RouteSearchBenchmark.Run(output, Arg(1, 2000), Arg(2, 30000), Arg(3, 1));
                return 0;
            default:
                Console.Error.WriteLine(Usage);
                return 2;
        }
    }

    /// <summary>Runs each case in a fresh process (so peak memory and JIT belong to that case alone) and prints the summary.</summary>
    private static int All()
    {
        TextWriter output = Console.Out;
        output.WriteLine("PathFinder benchmarks");
        output.WriteLine(string.Create(CultureInfo.InvariantCulture, $"  date {DateTime.UtcNow:yyyy-MM-dd HH:mm} UTC; {RuntimeInformation.OSDescription}; {RuntimeInformation.FrameworkDescription}; {Environment.ProcessorCount} logical cores; {Cpu()}"));
        output.WriteLine($"  native OpenBLAS: {WeightedLeastSquares.IsNativeBackendAvailable} (kernels {WeightedLeastSquares.NativeKernelName ?? "-"}); build {(IsOptimized() ? "Release" : "Debug (figures are slower than Release)")}");
        output.WriteLine();
        var figures = new List<Figure>();
        var watch = Stopwatch.StartNew();
        foreach (string[] arguments in new[]
        {
            new[] { "routes", "2000", "30000", "1" },
            ["check", "2000", "30000", "1"],
            ["scaling", "1", "5", "5"],
            ["diagrams", "300", "1"],
            ["explorer", "2000", "30000", "1"],
        })
        {
            figures.AddRange(RunChild(output, arguments));
            output.WriteLine();
        }

        output.WriteLine(string.Create(CultureInfo.InvariantCulture, $"summary ({watch.Elapsed.TotalSeconds:F0} s in all):"));
        Figure.WriteTable(output, figures);
        return figures.Any(figure => figure.Pass == false) ? 1 : 0;
    }

    private static List<Figure> RunChild(TextWriter output, string[] arguments)
    {
        var figures = new List<Figure>();
        string host = Environment.ProcessPath ?? "dotnet";
        var start = new ProcessStartInfo(host) { RedirectStandardOutput = true, UseShellExecute = false };
        if (string.Equals(Path.GetFileNameWithoutExtension(host), "dotnet", StringComparison.OrdinalIgnoreCase))
        {
            start.ArgumentList.Add(typeof(Program).Assembly.Location);
        }

        foreach (string argument in arguments)
        {
            start.ArgumentList.Add(argument);
        }

        start.Environment[ChildVariable] = "1";
        output.WriteLine($"== {string.Join(' ', arguments)}");
        using Process child = Process.Start(start) ?? throw new InvalidOperationException("could not start a benchmark process");
        string? line;
        while ((line = child.StandardOutput.ReadLine()) is not null)
        {
            if (Figure.TryParse(line) is { } figure)
            {
                figures.Add(figure);
            }
            else
            {
                output.WriteLine(line);
            }
        }

        child.WaitForExit();
        if (child.ExitCode != 0)
        {
            figures.Add(new Figure($"case '{arguments[0]}' ran to the end", "exit 0", $"exit {child.ExitCode}", false));
        }

        return figures;
    }

    /// <summary>Prints the figures of one case: as a table when run alone, as lines for the parent under <c>all</c>.</summary>
    private static void Emit(TextWriter output, IReadOnlyList<Figure> figures)
    {
        if (Environment.GetEnvironmentVariable(ChildVariable) == "1")
        {
            foreach (Figure figure in figures)
            {
                output.WriteLine(figure.ToLine());
            }

            return;
        }

        output.WriteLine();
        Figure.WriteTable(output, figures);
    }

    private static string Cpu()
    {
        try
        {
            string? model = File.ReadLines("/proc/cpuinfo").FirstOrDefault(line => line.StartsWith("model name", StringComparison.Ordinal));
            return model is null ? "CPU unknown" : model[(model.IndexOf(':', StringComparison.Ordinal) + 1)..].Trim();
        }
        catch (IOException)
        {
            return "CPU unknown";
        }
    }

    private static bool IsOptimized() =>
        typeof(Program).Assembly.GetCustomAttributes(typeof(DebuggableAttribute), false).OfType<DebuggableAttribute>().All(attribute => !attribute.IsJITOptimizerDisabled);
}
