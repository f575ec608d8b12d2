namespace PathFinder.Solving;

/// <summary>Which measurement would most reduce the uncertainty of a derived quantity, by rank-one update formulas.</summary>
/// <remarks>
/// Both questions are answered without re-solving: with C the covariance and a the quantity,
/// (a) re-measuring observation i with uncertainty u′ changes its weight by Δw = 1/u′² − 1/u² and gives
/// Var′ = aᵀCa − Δw·(aᵀCaᵢ)²/(1 + Δw·aᵢᵀCaᵢ);
/// (b) adding a new observation cᵀx ± u_c gives Var′ = aᵀCa − (aᵀCc)²/(u_c² + cᵀCc) (Sherman–Morrison).
/// </remarks>
public static class ExperimentPlanning
{
    /// <summary>For each observation that affects a, the variance of aᵀx̂ if it were re-measured with uncertainty newUncertainty(i).</summary>
    /// <returns>Options sorted by increasing resulting variance (most useful first).</returns>
    /// <exception cref="ArgumentException">a is not estimable (no re-measurement of an existing row can change that).</exception>
    public static IReadOnlyList<RemeasurementOption> Remeasurements(
        LeastSquaresSolution solution, SparseRow quantity, Func<int, double> newUncertainty)
    {
        ArgumentNullException.ThrowIfNull(solution);
        ArgumentNullException.ThrowIfNull(newUncertainty);
        DerivedEstimate estimate = RequireEstimable(solution, quantity);
        SolverEngine engine = solution.Engine;
        double[] ca = engine.CovarianceTimes(quantity);
        var options = new List<RemeasurementOption>();
        foreach (int c in quantity.Indices.ToArray().Select(engine.ComponentOfUnknown).Distinct())
        {
            foreach (int i in engine.Components[c].Observations)
            {
                double u = engine.Uncertainty(i);
                double uNew = newUncertainty(i);
                if (!double.IsFinite(uNew) || uNew <= 0.0)
                {
                    throw new ArgumentOutOfRangeException(nameof(newUncertainty), uNew, "New uncertainties must be finite and positive.");
                }

                double deltaWeight = (1.0 / (uNew * uNew)) - (1.0 / (u * u));
                double cross = engine.Row(i).Row.Dot(ca);
                double quadratic = engine.FitObservation(i).Quadratic;
                double variance = estimate.Variance - (deltaWeight * cross * cross / (1.0 + (deltaWeight * quadratic)));
                options.Add(new RemeasurementOption(i, u, uNew, Math.Max(0.0, variance), estimate.Variance));
            }
        }

        return options.OrderBy(o => o.Variance).ThenBy(o => o.ObservationIndex).ToArray();
    }

    /// <summary>As the other overload, with each new uncertainty = factor × current uncertainty (factor in (0, 1) for a better measurement).</summary>
    public static IReadOnlyList<RemeasurementOption> Remeasurements(LeastSquaresSolution solution, SparseRow quantity, double uncertaintyFactor)
    {
        ArgumentNullException.ThrowIfNull(solution);
        if (!(uncertaintyFactor > 0.0) || !double.IsFinite(uncertaintyFactor))
        {
            throw new ArgumentOutOfRangeException(nameof(uncertaintyFactor), uncertaintyFactor, "Must be finite and positive.");
        }

        return Remeasurements(solution, quantity, i => uncertaintyFactor * solution.Engine.Uncertainty(i));
    }

    /// <summary>The variance of aᵀx̂ after adding a new observation cᵀx with standard uncertainty u_c.</summary>
    /// <remarks>
    /// If c itself is not estimable, the new observation only fixes a direction the data left free: its residual
    /// would be zero and the variance of every already estimable quantity is unchanged, so the current variance
    /// is returned (a re-solve shows which new quantities become estimable).
    /// </remarks>
    /// <exception cref="ArgumentException">a is not estimable now.</exception>
    public static double VarianceWithNewObservation(LeastSquaresSolution solution, SparseRow quantity, SparseRow candidate, double uncertainty)
    {
        ArgumentNullException.ThrowIfNull(solution);
        ArgumentNullException.ThrowIfNull(candidate);
        if (!double.IsFinite(uncertainty) || uncertainty <= 0.0)
        {
            throw new ArgumentOutOfRangeException(nameof(uncertainty), uncertainty, "Must be finite and positive.");
        }

        DerivedEstimate estimate = RequireEstimable(solution, quantity);
        if (!solution.IsEstimable(candidate))
        {
            return estimate.Variance;
        }

        double[] cc = solution.Engine.CovarianceTimes(candidate);
        double cross = quantity.Dot(cc);
        double variance = estimate.Variance - (cross * cross / ((uncertainty * uncertainty) + candidate.Dot(cc)));
        return Math.Max(0.0, variance);
    }

    private static DerivedEstimate RequireEstimable(LeastSquaresSolution solution, SparseRow quantity)
    {
        ArgumentNullException.ThrowIfNull(quantity);
        DerivedEstimate estimate = solution.Estimate(quantity);
        if (!estimate.IsEstimable)
        {
            throw new ArgumentException("The quantity is not determined by the data, so it has no variance to plan for.", nameof(quantity));
        }

        return estimate;
    }
}
