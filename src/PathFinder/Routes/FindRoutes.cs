using PathFinder.Algebra;

namespace PathFinder.Routes;

/// <summary>One-line entry point for route searches: <c>FindRoutes.To(network, target)</c>.</summary>
public static class FindRoutes
{
    /// <summary>Finds the minimal routes to <paramref name="target"/>, best first (see <see cref="RouteSearch"/>).</summary>
    public static RouteSearchResult To(RouteNetwork network, SparseVector target, RouteSearchOptions? options = null) =>
        new RouteSearch(network, options).Run(target);
}
