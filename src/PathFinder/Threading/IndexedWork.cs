namespace PathFinder.Threading;

/// <summary>Loops whose items are computed each alone into their own slot, spread over the cores when large enough.</summary>
/// <remarks>
/// The result does not depend on the order or the number of threads (each index writes only its own slot), so
/// callers stay deterministic; small loops run in place because handing work to the thread pool costs more than
/// it saves there.
/// </remarks>
internal static class IndexedWork
{
    /// <summary>Loops of at least this many items use several threads.</summary>
    public const int ParallelFrom = 4096;

    /// <summary>Runs <paramref name="body"/> for every index 0..count−1.</summary>
    public static void For(int count, Action<int> body)
    {
        if (count >= ParallelFrom && Environment.ProcessorCount > 1)
        {
            Parallel.For(0, count, body);
            return;
        }

        for (int i = 0; i < count; i++)
        {
            body(i);
        }
    }
}
