namespace PathFinder.Solving;

/// <summary>What <see cref="OutlierProcedure.Run"/> found: the adjustments, the suspects and the final solution.</summary>
public sealed class OutlierResult
{
    internal OutlierResult(UncertaintyAdjustment[] adjustments, OutlierSuspect[] suspects, LeastSquaresSolution solution, bool converged)
    {
        Adjustments = adjustments;
        Suspects = suspects;
        Solution = solution;
        Converged = converged;
    }

    /// <summary>Every adjustment in the order made.</summary>
    public IReadOnlyList<UncertaintyAdjustment> Adjustments { get; }

    /// <summary>Observations enlarged at least once, most serious first: by decreasing |z| when first picked.</summary>
    public IReadOnlyList<OutlierSuspect> Suspects { get; }

    /// <summary>The solution with the final uncertainties (its <see cref="LeastSquaresSolution.System"/> holds them).</summary>
    public LeastSquaresSolution Solution { get; }

    /// <summary>True when every checkable |z| ended ≤ threshold; false when the iteration cap stopped the procedure.</summary>
    public bool Converged { get; }
}
