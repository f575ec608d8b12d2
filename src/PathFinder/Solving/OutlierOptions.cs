namespace PathFinder.Solving;

/// <summary>Settings of <see cref="OutlierProcedure"/>.</summary>
public sealed record OutlierOptions
{
    /// <summary>The default settings.</summary>
    public static OutlierOptions Default { get; } = new();

    /// <summary>|normalized residual| above which an observation is suspect; default 2 (common practice, no source).</summary>
    public double Threshold { get; init; } = 2.0;

    /// <summary>Factor applied to a suspect's uncertainty per adjustment; default 2. Must exceed 1.</summary>
    public double InflationFactor { get; init; } = 2.0;

    /// <summary>Maximum number of adjustments; default 200.</summary>
    public int MaxIterations { get; init; } = 200;

    /// <summary>Rank-one updates per component between fresh factorizations (numerical hygiene); default 50.</summary>
    public int RefactorizationInterval { get; init; } = 50;

    /// <summary>Options for the underlying solves.</summary>
    public SolverOptions Solver { get; init; } = SolverOptions.Default;
}
