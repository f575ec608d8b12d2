namespace PathFinder.Solving;

/// <summary>Finds inconsistent observations by repeatedly enlarging the uncertainty of the worst one.</summary>
/// <remarks>
/// <para>
/// Loop: solve; take the checkable observation with the largest |normalized residual|; if it is ≤ the threshold,
/// stop; otherwise multiply its uncertainty by the inflation factor and solve again. Only one observation is
/// changed per step because one bad value drags its neighbours' residuals up too; enlarging the worst first
/// usually clears them. Observations that are not checkable (they alone fix some quantity) are never picked.
/// </para>
/// <para>
/// Each re-solve is a Sherman–Morrison rank-one update of the component's covariance and solution (O(k²)
/// instead of O(k³)); the component is refactored from scratch every
/// <see cref="OutlierOptions.RefactorizationInterval"/> updates to stop rounding errors from accumulating.
/// </para>
/// <para>
/// Suspects are ranked by |z| at the time they were first picked, not by total inflation: that z is the
/// evidence against the value as reported, while the total inflation also depends on the inflation factor
/// and on how the adjustments of other observations happened to interleave.
/// </para>
/// </remarks>
public static class OutlierProcedure
{
    /// <summary>Runs the procedure on a system.</summary>
    public static OutlierResult Run(ObservationSystem system, OutlierOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(system);
        options ??= OutlierOptions.Default;
        if (!(options.Threshold > 0.0))
        {
            throw new ArgumentOutOfRangeException(nameof(options), options.Threshold, "The threshold must be positive.");
        }

        if (!(options.InflationFactor > 1.0) || !double.IsFinite(options.InflationFactor))
        {
            throw new ArgumentOutOfRangeException(nameof(options), options.InflationFactor, "The inflation factor must exceed 1.");
        }

        ArgumentOutOfRangeException.ThrowIfNegative(options.MaxIterations);
        ArgumentOutOfRangeException.ThrowIfLessThan(options.RefactorizationInterval, 1);

        SolverEngine engine = SolverEngine.Create(system, options.Solver);
        engine.RefactorizationInterval = options.RefactorizationInterval;
        var adjustments = new List<UncertaintyAdjustment>();
        bool converged = false;
        while (true)
        {
            (int worst, double z) = FindWorst(engine);
            if (worst < 0 || Math.Abs(z) <= options.Threshold)
            {
                converged = true;
                break;
            }

            if (adjustments.Count >= options.MaxIterations)
            {
                break;
            }

            double old = engine.Uncertainty(worst);
            double enlarged = old * options.InflationFactor;
            engine.SetUncertainty(worst, enlarged);
            adjustments.Add(new UncertaintyAdjustment(adjustments.Count + 1, worst, z, old, enlarged));
        }

        OutlierSuspect[] suspects = adjustments
            .GroupBy(a => a.ObservationIndex)
            .Select(g => new OutlierSuspect(
                g.Key, g.First().NormalizedResidualBefore, g.Count(), system.Observations[g.Key].Uncertainty, engine.Uncertainty(g.Key)))
            .OrderByDescending(s => Math.Abs(s.FirstNormalizedResidual))
            .ThenBy(s => s.ObservationIndex)
            .ToArray();
        return new OutlierResult(adjustments.ToArray(), suspects, new LeastSquaresSolution(engine), converged);
    }

    private static (int Index, double Z) FindWorst(SolverEngine engine)
    {
        int worst = -1;
        double worstZ = 0.0;
        for (int i = 0; i < engine.ObservationCount; i++)
        {
            double? z = engine.NormalizedResidual(i);
            if (z.HasValue && (worst < 0 || Math.Abs(z.Value) > Math.Abs(worstZ)))
            {
                worst = i;
                worstZ = z.Value;
            }
        }

        return (worst, worstZ);
    }
}
