namespace PathFinder.Diagrams;

/// <summary>Markings of a network node; they combine.</summary>
[Flags]
public enum NetworkNodeFlags
{
    /// <summary>No marking.</summary>
    None = 0,

    /// <summary>On the highlighted route or cycle: thick blue outline, tinted fill.</summary>
    Highlighted = 1,

    /// <summary>Flagged as suspect (for example a failing cycle): dashed vermillion outline and a "!" badge.</summary>
    Suspect = 2,

    /// <summary>Excluded from the calculation: dotted grey outline, grey text and an "excluded" tag.</summary>
    Excluded = 4,
}
