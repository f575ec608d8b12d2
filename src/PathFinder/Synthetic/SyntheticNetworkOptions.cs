namespace PathFinder.Synthetic;

/// <summary>Settings of <see cref="SyntheticNetworkGenerator"/>.</summary>
public sealed record SyntheticNetworkOptions
{
    /// <summary>Number of species (besides element reference states). Default 200.</summary>
    public int SpeciesCount { get; init; } = 200;

    /// <summary>Number of measurements. Default 1000.</summary>
    public int MeasurementCount { get; init; } = 1000;

    /// <summary>Seed of the pseudo-random generator; the same seed gives the same network.</summary>
    public int Seed { get; init; } = 1;

    /// <summary>Fraction of measurements given a gross error (an outlier). Default 0.</summary>
    public double OutlierFraction { get; init; }

    /// <summary>Smallest outlier shift in units of the measurement's uncertainty. Default 8.</summary>
    public double OutlierMinSigma { get; init; } = 8.0;

    /// <summary>Largest outlier shift in units of the measurement's uncertainty. Default 30.</summary>
    public double OutlierMaxSigma { get; init; } = 30.0;

    /// <summary>Fraction of measurements that repeat an earlier reaction (another determination). Default 0.25.</summary>
    public double RepeatFraction { get; init; } = 0.25;

    /// <summary>Fraction of measurements in the formation shorthand. Default 0.08.</summary>
    public double FormationFraction { get; init; } = 0.08;

    /// <summary>Fraction of measurements that are combustions to CO2(g), H2O(l) and N2(g). Default 0.1.</summary>
    public double CombustionFraction { get; init; } = 0.1;

    /// <summary>Number of sources measurements are spread over. Default 12.</summary>
    public int SourceCount { get; init; } = 12;

    /// <summary>How far (in species index) reaction partners are drawn from each other, giving families of related species. Default 40.</summary>
    public int Locality { get; init; } = 40;
}
