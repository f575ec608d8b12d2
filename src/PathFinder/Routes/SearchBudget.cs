using System.Diagnostics;

namespace PathFinder.Routes;

/// <summary>Tracks the time budget, cancellation and early stop shared by one search.</summary>
internal sealed class SearchBudget
{
    private readonly TimeSpan? _limit;
    private readonly CancellationToken _token;
    private int _tick;

    public SearchBudget(TimeSpan? limit, CancellationToken token)
    {
        _limit = limit;
        _token = token;
        Clock = Stopwatch.StartNew();
    }

    public Stopwatch Clock { get; }

    public SearchCut Cut { get; private set; }

    public bool Stopped { get; private set; }

    public void Mark(SearchCut cut) => Cut |= cut;

    public void Stop(SearchCut reason)
    {
        Cut |= reason;
        Stopped = true;
    }

    /// <summary>Returns true when the search must stop; checks the clock only every 256 calls.</summary>
    public bool ShouldStop()
    {
        if (Stopped)
        {
            return true;
        }

        if ((++_tick & 255) != 0)
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
