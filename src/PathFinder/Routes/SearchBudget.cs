using System.Diagnostics;

namespace PathFinder.Routes;

/// <summary>Tracks the time budget, the work budget, cancellation and early stop shared by one search.</summary>
internal sealed class SearchBudget
{
    private readonly TimeSpan? _limit;
    private readonly long? _stepLimit;
    private readonly CancellationToken _token;

    public SearchBudget(TimeSpan? limit, CancellationToken token, long? stepLimit = null)
    {
        _limit = limit;
        _stepLimit = stepLimit;
        _token = token;
        Clock = Stopwatch.StartNew();
    }

    public Stopwatch Clock { get; }

    /// <summary>Search steps taken so far (calls of <see cref="ShouldStop"/>): the same for the same input on any machine.</summary>
    public long Steps { get; private set; }

    public SearchCut Cut { get; private set; }

    public bool Stopped { get; private set; }

    public void Mark(SearchCut cut) => Cut |= cut;

    public void Stop(SearchCut reason)
    {
        Cut |= reason;
        Stopped = true;
    }

    /// <summary>Counts one search step; returns true when the search must stop. Checks the clock only every 256 steps.</summary>
    public bool ShouldStop()
    {
        if (Stopped)
        {
            return true;
        }

        if (++Steps > _stepLimit)
        {
            Stop(SearchCut.WorkBudget);
            return true;
        }

        if ((Steps & 255) != 0)
        {
            return false;
        }

        if (_token.IsCancellationRequested)
        {
            Stop(SearchCut.Cancelled);
        }
        else if (_limit is { } limit && Clock.Elapsed > limit)
        {
            Stop(SearchCut.TimeBudget);
        }

        return Stopped;
    }
}
