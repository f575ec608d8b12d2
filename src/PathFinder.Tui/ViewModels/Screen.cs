namespace PathFinder.Tui.ViewModels;

/// <summary>The explorer's screens.</summary>
public enum Screen
{
    /// <summary>All measurements with residuals and status.</summary>
    Measurements,

    /// <summary>Species with best estimates.</summary>
    Species,

    /// <summary>Per-source summary and diagnostics.</summary>
    Sources,

    /// <summary>Routes to a target reaction.</summary>
    Target,

    /// <summary>Flagged cycles and suspects.</summary>
    Consistency,

    /// <summary>The curation decisions.</summary>
    Curation,
}
