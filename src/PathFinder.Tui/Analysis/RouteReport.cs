namespace PathFinder.Tui.Analysis;

/// <summary>One Hess's-law route: measurements scaled by exact factors whose sum is the target.</summary>
/// <param name="Steps">The steps in order.</param>
/// <param name="Value">Σ fᵢ·xᵢ in the canonical unit; null when not computed.</param>
/// <param name="Uncertainty">√(Σ fᵢ²·uᵢ²); null when not computed.</param>
/// <param name="Cancelled">Names of the intermediates: species that appear in the steps but cancel in the sum; null when not computed.</param>
/// <param name="Sum">The sum of the scaled step equations as text (it equals the target); null when not computed.</param>
public sealed record RouteReport(
    IReadOnlyList<RouteStep> Steps,
    double? Value,
    double? Uncertainty,
    IReadOnlyList<string>? Cancelled = null,
    string? Sum = null);
