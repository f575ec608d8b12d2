namespace PathFinder.Solving;

/// <summary>The estimate of a linear combination aᵀx of the unknowns, with its variance.</summary>
/// <param name="IsEstimable">Whether a lies in the row space of A, i.e. the data determine aᵀx; if not, the numbers are NaN.</param>
/// <param name="Value">aᵀx̂, or NaN when not estimable.</param>
/// <param name="Variance">aᵀ·Cov·a (unit of the value squared), or NaN when not estimable.</param>
public readonly record struct DerivedEstimate(bool IsEstimable, double Value, double Variance)
{
    /// <summary>The standard uncertainty √variance (NaN when not estimable).</summary>
    public double StandardUncertainty => Math.Sqrt(Variance);

    /// <summary>The result for a combination the data do not determine.</summary>
    public static DerivedEstimate NotEstimable { get; } = new(false, double.NaN, double.NaN);
}
