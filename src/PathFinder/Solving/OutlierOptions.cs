namespace PathFinder.Solving;

/// <summary>Settings of <see cref="OutlierProcedure"/>.</summary>
public sealed record OutlierOptions
{
    /// <summary>The default settings.</summary>
    public static OutlierOptions Default { get; } = new();

    /// <summary>|normalized residual| above which an observation's uncertainty is enlarged; default 2 (common practice, no source).</summary>
    /// <remarks>Suspects are judged against the larger of this and the multiple-testing critical value (see <see cref="SignificanceLevel"/>).</remarks>
    public double Threshold { get; init; } = 2.0;

    /// <summary>Factor applied to a suspect's uncertainty per adjustment; default 2. Must exceed 1.</summary>
    public double InflationFactor { get; init; } = 2.0;

    /// <summary>Family-wise significance level α for calling a measurement a suspect; default 0.05 (common practice, no source).</summary>
    /// <remarks>
    /// With no gross errors, the chance that the whole network yields even one suspect is at most α
    /// (Šidák critical value over the checkable observations; see <see cref="OutlierProcedure"/>). Must lie in (0, 1).
    /// </remarks>
    public double SignificanceLevel { get; init; } = 0.05;

    /// <summary>Maximum number of adjustments; default 100 000 (a safeguard: 30 000 measurements need a few thousand at threshold 2).</summary>
    public int MaxIterations { get; init; } = 100_000;

    /// <summary>Rank-one changes per component between fresh factorizations (numerical hygiene); default 100 000.</summary>
    /// <remarks>
    /// The changes are exact in exact arithmetic and folded into the dense covariance in blocks, so rounding grows
    /// only slowly (about one unit of rounding per change); the default therefore never refactors in practice.
    /// A fresh factorization costs as much as the initial solve of the component.
    /// </remarks>
    public int RefactorizationInterval { get; init; } = 100_000;

    /// <summary>Rank-one changes kept as a low-rank list before they are folded into the dense covariance; default 128.</summary>
    /// <remarks>Larger blocks make each fold more efficient but each step dearer (O(k·block) per step); must be ≥ 1.</remarks>
    public int LowRankBlockSize { get; init; } = 128;

    /// <summary>Options for the underlying solves.</summary>
    public SolverOptions Solver { get; init; } = SolverOptions.Default;
}
