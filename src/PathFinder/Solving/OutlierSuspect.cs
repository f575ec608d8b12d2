namespace PathFinder.Solving;

/// <summary>An observation found inconsistent with the rest: picked with |z| beyond the multiple-testing critical value.</summary>
/// <param name="ObservationIndex">The observation.</param>
/// <param name="FirstNormalizedResidual">Its normalized residual when it was first picked (signed; the ranking key).</param>
/// <param name="Adjustments">How many times it was enlarged.</param>
/// <param name="OriginalUncertainty">The uncertainty as given.</param>
/// <param name="FinalUncertainty">The uncertainty at the end.</param>
public readonly record struct OutlierSuspect(
    int ObservationIndex, double FirstNormalizedResidual, int Adjustments, double OriginalUncertainty, double FinalUncertainty)
{
    /// <summary>The largest |z| (signed) at which it was picked; this is what exceeded the critical value.</summary>
    public double LargestNormalizedResidual { get; init; }

    /// <summary>FinalUncertainty / OriginalUncertainty.</summary>
    public double TotalInflation => FinalUncertainty / OriginalUncertainty;
}
