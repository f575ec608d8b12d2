namespace PathFinder.Cli;

/// <summary>The process exit codes of every command, documented in <c>--help</c> and the README.</summary>
public static class ExitCodes
{
    /// <summary>Success: the data are valid (warnings allowed) and the analysis found nothing wrong.</summary>
    public const int Success = 0;

    /// <summary>The analysis found a problem in the data: an inconsistency, or no route to the target.</summary>
    public const int AnalysisProblem = 1;

    /// <summary>Invalid input or usage: unreadable or invalid data, bad options; nothing was written.</summary>
    public const int InvalidInput = 2;

    /// <summary>An internal error (a defect in PathFinder); please report it with the input that caused it.</summary>
    public const int InternalError = 3;

    /// <summary>The text shown at the end of every command's help.</summary>
    public const string HelpText =
        "Exit codes: 0 = success (warnings allowed); 1 = the analysis found a problem in the data " +
        "(inconsistent cycles, no route); 2 = invalid input or usage (nothing written); 3 = internal error.";
}
