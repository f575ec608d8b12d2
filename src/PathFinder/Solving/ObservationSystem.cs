namespace PathFinder.Solving;

/// <summary>An immutable weighted least-squares problem: n unknowns and m observations aᵢᵀx = vᵢ ± uᵢ.</summary>
/// <remarks>
/// The unknowns are plain indices 0..n−1; the caller maps them to species and has already removed
/// reference-state species (whose values are fixed by convention). Unknowns that appear in no observation are
/// allowed and are reported as undetermined.
/// </remarks>
public sealed class ObservationSystem
{
    private readonly Observation[] _observations;

    /// <summary>Creates a system.</summary>
    /// <exception cref="ArgumentOutOfRangeException">An observation refers to an unknown index ≥ <paramref name="unknownCount"/>.</exception>
    public ObservationSystem(int unknownCount, IEnumerable<Observation> observations)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(unknownCount);
        ArgumentNullException.ThrowIfNull(observations);
        _observations = observations.ToArray();
        for (int i = 0; i < _observations.Length; i++)
        {
            ArgumentNullException.ThrowIfNull(_observations[i], nameof(observations));
            if (_observations[i].Row.MinimumUnknownCount > unknownCount)
            {
                throw new ArgumentOutOfRangeException(
                    nameof(observations), $"Observation {i} refers to unknown {_observations[i].Row.MinimumUnknownCount - 1}, but there are only {unknownCount} unknowns.");
            }
        }

        UnknownCount = unknownCount;
    }

    /// <summary>The number of unknowns n.</summary>
    public int UnknownCount { get; }

    /// <summary>The observations, in the order given (their position is their index everywhere in the results).</summary>
    public IReadOnlyList<Observation> Observations => _observations;

    /// <summary>The number of observations m.</summary>
    public int ObservationCount => _observations.Length;

    /// <summary>Returns a copy in which observation <paramref name="index"/> has another uncertainty.</summary>
    public ObservationSystem WithUncertainty(int index, double uncertainty)
    {
        var copy = (Observation[])_observations.Clone();
        copy[index] = copy[index].WithUncertainty(uncertainty);
        return new ObservationSystem(UnknownCount, copy);
    }

    /// <summary>Returns a copy without observation <paramref name="index"/> (later indices shift down by one).</summary>
    public ObservationSystem Without(int index)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(index);
        ArgumentOutOfRangeException.ThrowIfGreaterThanOrEqual(index, _observations.Length);
        return new ObservationSystem(UnknownCount, _observations.Where((_, k) => k != index));
    }

    /// <summary>Returns a copy with one more observation appended.</summary>
    public ObservationSystem With(Observation observation) => new(UnknownCount, _observations.Append(observation));
}
