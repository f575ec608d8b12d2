using Fractions;

namespace PathFinder.Routes;

/// <summary>A minimal Hess's-law route: exact factors cᵢ with Σ cᵢ·rᵢ = t over a linearly independent set of measurements.</summary>
/// <param name="Measurements">Measurement indices, ascending.</param>
/// <param name="Factors">The exact factor cᵢ of each measurement, parallel to <paramref name="Measurements"/>; all nonzero.</param>
/// <param name="Value">Σ cᵢ·vᵢ, in the unit of the measured values.</param>
/// <param name="Uncertainty">Standard uncertainty √(Σ cᵢ²·uᵢ²), measurements treated as uncorrelated.</param>
/// <param name="IsIndependent">True when the route belongs to the greedy (best first) maximal linearly independent subset of the routes returned.</param>
public sealed record Route(IReadOnlyList<int> Measurements, IReadOnlyList<Fraction> Factors, double Value, double Uncertainty, bool IsIndependent)
{
    /// <summary>Number of measurements used.</summary>
    public int Steps => Measurements.Count;
}
