using Fractions;

namespace PathFinder.Routes;

/// <summary>A minimal thermochemical cycle: a circuit of measurements with Σ cᵢ·rᵢ = 0 and its closure residual.</summary>
/// <param name="Measurements">Measurement indices, ascending.</param>
/// <param name="Factors">Coprime integer factors cᵢ (as fractions with denominator 1), the first (lowest measurement) positive.</param>
/// <param name="Residual">Closure residual Σ cᵢ·vᵢ, in the unit of the measured values; ideally zero.</param>
/// <param name="Uncertainty">Standard uncertainty √(Σ cᵢ²·uᵢ²) of the residual.</param>
/// <param name="Z">Residual / uncertainty; ±∞ when the uncertainty is zero and the residual is not, 0 when both are.</param>
public sealed record Cycle(IReadOnlyList<int> Measurements, IReadOnlyList<Fraction> Factors, double Residual, double Uncertainty, double Z)
{
    /// <summary>Number of measurements in the cycle.</summary>
    public int Size => Measurements.Count;
}
