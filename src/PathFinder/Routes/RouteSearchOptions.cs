namespace PathFinder.Routes;

/// <summary>Bounds and budget for a route search.</summary>
public sealed record RouteSearchOptions
{
    /// <summary>Largest number of measurements in a route (default 6).</summary>
    /// <remarks>Any positive bound is accepted: the search never goes deeper than the rank of the network allows, and its
    /// memory follows the depth it reaches, not the bound.</remarks>
    public int MaxSteps { get; init; } = 6;

    /// <summary>Largest number of routes returned, best first (default 100); all routes found are still counted.</summary>
    public int MaxRoutes { get; init; } = 100;

    /// <summary>Wall-clock budget; null means none (default).</summary>
    public TimeSpan? TimeBudget { get; init; }

    /// <summary>Work budget in search steps; null means none (default). Unlike <see cref="TimeBudget"/> it cuts the search at the same point on every machine and every run.</summary>
    /// <remarks>Routes are searched by increasing size, and the steps spent on routes of up to n measurements do not
    /// depend on <see cref="MaxSteps"/>: with the same work budget, a larger step bound finds every route a smaller one finds.</remarks>
    public long? WorkBudget { get; init; }

    /// <summary>Stop as soon as this many routes (over measurements) have been found; null means never (default).</summary>
    /// <remarks>With a stop, the returned routes are the best among those found, not necessarily the best overall.</remarks>
    public long? StopAfter { get; init; }

    /// <summary>Token that stops the search early; the partial result is returned with <see cref="SearchCut.Cancelled"/>.</summary>
    public CancellationToken CancellationToken { get; init; }
}
