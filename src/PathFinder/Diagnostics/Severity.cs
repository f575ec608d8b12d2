namespace PathFinder.Diagnostics;

/// <summary>How serious a diagnostic is.</summary>
public enum Severity
{
    /// <summary>Worth knowing; the analysis proceeds unchanged.</summary>
    Warning,

    /// <summary>The affected record cannot be used; the data set does not pass validation.</summary>
    Error,

    /// <summary>Said for completeness: something was not read on purpose (a subfolder, a lock file); no action needed.</summary>
    Note,
}
