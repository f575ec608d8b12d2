using System.Globalization;

namespace PathFinder.Benchmarks;

internal static class Program
{
    /// <summary>Runs a benchmark: <c>consistency [species] [measurements] [seed]</c> or <c>solver [unknowns] [observations] [seed]</c>.</summary>
    private static int Main(string[] args)
    {
        string which = args.Length > 0 ? args[0] : "consistency";
        int Arg(int position, int fallback) => args.Length > position ? int.Parse(args[position], CultureInfo.InvariantCulture) : fallback;
        switch (which)
        {
            case "consistency":
                ConsistencyBenchmark.Run(Console.Out, Arg(1, 2000), Arg(2, 30000), Arg(3, 1));
                return 0;
            case "solver":
                SolverBenchmark.Run(Console.Out, Arg(1, 2000), Arg(2, 20000), Arg(3, 1));
                return 0;
            default:
                Console.Error.WriteLine("usage: consistency|solver [size] [count] [seed]");
                return 2;
        }
    }
}
