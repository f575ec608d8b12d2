namespace PathFinder.Curation;

/// <summary>A network after curation: what is left, what was excluded (with the reason), and decisions naming unknown ids.</summary>
/// <param name="Network">The network without the excluded measurements.</param>
/// <param name="Excluded">The excluded measurements with the decision that excluded each, in data order.</param>
/// <param name="UnknownIds">Ids in the decisions that name no measurement of the network (the data may have changed).</param>
public sealed record CurationResult(
    ReactionNetwork Network,
    IReadOnlyList<ExcludedMeasurement> Excluded,
    IReadOnlyList<string> UnknownIds);
