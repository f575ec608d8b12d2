namespace PathFinder.Curation;

/// <summary>What saving new decisions did: the file as it is now, and what others had written to it meanwhile.</summary>
/// <param name="Read">The file as written (read back from the bytes written).</param>
/// <param name="ChangedByOthers">Whether the file had changed since it was read (its content was kept and the new decisions added after it).</param>
/// <param name="DecisionsByOthers">Decisions found in the file that were not there when it was read, oldest first.</param>
/// <param name="Conflicts">Ids decided in this session whose decision in force was changed in the file meanwhile; both decisions are in the file, this session's last.</param>
public sealed record CurationSaveResult(
    CurationReadResult Read,
    bool ChangedByOthers,
    IReadOnlyList<CurationDecision> DecisionsByOthers,
    IReadOnlyList<string> Conflicts);
