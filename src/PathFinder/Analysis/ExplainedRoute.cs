using PathFinder.Chemistry;

namespace PathFinder.Analysis;

/// <summary>A route spelled out the way the trade writes it: the steps as used, the intermediates that cancel, and the sum.</summary>
/// <param name="Number">1-based position in the report (best first).</param>
/// <param name="Steps">The measurements as used.</param>
/// <param name="Value">Σ cᵢ·vᵢ.</param>
/// <param name="Uncertainty">√(Σ cᵢ²·uᵢ²), measurements taken as independent.</param>
/// <param name="IsIndependent">Whether the route belongs to the marked maximal set of linearly independent routes.</param>
/// <param name="Cancelled">Species that appear in the steps but cancel in the sum (intermediates).</param>
/// <param name="Sum">The sum of the step equations; equals the target.</param>
public sealed record ExplainedRoute(
    int Number,
    IReadOnlyList<RouteStep> Steps,
    double Value,
    double Uncertainty,
    bool IsIndependent,
    IReadOnlyList<Species> Cancelled,
    ChemicalEquation Sum);
