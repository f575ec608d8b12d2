namespace PathFinder.Solving;

/// <summary>Tolerances and choices for <see cref="WeightedLeastSquares.Solve"/>.</summary>
public sealed record SolverOptions
{
    /// <summary>The default options.</summary>
    public static SolverOptions Default { get; } = new();

    /// <summary>Relative pivot tolerance of the rank-revealing Cholesky; default 1e-10.</summary>
    /// <remarks>
    /// The normal matrix N = AᵀWA of each component is first scaled to unit diagonal (D^{-1/2} N D^{-1/2}, which
    /// does not change the row space). Pivoted Cholesky then stops when the largest remaining Schur-complement
    /// diagonal is ≤ this value: a column whose (weighted) component orthogonal to the already chosen columns is
    /// below √tol ≈ 1e-5 of its length counts as dependent. Must lie in (0, 1).
    /// </remarks>
    public double RankTolerance { get; init; } = 1e-10;

    /// <summary>Tolerance for "in the row space of A" (estimability, determined unknowns); default 1e-8.</summary>
    /// <remarks>
    /// A vector a is estimable when ‖Qᵀa‖ ≤ tol·‖a‖, with Q an orthonormal basis of the null space of A: the
    /// sine of the angle between a and the row space is below tol.
    /// </remarks>
    public double EstimabilityTolerance { get; init; } = 1e-8;

    /// <summary>Observations with 1 − leverage ≤ this value are "not checkable"; default 1e-8.</summary>
    /// <remarks>
    /// 1 − hᵢ = (uᵢ² − aᵢᵀCaᵢ)/uᵢ² is the fraction of the observation's variance that the rest of the data can
    /// check. When it is ~0 the observation alone fixes some quantity: its residual is 0 by construction and no
    /// normalized residual or leave-one-out prediction exists.
    /// </remarks>
    public double CheckabilityTolerance { get; init; } = 1e-8;

    /// <summary>Which dense linear-algebra code to use; default <see cref="LinearAlgebraBackend.Automatic"/>.</summary>
    public LinearAlgebraBackend Backend { get; init; } = LinearAlgebraBackend.Automatic;

    internal void Validate()
    {
        if (!(RankTolerance > 0.0 && RankTolerance < 1.0))
        {
            throw new ArgumentOutOfRangeException(nameof(RankTolerance), RankTolerance, "Must lie in (0, 1).");
        }

        if (!(EstimabilityTolerance > 0.0 && EstimabilityTolerance < 1.0))
        {
            throw new ArgumentOutOfRangeException(nameof(EstimabilityTolerance), EstimabilityTolerance, "Must lie in (0, 1).");
        }

        if (!(CheckabilityTolerance > 0.0 && CheckabilityTolerance < 1.0))
        {
            throw new ArgumentOutOfRangeException(nameof(CheckabilityTolerance), CheckabilityTolerance, "Must lie in (0, 1).");
        }
    }
}
