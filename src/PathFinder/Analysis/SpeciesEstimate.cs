using PathFinder.Chemistry;

namespace PathFinder.Analysis;

/// <summary>The network's best estimate of one species' property (ΔfH°, ΔfG° or S°).</summary>
/// <param name="Species">The species.</param>
/// <param name="Value">The estimate, or NaN when the data do not determine it.</param>
/// <param name="Uncertainty">Its standard uncertainty, or NaN.</param>
/// <param name="Measurements">How many measurements involve the species.</param>
public sealed record SpeciesEstimate(Species Species, double Value, double Uncertainty, int Measurements)
{
    /// <summary>Whether the data determine the value.</summary>
    public bool IsDetermined => double.IsFinite(Value);
}
