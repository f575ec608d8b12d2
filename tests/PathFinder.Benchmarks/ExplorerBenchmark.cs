namespace PathFinder.Benchmarks;

/// <summary>Placeholder for the explorer benchmark written on another branch; replaced by the real file when merged.</summary>
public static class ExplorerBenchmark
{
    /// <summary>Prints that the explorer benchmark is not part of this build.</summary>
    public static void Run(TextWriter output, int species, int measurements, int seed)
    {
        ArgumentNullException.ThrowIfNull(output);
        output.WriteLine($"explorer ({species} species, {measurements} measurements, seed {seed}): not available in this build");
    }
}
