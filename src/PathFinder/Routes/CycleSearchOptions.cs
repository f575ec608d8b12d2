namespace PathFinder.Routes;

/// <summary>Bounds and budget for a cycle search.</summary>
public sealed record CycleSearchOptions
{
    /// <summary>Largest number of measurements in a cycle (default 6).</summary>
    public int MaxSize { get; init; } = 6;

    /// <summary>Largest number of cycles returned, largest |z| first (default 1000); all cycles found are still counted.</summary>
    public int MaxCycles { get; init; } = 1000;

    /// <summary>Wall-clock budget; null means none (default).</summary>
    public TimeSpan? TimeBudget { get; init; }

    /// <summary>Work budget in search steps; null means none (default). Unlike <see cref="TimeBudget"/> it cuts the search at the same point on every machine and every run.</summary>
    public long? WorkBudget { get; init; }

    /// <summary>Token that stops the search early; the partial result is returned with <see cref="SearchCut.Cancelled"/>.</summary>
    public CancellationToken CancellationToken { get; init; }
}
