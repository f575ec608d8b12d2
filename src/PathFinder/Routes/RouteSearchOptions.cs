namespace PathFinder.Routes;

/// <summary>Bounds and budget for a route search.</summary>
public sealed record RouteSearchOptions
{
    /// <summary>Largest number of measurements in a route (default 6).</summary>
    public int MaxSteps { get; init; } = 6;

    /// <summary>Largest number of routes returned, best first (default 100); all routes found are still counted.</summary>
    public int MaxRoutes { get; init; } = 100;

    /// <summary>Wall-clock budget; null means none (default).</summary>
    public TimeSpan? TimeBudget { get; init; }

    /// <summary>Stop as soon as this many routes (over measurements) have been found; null means never (default).</summary>
    /// <remarks>With a stop, the returned routes are the best among those found, not necessarily the best overall.</remarks>
    public long? StopAfter { get; init; }

    /// <summary>Token that stops the search early; the partial result is returned with <see cref="SearchCut.Cancelled"/>.</summary>
    public CancellationToken CancellationToken { get; init; }
}
