namespace PathFinder.Tui.Analysis;

/// <summary>One Hess's-law route: measurements scaled by exact factors whose sum is the target.</summary>
/// <param name="Steps">The steps in order.</param>
/// <param name="Value">Σ fᵢ·xᵢ in the canonical unit; null when not computed.</param>
/// <param name="Uncertainty">√(Σ fᵢ²·uᵢ²); null when not computed.</param>
public sealed record RouteReport(IReadOnlyList<RouteStep> Steps, double? Value, double? Uncertainty);
