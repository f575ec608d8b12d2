namespace PathFinder.Tui.Analysis;

/// <summary>What the analysis concluded about one measurement (shown as a word, never by colour alone).</summary>
public enum MeasurementStatus
{
    /// <summary>No analysis of consistency has been run (shown "—").</summary>
    NotAnalysed,

    /// <summary>Agrees with the rest of the network within its uncertainty ("ok").</summary>
    Consistent,

    /// <summary>Flagged: its normalized residual is too large ("SUSPECT").</summary>
    Suspect,

    /// <summary>No cycle passes through it, so nothing can check it ("unchecked").</summary>
    Unchecked,
}
