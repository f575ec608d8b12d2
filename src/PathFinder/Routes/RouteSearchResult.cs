namespace PathFinder.Routes;

/// <summary>The outcome of a route search.</summary>
public sealed record RouteSearchResult
{
    /// <summary>The best routes found, by increasing uncertainty, then number of steps, then measurement indices.</summary>
    public required IReadOnlyList<Route> Routes { get; init; }

    /// <summary>Number of distinct routes (over measurements) found, including those not returned (saturates at <see cref="long.MaxValue"/>).</summary>
    public required long RoutesFound { get; init; }

    /// <summary>What cut the search, if anything.</summary>
    public required SearchCut Cut { get; init; }

    /// <summary>True when every route within the step bound was found (no branch cut by the bound, budget, cancellation or stop).</summary>
    public bool Complete => Cut == SearchCut.None;

    /// <summary>Every route of at most this many steps was found (0 when none is certain to be); equals the step bound when nothing but the bound cut the search.</summary>
    /// <remarks>Routes are searched by increasing size, so a budget or a stop cuts the search while it looks at routes of
    /// <see cref="CompleteUpToSteps"/> + 1 steps; some of those may already have been found.</remarks>
    public required int CompleteUpToSteps { get; init; }

    /// <summary>Search steps taken (see <see cref="RouteSearchOptions.WorkBudget"/>).</summary>
    public long SearchSteps { get; init; }

    /// <summary>Rank of the factor vectors (over all measurements) of the returned routes.</summary>
    public required int IndependentRouteCount { get; init; }

    /// <summary>Target species held by no measurement: the target cannot be reached while any is listed.</summary>
    public required IReadOnlyList<int> UnreachableSpecies { get; init; }

    /// <summary>True when the Hadamard bound proves the modular pruning exact (no route can have been lost to arithmetic modulo 2^61 − 1).</summary>
    /// <remarks>Returned routes are always verified exactly; this flag concerns routes possibly missed.</remarks>
    public required bool ExactnessCertified { get; init; }

    /// <summary>Wall-clock time of the search.</summary>
    public required TimeSpan Elapsed { get; init; }

    /// <summary>Time at which the first route was found, or null when none was.</summary>
    public required TimeSpan? FirstRouteElapsed { get; init; }
}
