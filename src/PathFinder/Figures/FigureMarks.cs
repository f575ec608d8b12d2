namespace PathFinder.Figures;

/// <summary>Measurement ids to mark in a network diagram: suspects (from the consistency check) and excluded ones (curation).</summary>
/// <param name="Suspects">Ids drawn as suspects.</param>
/// <param name="Excluded">Ids drawn as excluded.</param>
public sealed record FigureMarks(IReadOnlySet<string> Suspects, IReadOnlySet<string> Excluded)
{
    /// <summary>No marks.</summary>
    public static FigureMarks None { get; } = new(new HashSet<string>(), new HashSet<string>());
}
