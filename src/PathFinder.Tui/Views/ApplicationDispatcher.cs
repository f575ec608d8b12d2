using PathFinder.Tui.ViewModels;
using Terminal.Gui.App;

namespace PathFinder.Tui.Views;

/// <summary>Posts actions to the Terminal.Gui main loop with <see cref="IApplication.Invoke(Action)"/>.</summary>
internal sealed class ApplicationDispatcher(IApplication app) : IUiDispatcher
{
    public void Post(Action action) => app.Invoke(action);
}
