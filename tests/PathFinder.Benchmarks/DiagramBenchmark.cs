namespace PathFinder.Benchmarks;

/// <summary>Placeholder for the diagram benchmark written on another branch; replaced by the real file when merged.</summary>
public static class DiagramBenchmark
{
    /// <summary>Prints that the diagram benchmark is not part of this build.</summary>
    public static void Run(TextWriter output, int nodes, int seed)
    {
        ArgumentNullException.ThrowIfNull(output);
        output.WriteLine($"diagrams ({nodes} nodes, seed {seed}): not available in this build");
    }
}
