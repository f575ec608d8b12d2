namespace PathFinder.Routes;

/// <summary>Reasons a route or cycle search may have left part of its search space unexplored.</summary>
[Flags]
public enum SearchCut
{
    /// <summary>Nothing was cut: the search is complete.</summary>
    None = 0,

    /// <summary>A branch that could still grow was stopped by the step (or cycle size) bound; longer results may exist.</summary>
    StepBound = 1,

    /// <summary>The time budget ran out.</summary>
    TimeBudget = 2,

    /// <summary>The cancellation token was signalled.</summary>
    Cancelled = 4,

    /// <summary>The search stopped after the requested number of results (<c>StopAfter</c>).</summary>
    StoppedEarly = 8,

    /// <summary>The work budget (a number of search steps) ran out: unlike a time budget, the same input gives the same result on any machine.</summary>
    WorkBudget = 16,
}
