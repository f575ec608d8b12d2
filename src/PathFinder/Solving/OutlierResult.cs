namespace PathFinder.Solving;

/// <summary>What <see cref="OutlierProcedure"/> found: the adjustments, the suspects and the final solution.</summary>
public sealed class OutlierResult
{
    internal OutlierResult(UncertaintyAdjustment[] adjustments, OutlierSuspect[] suspects, LeastSquaresSolution solution, bool converged, double criticalValue, int checkableCount)
    {
        CriticalValue = criticalValue;
        CheckableCount = checkableCount;
        Adjustments = adjustments;
        Suspects = suspects;
        Solution = solution;
        Converged = converged;
    }

    /// <summary>Every adjustment in the order made.</summary>
    public IReadOnlyList<UncertaintyAdjustment> Adjustments { get; }

    /// <summary>Observations picked with |z| above <see cref="CriticalValue"/>, most serious first: by decreasing |z| when first picked.</summary>
    /// <remarks>Observations only ever picked between the threshold and the critical value were mildly adjusted, not suspected.</remarks>
    public IReadOnlyList<OutlierSuspect> Suspects { get; }

    /// <summary>The solution with the final uncertainties (its <see cref="LeastSquaresSolution.System"/> holds them).</summary>
    public LeastSquaresSolution Solution { get; }

    /// <summary>The |z| a measurement had to exceed when picked to be a suspect: max(threshold, Šidák value for <see cref="CheckableCount"/> tests).</summary>
    public double CriticalValue { get; }

    /// <summary>The number of checkable observations in the initial solve (the m of the multiple-testing correction).</summary>
    public int CheckableCount { get; }

    /// <summary>True when every checkable |z| ended ≤ threshold; false when the iteration cap stopped the procedure.</summary>
    public bool Converged { get; }
}
