namespace PathFinder.Tui.Analysis;

/// <summary>What an exported diagram shows: a route, a cycle, the neighbourhood of a measurement, or (all null) the whole network.</summary>
/// <param name="MeasurementId">Draw the species of this measurement and their neighbours.</param>
/// <param name="Route">Draw this route (from <see cref="INetworkAnalysis.FindRoutes"/> of the same analysis).</param>
/// <param name="Cycle">Draw this cycle (from <see cref="INetworkAnalysis.Cycles"/> of the same analysis).</param>
/// <remarks>When several are set, the route wins, then the cycle, then the measurement.</remarks>
public sealed record DiagramFocus(string? MeasurementId = null, RouteReport? Route = null, CycleReport? Cycle = null)
{
    /// <summary>No focus: the whole network.</summary>
    public static DiagramFocus Network { get; } = new();
}
