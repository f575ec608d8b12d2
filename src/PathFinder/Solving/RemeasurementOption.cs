namespace PathFinder.Solving;

/// <summary>The variance a derived quantity would have if one existing observation were measured again more precisely.</summary>
/// <param name="ObservationIndex">The observation re-measured.</param>
/// <param name="CurrentUncertainty">Its uncertainty now.</param>
/// <param name="NewUncertainty">The assumed uncertainty of the new measurement (it replaces the old one).</param>
/// <param name="Variance">Var(aᵀx̂) afterwards.</param>
/// <param name="CurrentVariance">Var(aᵀx̂) now.</param>
public readonly record struct RemeasurementOption(
    int ObservationIndex, double CurrentUncertainty, double NewUncertainty, double Variance, double CurrentVariance)
{
    /// <summary>The standard uncertainty afterwards, √Variance.</summary>
    public double StandardUncertainty => Math.Sqrt(Variance);

    /// <summary>The fraction of the current variance removed, 1 − Variance/CurrentVariance.</summary>
    public double VarianceReduction => CurrentVariance > 0.0 ? 1.0 - (Variance / CurrentVariance) : 0.0;
}
