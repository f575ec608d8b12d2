namespace PathFinder.Tui.ViewModels;

/// <summary>Runs an action on the UI thread (the view models never touch views from a worker thread).</summary>
public interface IUiDispatcher
{
    /// <summary>Queues <paramref name="action"/> to run on the UI thread.</summary>
    void Post(Action action);
}
