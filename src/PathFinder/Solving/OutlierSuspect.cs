namespace PathFinder.Solving;

/// <summary>An observation whose uncertainty had to be enlarged to make the data consistent.</summary>
/// <param name="ObservationIndex">The observation.</param>
/// <param name="FirstNormalizedResidual">Its normalized residual when it was first picked (signed; the ranking key).</param>
/// <param name="Adjustments">How many times it was enlarged.</param>
/// <param name="OriginalUncertainty">The uncertainty as given.</param>
/// <param name="FinalUncertainty">The uncertainty at the end.</param>
public readonly record struct OutlierSuspect(
    int ObservationIndex, double FirstNormalizedResidual, int Adjustments, double OriginalUncertainty, double FinalUncertainty)
{
    /// <summary>FinalUncertainty / OriginalUncertainty.</summary>
    public double TotalInflation => FinalUncertainty / OriginalUncertainty;
}
