using PathFinder.Data;
using PathFinder.IO;
using PathFinder.Tui.Analysis;
using PathFinder.Tui.ViewModels;
using PathFinder.Tui.Views;
using Terminal.Gui.App;

namespace PathFinder.Tui;

/// <summary>The entry point of <c>pathfinder explore</c>: the interactive terminal explorer of a network.</summary>
public static class ExplorerApp
{
    /// <summary>Exit code: the explorer ran and the user quit.</summary>
    public const int Success = 0;

    /// <summary>Exit code: the explorer cannot start (no terminal, or the network cannot be read).</summary>
    public const int CannotStart = 2;

    /// <summary>Runs the explorer on <paramref name="networkPath"/> with the full analysis; returns the exit code.</summary>
    public static int Run(string networkPath) => Run(networkPath, SolvedAnalysis.Analyzer, Console.Error);

    /// <summary>Runs the explorer with <paramref name="analyzer"/>; messages that prevent starting go to <paramref name="error"/>.</summary>
    /// <returns>0 after a normal quit; 2 when there is no terminal or the network cannot be found.</returns>
    public static int Run(string networkPath, NetworkAnalyzer analyzer, TextWriter error)
    {
        ArgumentNullException.ThrowIfNull(networkPath);
        ArgumentNullException.ThrowIfNull(analyzer);
        ArgumentNullException.ThrowIfNull(error);
        if (Console.IsOutputRedirected || Console.IsInputRedirected)
        {
            error.WriteLine("error: 'explore' is interactive and needs a terminal; input or output is redirected. Use 'validate' (or the other commands) in scripts.");
            return CannotStart;
        }

        if (!File.Exists(networkPath) && !Directory.Exists(networkPath))
        {
            error.WriteLine($"error: {networkPath}: no such file or folder (give a CSV file or a folder of CSV files)");
            return CannotStart;
        }

        // Reading happens before the screen opens, with a line on the terminal, so a large network never shows a
        // frozen, empty screen; everything after that runs off the UI thread.
        Console.Out.WriteLine($"Reading {TerminalText.Visible(networkPath)} …");
        var clock = System.Diagnostics.Stopwatch.StartNew();
        NetworkReadResult data = NetworkReader.Read(networkPath);
        Console.Out.WriteLine($"Read {data.Network.Measurements.Count} measurements in {clock.Elapsed.TotalSeconds:0.0} s; opening the explorer …");
        string? failure = null;
        using (IApplication app = Application.Create())
        {
            app.Init();
            var vm = new ExplorerViewModel(data, networkPath, analyzer, new ApplicationDispatcher(app));
            using ExplorerWindow window = new(app, vm);
            try
            {
                app.Run(window);
            }
            catch (IOException exception)
            {
                failure = exception.Message;
            }
        }

        // Written after the application is disposed: before that, output goes to the alternate screen and is lost.
        if (failure is not null)
        {
            error.WriteLine($"error: {failure}");
            return CannotStart;
        }

        return Success;
    }

    /// <summary>Creates the main window for an application already initialised (used by headless tests).</summary>
    internal static ExplorerWindow CreateWindow(IApplication app, ExplorerViewModel vm) => new(app, vm);

    /// <summary>Creates the view model with a dispatcher that posts to <paramref name="app"/>'s main loop.</summary>
    internal static ExplorerViewModel CreateViewModel(IApplication app, string networkPath, NetworkAnalyzer analyzer) =>
        new(networkPath, analyzer, new ApplicationDispatcher(app));
}
