namespace PathFinder.Thermodynamics;

/// <summary>The heat capacity of reaction ΔrCp = Σ νᵢ·Cp,ᵢ built from signed coefficients and species models, and Kirchhoff's law on it.</summary>
/// <remarks>
/// ΔrCp(T) = Σ νᵢ·Cp,ᵢ(T) in J/(mol·K) per mole of reaction as written; products have ν &gt; 0, reactants ν &lt; 0.
/// Kirchhoff's law: ΔrH(T2) = ΔrH(T1) + ∫ΔrCp dT and ΔrS(T2) = ΔrS(T1) + ∫ΔrCp/T dT, integrals from T1 to T2.
/// Species without a model are treated as contributing nothing (listed in <see cref="SpeciesWithoutData"/>);
/// a key appearing twice is simply two terms.
/// </remarks>
/// <typeparam name="TKey">The caller's opaque species identifier.</typeparam>
public sealed class ReactionHeatCapacity<TKey>
    where TKey : notnull
{
    private readonly ReactionSpecies<TKey>[] _species;

    /// <summary>Creates ΔrCp from the reaction's species.</summary>
    /// <param name="species">Species with signed coefficients (finite) and models (or <see langword="null"/>).</param>
    public ReactionHeatCapacity(IEnumerable<ReactionSpecies<TKey>> species)
    {
        ArgumentNullException.ThrowIfNull(species);
        _species = [.. species];
        foreach (ReactionSpecies<TKey> s in _species)
        {
            if (!double.IsFinite(s.Coefficient))
            {
                throw new ArgumentException($"The coefficient of {s.Species} is not finite.", nameof(species));
            }
        }

        SpeciesWithoutData = [.. _species.Where(s => s.Model is null).Select(s => s.Species)];
    }

    /// <summary>The species as given.</summary>
    public IReadOnlyList<ReactionSpecies<TKey>> Species => _species;

    /// <summary>Species without a heat-capacity model, in the order given.</summary>
    public IReadOnlyList<TKey> SpeciesWithoutData { get; }

    /// <summary>Whether every species has a model.</summary>
    public bool IsComplete => SpeciesWithoutData.Count == 0;

    /// <summary>ΔrCp at <paramref name="temperature"/> in J/(mol·K).</summary>
    /// <param name="temperature">Temperature in K (&gt; 0).</param>
    public double HeatCapacity(double temperature)
    {
        Temperature.RequirePositive(temperature, nameof(temperature));
        return Sum(m => m.HeatCapacity(temperature));
    }

    /// <summary>∫ΔrCp dT from <paramref name="from"/> to <paramref name="to"/> in J/mol.</summary>
    /// <param name="from">T1 in K (&gt; 0).</param>
    /// <param name="to">T2 in K (&gt; 0).</param>
    public double IntegrateHeatCapacity(double from, double to)
    {
        Temperature.RequirePositive(from, nameof(from));
        Temperature.RequirePositive(to, nameof(to));
        return Sum(m => m.IntegrateHeatCapacity(from, to));
    }

    /// <summary>∫ΔrCp/T dT from <paramref name="from"/> to <paramref name="to"/> in J/(mol·K).</summary>
    /// <param name="from">T1 in K (&gt; 0).</param>
    /// <param name="to">T2 in K (&gt; 0).</param>
    public double IntegrateHeatCapacityOverTemperature(double from, double to)
    {
        Temperature.RequirePositive(from, nameof(from));
        Temperature.RequirePositive(to, nameof(to));
        return Sum(m => m.IntegrateHeatCapacityOverTemperature(from, to));
    }

    /// <summary>The species whose models do not cover the whole interval between the two temperatures.</summary>
    /// <param name="from">T1 in K.</param>
    /// <param name="to">T2 in K.</param>
    /// <param name="tolerance">Absolute tolerance in K; default <see cref="TemperatureRange.ExtrapolationTolerance"/> (10 K).</param>
    public IReadOnlyList<SpeciesRangeWarning<TKey>> CheckInterval(double from, double to, double tolerance = TemperatureRange.ExtrapolationTolerance)
    {
        var warnings = new List<SpeciesRangeWarning<TKey>>();
        foreach (ReactionSpecies<TKey> s in _species)
        {
            if (s.Model is not null && s.Model.CheckInterval(from, to, tolerance) is { } warning)
            {
                warnings.Add(new SpeciesRangeWarning<TKey>(s.Species, warning));
            }
        }

        return warnings;
    }

    /// <summary>Moves a reaction enthalpy from <paramref name="from"/> to <paramref name="to"/>: ΔrH(T2) = ΔrH(T1) + ∫ΔrCp dT.</summary>
    /// <param name="enthalpy">ΔrH(T1) in J/mol.</param>
    /// <param name="from">T1 in K (&gt; 0).</param>
    /// <param name="to">T2 in K (&gt; 0).</param>
    /// <param name="tolerance">Range tolerance in K; default <see cref="TemperatureRange.ExtrapolationTolerance"/> (10 K).</param>
    public KirchhoffShift<TKey> ShiftEnthalpy(double enthalpy, double from, double to, double tolerance = TemperatureRange.ExtrapolationTolerance) =>
        new(from, to, enthalpy, IntegrateHeatCapacity(from, to), CheckInterval(from, to, tolerance), SpeciesWithoutData);

    /// <summary>Moves a reaction entropy from <paramref name="from"/> to <paramref name="to"/>: ΔrS(T2) = ΔrS(T1) + ∫ΔrCp/T dT.</summary>
    /// <param name="entropy">ΔrS(T1) in J/(mol·K).</param>
    /// <param name="from">T1 in K (&gt; 0).</param>
    /// <param name="to">T2 in K (&gt; 0).</param>
    /// <param name="tolerance">Range tolerance in K; default <see cref="TemperatureRange.ExtrapolationTolerance"/> (10 K).</param>
    public KirchhoffShift<TKey> ShiftEntropy(double entropy, double from, double to, double tolerance = TemperatureRange.ExtrapolationTolerance) =>
        new(from, to, entropy, IntegrateHeatCapacityOverTemperature(from, to), CheckInterval(from, to, tolerance), SpeciesWithoutData);

    private double Sum(Func<IHeatCapacity, double> term)
    {
        double sum = 0.0;
        foreach (ReactionSpecies<TKey> s in _species)
        {
            if (s.Model is not null)
            {
                sum += s.Coefficient * term(s.Model);
            }
        }

        return sum;
    }
}
