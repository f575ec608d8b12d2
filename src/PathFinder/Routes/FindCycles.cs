namespace PathFinder.Routes;

/// <summary>One-line entry point for cycle searches: <c>FindCycles.In(network)</c>.</summary>
public static class FindCycles
{
    /// <summary>Finds the minimal cycles of <paramref name="network"/> up to the size bound (see <see cref="CycleSearch"/>).</summary>
    public static CycleSearchResult In(RouteNetwork network, CycleSearchOptions? options = null) =>
        new CycleSearch(network, options).Run();
}
