namespace PathFinder.Synthetic;

/// <summary>Settings of <see cref="SyntheticNetworkGenerator"/>.</summary>
public sealed record SyntheticNetworkOptions
{
    /// <summary>Number of species (besides element reference states). Default 200.</summary>
    public int SpeciesCount { get; init; } = 200;

    /// <summary>Number of ΔH measurements. Default 1000.</summary>
    /// <remarks>The S° data of <see cref="EntropyFraction"/> and the <see cref="GibbsCount"/> Gibbs-energy data come on top.</remarks>
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

    /// <summary>Share of the generated species, from 0 to 1, given a true S° and one S° datum. Default 0 (ΔH data only).</summary>
    /// <remarks>When above 0, the element reference states and the combustion products CO2(g) and H2O(l) get S° data too,
    /// since ΔfG° of every species needs the S° of its elements. S° uncertainties are 0.05–1 J/(mol·K).</remarks>
    public double EntropyFraction { get; init; }

    /// <summary>Number of ΔG, ln K and log₁₀ K data (a third each, drawn at random) over reactions among species with S°. Default 0.</summary>
    /// <remarks>Temperatures are drawn from 298.15–1000 K; the truth has ΔrCp = 0, so ΔrG°(T) = ΔrH° − T·ΔrS° at 298.15 K.
    /// Uncertainties: ΔG 0.2–3 kJ/mol, ln K 0.01–0.5 (log₁₀ K the same divided by ln 10). Needs <see cref="EntropyFraction"/> above 0.</remarks>
    public int GibbsCount { get; init; }
}
