namespace PathFinder.Curation;

/// <summary>An ordered log of curation decisions; the last decision about an id is the one in force.</summary>
/// <remarks>
/// Immutable: <see cref="Exclude"/> and <see cref="Include"/> return a new set with the decision appended, so
/// the history (who took what out, and back in, and why) is kept in the file.
/// </remarks>
public sealed class CurationSet
{
    private readonly Dictionary<string, CurationDecision> _current;

    /// <summary>Creates a set from decisions in the order they were made.</summary>
    public CurationSet(IEnumerable<CurationDecision> decisions)
    {
        ArgumentNullException.ThrowIfNull(decisions);
        Decisions = decisions.ToArray();
        _current = new Dictionary<string, CurationDecision>(StringComparer.Ordinal);
        foreach (CurationDecision decision in Decisions)
        {
            _current[decision.MeasurementId] = decision;
        }
    }

    /// <summary>A set without decisions.</summary>
    public static CurationSet Empty { get; } = new([]);

    /// <summary>Every decision, oldest first.</summary>
    public IReadOnlyList<CurationDecision> Decisions { get; }

    /// <summary>The ids excluded now (their last decision is an exclusion), in order of that decision.</summary>
    public IReadOnlyList<string> ExcludedIds =>
        Decisions.Where(decision => ReferenceEquals(_current[decision.MeasurementId], decision) && decision.Action == CurationAction.Exclude)
            .Select(decision => decision.MeasurementId)
            .ToArray();

    /// <summary>Whether the measurement <paramref name="id"/> is excluded now.</summary>
    public bool IsExcluded(string id) => _current.TryGetValue(id, out CurationDecision? decision) && decision.Action == CurationAction.Exclude;

    /// <summary>The decision in force for <paramref name="id"/>, or null when there is none.</summary>
    public CurationDecision? CurrentDecision(string id) => _current.GetValueOrDefault(id);

    /// <summary>A set with an exclusion of <paramref name="id"/> appended.</summary>
    /// <exception cref="ArgumentException">The reason is blank.</exception>
    public CurationSet Exclude(string id, string reason, DateOnly date)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(id);
        ArgumentException.ThrowIfNullOrWhiteSpace(reason);
        return new CurationSet(Decisions.Append(new CurationDecision(id, CurationAction.Exclude, reason.Trim(), date)));
    }

    /// <summary>A set with a re-inclusion of <paramref name="id"/> appended; the reason may be empty.</summary>
    public CurationSet Include(string id, string reason, DateOnly date)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(id);
        ArgumentNullException.ThrowIfNull(reason);
        return new CurationSet(Decisions.Append(new CurationDecision(id, CurationAction.Include, reason.Trim(), date)));
    }

    /// <summary>Applies the decisions: the network without excluded measurements, the exclusions with reasons, and unknown ids.</summary>
    public CurationResult Apply(ReactionNetwork network)
    {
        ArgumentNullException.ThrowIfNull(network);
        var excluded = new List<ExcludedMeasurement>();
        foreach (Measurement measurement in network.Measurements)
        {
            if (_current.TryGetValue(measurement.Id, out CurationDecision? decision) && decision.Action == CurationAction.Exclude)
            {
                excluded.Add(new ExcludedMeasurement(measurement, decision));
            }
        }

        string[] unknown = _current.Keys
            .Where(id => !network.TryGetMeasurement(id, out _))
            .Order(StringComparer.Ordinal)
            .ToArray();
        ReactionNetwork kept = excluded.Count == 0 ? network : network.Where(measurement => !IsExcluded(measurement.Id));
        return new CurationResult(kept, excluded, unknown);
    }
}
