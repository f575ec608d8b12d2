namespace PathFinder.Diagrams;

/// <summary>A directed edge: reactant species → measurement/target, or measurement/target → product species.</summary>
/// <param name="From">Id of the source node.</param>
/// <param name="To">Id of the target node.</param>
/// <param name="Factor">Stoichiometric factor as text (<c>2</c>, <c>½</c>, <c>3/2</c>); drawn only when not empty and not <c>1</c>.</param>
/// <param name="Highlighted">Whether the edge is drawn as part of the route; null means "when both end nodes are highlighted".</param>
public sealed record NetworkEdge(string From, string To, string? Factor = null, bool? Highlighted = null)
{
    /// <summary>The label drawn beside the edge, or null when the factor is empty or 1.</summary>
    public string? VisibleLabel
    {
        get
        {
            string? f = Factor?.Trim();
            return string.IsNullOrEmpty(f) || f is "1" or "1/1" or "1.0" ? null : f;
        }
    }
}
