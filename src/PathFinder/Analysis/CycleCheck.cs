using Fractions;

namespace PathFinder.Analysis;

/// <summary>A cycle of measurements that should close to zero (an empty route), and how far it misses.</summary>
/// <param name="Number">1-based position in the report (worst first).</param>
/// <param name="Members">The measurements with their exact integer factors (Σ cᵢ·reactionᵢ = 0).</param>
/// <param name="Residual">Closure residual Σ cᵢ·vᵢ.</param>
/// <param name="Uncertainty">√(Σ cᵢ²·uᵢ²).</param>
/// <param name="Z">Residual / uncertainty.</param>
/// <param name="Flagged">Whether |z| exceeds the threshold.</param>
public sealed record CycleCheck(int Number, IReadOnlyList<(PreparedMeasurement Measurement, Fraction Factor)> Members, double Residual, double Uncertainty, double Z, bool Flagged);
