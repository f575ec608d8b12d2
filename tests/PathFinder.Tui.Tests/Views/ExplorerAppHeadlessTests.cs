using System.Diagnostics;
using PathFinder.Tui.Analysis;
using PathFinder.Tui.ViewModels;
using PathFinder.Tui.Views;
using Terminal.Gui.App;
using Terminal.Gui.Drivers;
using Terminal.Gui.Input;
using Terminal.Gui.Testing;
using Terminal.Gui.Time;
using Terminal.Gui.Views;

namespace PathFinder.Tui.Tests.Views;

/// <summary>Drives the real explorer (ansi driver, buffer output) with injected keys, as a user would.</summary>
public sealed class ExplorerAppHeadlessTests : IDisposable
{
    private readonly DemoNetwork _demo = new();

    public void Dispose() => _demo.Dispose();

    [Fact]
    public void Excluding_with_a_reason_shows_excluded_and_the_saved_decision_is_honoured_after_reopening()
    {
        // Given the explorer on the demo network at 100×30
        var screens = new Dictionary<string, string>();
        using (IApplication app = Headless(100, 30))
        {
            ExplorerViewModel vm = ExplorerApp.CreateViewModel(app, _demo.Folder, SolvedAnalysis.Analyzer);
            using ExplorerWindow window = ExplorerApp.CreateWindow(app, vm);

            // When the user moves to C03, excludes it with a reason, saves and quits
            var steps = new Queue<(string Name, Func<bool> Ready, Action Act)>();
            steps.Enqueue(("start", () => !vm.IsBusy && ScreenText(app).Contains("ready", StringComparison.Ordinal), () =>
            {
                for (int i = 0; i < vm.Measurements.IndexOf("C03"); i++)
                {
                    app.InjectKey(Key.CursorDown);
                }
            }
            ));
            steps.Enqueue(("selected", () => ScreenText(app).Contains("C03  dH = -47.60", StringComparison.Ordinal), () => app.InjectKey(Key.E.WithCtrl)));
            steps.Enqueue(("dialog", () => app.TopRunnableView is Dialog, () =>
            {
                screens["dialog"] = ScreenText(app);
                foreach (char c in "slipped digit")
                {
                    app.InjectKey(new Key(c));
                }

                app.InjectKey(Key.Enter);
            }
            ));
            steps.Enqueue(("excluded", () => ReferenceEquals(app.TopRunnableView, window) && !vm.IsBusy && vm.HasUnsavedChanges, () =>
            {
                screens["excluded"] = ScreenText(app);
                app.InjectKey(Key.S.WithCtrl);
            }
            ));
            steps.Enqueue(("saved", () => !vm.HasUnsavedChanges, () =>
            {
                screens["saved"] = ScreenText(app);
                app.InjectKey(Key.F7);
            }
            ));
            steps.Enqueue(("curation", () => window.CurrentScreen == Screen.Curation, () =>
            {
                app.LayoutAndDraw();
                screens["curation"] = ScreenText(app);
                app.InjectKey(Key.Q.WithCtrl);
            }
            ));
            RunScript(app, window, steps);

            Assert.Empty(steps);
        }

        // Then the dialog asked for a reason, the row said "excluded", the status said UNSAVED, then saved
        Assert.Contains("Exclude C03", screens["dialog"], StringComparison.Ordinal);
        string c03 = Line(screens["excluded"], "│C03");
        Assert.Contains("excluded", c03, StringComparison.Ordinal);
        Assert.Contains("EXCLUDED: slipped digit", screens["excluded"], StringComparison.Ordinal);
        Assert.Contains("UNSAVED", screens["excluded"], StringComparison.Ordinal);
        Assert.Contains("saved 1 decision(s)", screens["saved"], StringComparison.Ordinal);
        Assert.Contains("slipped digit", Line(screens["curation"], "│exclude│C03"), StringComparison.Ordinal);
        Assert.Contains("C03,exclude,slipped digit,", File.ReadAllText(_demo.CurationPath), StringComparison.Ordinal);

        // And when the network is opened again, C03 is still shown excluded
        using (IApplication app = Headless(100, 30))
        {
            ExplorerViewModel vm = ExplorerApp.CreateViewModel(app, _demo.Folder, SolvedAnalysis.Analyzer);
            using ExplorerWindow window = ExplorerApp.CreateWindow(app, vm);
            SessionToken? token = app.Begin(window);
            app.InjectKey(Key.F.WithCtrl);
            foreach (char c in "C03")
            {
                app.InjectKey(new Key(c));
            }

            app.LayoutAndDraw();
            string reopened = ScreenText(app);
            app.End(token!);

            Assert.Contains("excluded", Line(reopened, "│C03"), StringComparison.Ordinal);
            Assert.Contains("1 excluded, saved", reopened, StringComparison.Ordinal);
        }
    }

    [Fact]
    public void Control_characters_from_the_data_are_shown_not_sent_to_the_terminal()
    {
        // Given the demo with a first file whose source clears the screen and retitles the window, and whose note is HTML
        File.WriteAllText(Path.Combine(_demo.Folder, "a-first.csv"),
            "id,equation,property,value,uncertainty,unit,temperature,source,notes\n" +
            "Z01,H2O(l),dH,-285.80,0.05,kJ/mol,,\"\u001b]0;pwned\u0007\u001b[2Jlab\",|<script>\n");
        var screens = new Dictionary<string, string>();
        using IApplication app = Headless(120, 30);
        ExplorerViewModel vm = ExplorerApp.CreateViewModel(app, _demo.Folder, SolvedAnalysis.Analyzer);
        using ExplorerWindow window = ExplorerApp.CreateWindow(app, vm);

        // When the measurements (with the first row's details) and the sources are shown
        var steps = new Queue<(string Name, Func<bool> Ready, Action Act)>();
        steps.Enqueue(("measurements", () => !vm.IsBusy && ScreenText(app).Contains("ready", StringComparison.Ordinal), () => screens["measurements"] = ScreenText(app)));
        steps.Enqueue(("sources", () => true, () => app.InjectKey(Key.F4)));
        steps.Enqueue(("sources shown", () => window.CurrentScreen == Screen.Sources, () => screens["sources"] = ScreenText(app)));
        steps.Enqueue(("quit", () => true, () => app.InjectKey(Key.Q.WithCtrl)));
        RunScript(app, window, steps);

        // Then the sequence appears as text in the table, the details and the sources, and no ESC or BEL is drawn
        Assert.Contains("\\u001B]0;pwned", screens["measurements"], StringComparison.Ordinal);
        Assert.Contains("\\u001B]0;pwned", screens["sources"], StringComparison.Ordinal);
        Assert.DoesNotContain(screens["measurements"] + screens["sources"], c => c is '\u001b' or '\u0007');
    }

    [Fact]
    public void Every_screen_key_shows_its_screen_and_F1_lists_the_keys_at_80_by_24()
    {
        var screens = new Dictionary<string, string>();
        using IApplication app = Headless(80, 24);
        ExplorerViewModel vm = ExplorerApp.CreateViewModel(app, _demo.Folder, SolvedAnalysis.Analyzer);
        using ExplorerWindow window = ExplorerApp.CreateWindow(app, vm);
        var steps = new Queue<(string Name, Func<bool> Ready, Action Act)>();
        foreach ((Key key, string name) in new[] { (Key.F3, "Species"), (Key.F4, "Sources"), (Key.F5, "Target"), (Key.F6, "Consistency"), (Key.F7, "Curation"), (Key.F2, "Measurements") })
        {
            steps.Enqueue((name, () => !vm.IsBusy, () => app.InjectKey(key)));
            steps.Enqueue((name + " shown", () => ScreenText(app).Contains($"[{key} {name}]", StringComparison.Ordinal), () => screens[name] = ScreenText(app)));
        }

        steps.Enqueue(("help", () => true, () => app.InjectKey(Key.F1)));
        steps.Enqueue(("help shown", () => app.TopRunnableView is Dialog, () =>
        {
            screens["help"] = ScreenText(app);
            app.InjectKey(Key.Esc);
        }
        ));
        steps.Enqueue(("closed", () => ReferenceEquals(app.TopRunnableView, window), () => app.InjectKey(Key.Q.WithCtrl)));
        RunScript(app, window, steps);

        Assert.Empty(steps);
        Assert.Contains("best estimate", screens["Species"], StringComparison.Ordinal);
        Assert.Contains("group-c", screens["Sources"], StringComparison.Ordinal);
        Assert.Contains("Target (dH):", screens["Target"], StringComparison.Ordinal);
        Assert.Contains("suspect(s)", screens["Consistency"], StringComparison.Ordinal);
        Assert.Contains("curation.csv", screens["Curation"], StringComparison.Ordinal);
        Assert.Contains("Ctrl+E", screens["help"], StringComparison.Ordinal);
    }

    [Fact]
    public void A_suspect_leads_to_its_cycles_and_source_and_excluding_it_re_solves_the_numbers_on_screen()
    {
        // Given the explorer on the demo network at 80×24, on the consistency screen
        var screens = new Dictionary<string, string>();
        string? before = null;
        using (IApplication app = Headless(80, 24))
        {
            ExplorerViewModel vm = ExplorerApp.CreateViewModel(app, _demo.Folder, SolvedAnalysis.Analyzer);
            using ExplorerWindow window = ExplorerApp.CreateWindow(app, vm);
            var steps = new Queue<(string Name, Func<bool> Ready, Action Act)>();
            steps.Enqueue(("ready", () => !vm.IsBusy && vm.Analysis is not null, () => app.InjectKey(Key.F6)));
            steps.Enqueue(("consistency", () => window.CurrentScreen == Screen.Consistency, () =>
            {
                app.LayoutAndDraw();
                screens["before"] = ScreenText(app);
                before = vm.Consistency.Summary;
                // When the user opens the first suspect's cycles, then jumps to its source
                app.InjectKey(Key.Enter);
            }
            ));
            steps.Enqueue(("its cycles", () => vm.Consistency.CycleFilter is not null, () =>
            {
                app.LayoutAndDraw();
                screens["cycles"] = ScreenText(app);
                app.InjectKey(Key.J.WithCtrl);
            }
            ));
            steps.Enqueue(("its source", () => window.CurrentScreen == Screen.Sources, () =>
            {
                app.LayoutAndDraw();
                screens["source"] = ScreenText(app);
                app.InjectKey(Key.F6);
            }
            ));
            // And excludes the suspect from the consistency screen with a reason
            steps.Enqueue(("back", () => window.CurrentScreen == Screen.Consistency, () => app.InjectKey(Key.E.WithCtrl)));
            steps.Enqueue(("dialog", () => app.TopRunnableView is Dialog, () =>
            {
                screens["dialog"] = ScreenText(app);
                foreach (char c in "copied from the kcal column")
                {
                    app.InjectKey(new Key(c));
                }

                app.InjectKey(Key.Enter);
            }
            ));
            steps.Enqueue(("re-solved", () => ReferenceEquals(app.TopRunnableView, window) && !vm.IsBusy && vm.HasUnsavedChanges && !vm.IsAnalysisStale, () =>
            {
                app.LayoutAndDraw();
                screens["after"] = ScreenText(app);
                app.InjectKey(Key.S.WithCtrl);
            }
            ));
            steps.Enqueue(("saved", () => !vm.HasUnsavedChanges, () => app.InjectKey(Key.Q.WithCtrl)));
            RunScript(app, window, steps);
        }

        // Then the suspect rows, the first one's cycles and its source were shown. The demo has two suspects; the first,
        // most serious, is E04 of group-e (ΔfG°(CO) copied from a kcal/mol column, z ≈ +517), then C03 of group-c
        // (the water-gas shift ΔH slipped in transcription, z ≈ −18). E04's cycles are the G = H − TS closures.
        Assert.Contains("2 suspect(s)", screens["before"], StringComparison.Ordinal);
        string[] suspectRows = screens["before"].Split('\n').Where(line => line.Contains("│E04", StringComparison.Ordinal) || line.Contains("│C03", StringComparison.Ordinal)).ToArray();
        Assert.Equal(2, suspectRows.Length);
        Assert.Contains("│E04", suspectRows[0], StringComparison.Ordinal);
        Assert.Contains("group-e", suspectRows[0], StringComparison.Ordinal);
        Assert.Contains("│C03", suspectRows[1], StringComparison.Ordinal);
        Assert.Contains("group-c", suspectRows[1], StringComparison.Ordinal);
        Assert.Contains("showing cycles through E04", screens["cycles"], StringComparison.Ordinal);
        Assert.Contains("FLAGGED", screens["cycles"], StringComparison.Ordinal);
        Assert.Contains("│1│FLAGGED│", screens["cycles"], StringComparison.Ordinal);
        Assert.DoesNotContain("│3│FLAGGED│", screens["cycles"], StringComparison.Ordinal); // cycle 3 is A02 − A08 + B04 + C03
        Assert.Contains("group-e:", screens["source"], StringComparison.Ordinal);
        Assert.Contains("Exclude E04", screens["dialog"], StringComparison.Ordinal);

        // And after excluding it the re-solved analysis is on screen: one suspect left (C03, which E04 never hid), fewer
        // flagged cycles
        Assert.Contains("1 suspect(s)", screens["after"], StringComparison.Ordinal);
        Assert.DoesNotContain("│E04", screens["after"], StringComparison.Ordinal);
        Assert.Contains("│C03", screens["after"], StringComparison.Ordinal);
        Assert.Contains("UNSAVED", screens["after"], StringComparison.Ordinal);
        Assert.NotNull(before);
        string flaggedBefore = before!.Split(';')[0];
        Assert.DoesNotContain(flaggedBefore, screens["after"], StringComparison.Ordinal);

        // And when the network is opened again, the saved exclusion holds and the analysis has C03 as its one suspect
        using (IApplication app = Headless(80, 24))
        {
            ExplorerViewModel vm = ExplorerApp.CreateViewModel(app, _demo.Folder, SolvedAnalysis.Analyzer);
            using ExplorerWindow window = ExplorerApp.CreateWindow(app, vm);
            var steps = new Queue<(string Name, Func<bool> Ready, Action Act)>();
            steps.Enqueue(("ready", () => !vm.IsBusy && vm.Analysis is not null, () => app.InjectKey(Key.F6)));
            steps.Enqueue(("consistency", () => window.CurrentScreen == Screen.Consistency, () =>
            {
                app.LayoutAndDraw();
                screens["reopened"] = ScreenText(app);
                app.InjectKey(Key.Q.WithCtrl);
            }
            ));
            RunScript(app, window, steps);
        }

        Assert.Contains("1 suspect(s)", screens["reopened"], StringComparison.Ordinal);
        Assert.DoesNotContain("│E04", screens["reopened"], StringComparison.Ordinal);
        Assert.Contains("│C03", screens["reopened"], StringComparison.Ordinal);
        Assert.Contains("1 excluded, saved", screens["reopened"], StringComparison.Ordinal);
        Assert.Contains("E04,exclude,copied from the kcal column,", File.ReadAllText(_demo.CurationPath), StringComparison.Ordinal);
    }

    [Fact]
    public void Keys_typed_fast_after_Enter_in_the_reason_dialog_never_join_that_reason()
    {
        // Given the explorer on the demo network, first row selected
        string? id = null;
        using IApplication app = Headless(100, 30);
        ExplorerViewModel vm = ExplorerApp.CreateViewModel(app, _demo.Folder, SolvedAnalysis.Analyzer);
        using ExplorerWindow window = ExplorerApp.CreateWindow(app, vm);
        var steps = new Queue<(string Name, Func<bool> Ready, Action Act)>();
        steps.Enqueue(("ready", () => !vm.IsBusy && vm.Analysis is not null, () =>
        {
            id = vm.Measurements.Rows[0].Measurement.Id;
            app.InjectKey(Key.E.WithCtrl);
        }
        ));

        // When the reason, Enter and the next keys arrive before the dialog has closed (one batch of input)
        steps.Enqueue(("dialog", () => app.TopRunnableView is Dialog, () =>
        {
            foreach (char c in "first reason")
            {
                app.InjectKey(new Key(c));
            }

            app.InjectKey(Key.Enter);
            foreach (char c in "next")
            {
                app.InjectKey(new Key(c));
            }
        }
        ));
        steps.Enqueue(("closed", () => ReferenceEquals(app.TopRunnableView, window) && vm.HasUnsavedChanges, () => app.InjectKey(Key.Q.WithCtrl)));
        steps.Enqueue(("asked", () => app.TopRunnableView is Dialog, () => app.InjectKey(Key.Esc)));
        steps.Enqueue(("quit", () => ReferenceEquals(app.TopRunnableView, window), () => window.RequestStop()));
        RunScript(app, window, steps);

        // Then the decision holds only the reason typed before Enter
        Assert.Equal("first reason", vm.Curation.CurrentDecision(id!)!.Reason);
    }

    private static void RunScript(IApplication app, ExplorerWindow window, Queue<(string Name, Func<bool> Ready, Action Act)> steps)
    {
        var clock = Stopwatch.StartNew();
        EventHandler<EventArgs<IApplication?>>? handler = null;
        handler = (_, _) =>
        {
            if (clock.Elapsed > TimeSpan.FromSeconds(30))
            {
                // Safety stop: the assertions then name the step that never became ready.
                app.RequestStop(app.TopRunnable);
                return;
            }

            if (steps.Count > 0 && steps.Peek().Ready())
            {
                steps.Dequeue().Act();
            }
        };
        app.Iteration += handler;
        try
        {
            app.Run(window);
        }
        finally
        {
            app.Iteration -= handler;
        }

        Assert.True(steps.Count == 0, steps.Count == 0 ? "" : $"step '{steps.Peek().Name}' never became ready; screen:\n{ScreenText(app)}");
    }

    /// <summary>A headless application with the ANSI driver and a screen of the given size, on virtual time.</summary>
    private static IApplication Headless(int width, int height)
    {
        IApplication app = Application.Create(new VirtualTimeProvider());
        app.Init(DriverRegistry.Names.ANSI);
        app.Driver!.SetScreenSize(width, height);
        return app;
    }

    private static string ScreenText(IApplication app) => app.Driver!.ToString() ?? "";

    private static string Line(string screen, string start) =>
        screen.Split('\n').FirstOrDefault(line => line.Contains(start, StringComparison.Ordinal)) ?? "";
}
