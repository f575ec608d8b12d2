using PathFinder.Tui.ViewModels;

namespace PathFinder.Tui.Tests;

/// <summary>Runs posted actions at once, under a lock (view-model tests have no UI thread).</summary>
internal sealed class InlineDispatcher : IUiDispatcher
{
    private readonly Lock _lock = new();

    public void Post(Action action)
    {
        lock (_lock)
        {
            action();
        }
    }
}
