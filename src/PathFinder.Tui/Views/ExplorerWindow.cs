using System.Collections.ObjectModel;
using System.Drawing;
using PathFinder.IO;
using PathFinder.Quantities;
using PathFinder.Tui.Analysis;
using PathFinder.Tui.ViewModels;
using Terminal.Gui.App;
using Terminal.Gui.Input;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace PathFinder.Tui.Views;

/// <summary>The explorer's main window: a screen bar, one screen at a time, and a status line; all keys handled here.</summary>
internal sealed class ExplorerWindow : Window
{
    private static readonly (Screen Screen, Key Key, string Name)[] ScreenKeys =
    [
        (Screen.Measurements, Key.F2, "Measurements"),
        (Screen.Species, Key.F3, "Species"),
        (Screen.Sources, Key.F4, "Sources"),
        (Screen.Target, Key.F5, "Target"),
        (Screen.Consistency, Key.F6, "Consistency"),
        (Screen.Curation, Key.F7, "Curation"),
    ];

    private readonly IApplication _app;
    private readonly ExplorerViewModel _vm;
    private readonly Label _screenBar = new() { X = 0, Y = 0, Width = Dim.Fill(), Height = 1 };
    private readonly Label _status = new() { X = 0, Y = Pos.AnchorEnd(2), Width = Dim.Fill(), Height = 1 };
    private readonly Label _keys = new() { X = 0, Y = Pos.AnchorEnd(1), Width = Dim.Fill(), Height = 1, Text = "F1 help  Ctrl+E exclude/include  Ctrl+S save  Ctrl+X export  Ctrl+Q quit" };
    private readonly Dictionary<Screen, View> _screens = [];

    // Measurements
    private readonly TextField _filter = new() { X = 8, Y = 0, Width = Dim.Percent(50) };
    private readonly Label _sort = new() { X = Pos.Percent(50) + 10, Y = 0, Width = Dim.Fill(), Height = 1 };
    private readonly TableView _measurements = NewTable();
    private readonly Label _measurementDetails = new() { X = 0, Y = Pos.AnchorEnd(4), Width = Dim.Fill(), Height = 4 };

    // Species, sources, curation
    private readonly TableView _species = NewTable();
    private readonly TableView _sources = NewTable();
    private readonly Label _sourceDetails = new() { X = 0, Y = Pos.AnchorEnd(5), Width = Dim.Fill(), Height = 5 };
    private readonly TableView _curation = NewTable();
    private readonly Label _curationInfo = new() { X = 0, Y = 0, Width = Dim.Fill(), Height = 2 };

    // Target
    private readonly Label _targetLabel = new() { X = 0, Y = 0, Height = 1 };
    private readonly TextField _target = new() { Y = 0, Width = Dim.Fill() };
    private readonly Label _targetCaret = new() { Y = 1, Width = Dim.Fill(), Height = 1 };
    private readonly Label _targetError = new() { X = 0, Y = 2, Width = Dim.Fill(), Height = 2 };
    private readonly TableView _routes = NewTable();
    private readonly ListView _speciesPick = new() { X = 0, Y = 0, Width = Dim.Fill(), Height = Dim.Fill() };
    private readonly Label _estimate = new() { X = 0, Y = Pos.AnchorEnd(2), Width = Dim.Fill(), Height = 2 };

    // Consistency
    private readonly Label _consistencySummary = new() { X = 0, Y = 0, Width = Dim.Fill(), Height = 1 };
    private readonly TableView _suspects = NewTable();
    private readonly TableView _cycles = NewTable();

    private readonly object? _statusTimer;
    private int _targetRefused;
    private Screen _current = Screen.Measurements;

    public ExplorerWindow(IApplication app, ExplorerViewModel vm)
    {
        _app = app;
        _vm = vm;
        Title = "PathFinder explorer";
        BorderStyle = Terminal.Gui.Drawing.LineStyle.Single;
        var content = new View { X = 0, Y = 1, Width = Dim.Fill(), Height = Dim.Fill(2), CanFocus = true };
        Add(_screenBar, content, _status, _keys);

        _screens[Screen.Measurements] = BuildMeasurements();
        _screens[Screen.Species] = Screenview(_species);
        _screens[Screen.Sources] = BuildSources();
        _screens[Screen.Target] = BuildTarget();
        _screens[Screen.Consistency] = BuildConsistency();
        _screens[Screen.Curation] = BuildCuration();
        foreach (View screen in _screens.Values)
        {
            content.Add(screen);
        }

        _vm.Changed += (_, _) => RefreshAll();
        _app.Keyboard.KeyDown += OnAppKeyDown;
        // While background work runs, the status line counts the seconds (the only redraw the timer causes).
        _statusTimer = _app.AddTimeout(TimeSpan.FromMilliseconds(500), () =>
        {
            if (_vm.IsBusy)
            {
                _status.Text = TerminalText.Visible(_vm.StatusText);
            }

            return true;
        });
        // Focus can only move once the window is running; until then the first field would keep it.
        Initialized += (_, _) => FocusCurrentScreen();
        IsRunningChanged += (_, _) => FocusCurrentScreen();
        _app.Iteration += OfferRecoveredOnce;
        ShowScreen(Screen.Measurements);
        RefreshAll();
    }

    /// <summary>The screen shown.</summary>
    public Screen CurrentScreen => _current;

    protected override void Dispose(bool disposing)
    {
        if (disposing)
        {
            _app.Keyboard.KeyDown -= OnAppKeyDown;
            _app.Iteration -= OfferRecoveredOnce;
            if (_statusTimer is not null)
            {
                _app.RemoveTimeout(_statusTimer);
            }
            foreach (View screen in _screens.Values.Where(screen => screen.SuperView is null))
            {
                screen.Dispose();
            }
        }

        base.Dispose(disposing);
    }

    private void OfferRecoveredOnce(object? sender, EventArgs<IApplication?> e)
    {
        if (!ReferenceEquals(_app.TopRunnableView, this))
        {
            return;
        }

        _app.Iteration -= OfferRecoveredOnce;
        OfferRecovered();
    }

    private static TableView NewTable() => new()
    {
        FullRowSelect = true,
        MaxCellWidth = 44,
        Width = Dim.Fill(),
    };

    private static View Screenview(TableView table)
    {
        var screen = new View { X = 0, Y = 0, Width = Dim.Fill(), Height = Dim.Fill(), CanFocus = true };
        table.Y = 0;
        table.Height = Dim.Fill();
        screen.Add(table);
        return screen;
    }

    private View BuildMeasurements()
    {
        var screen = new View { X = 0, Y = 0, Width = Dim.Fill(), Height = Dim.Fill(), CanFocus = true };
        var filterLabel = new Label { X = 0, Y = 0, Text = "Filter:" };
        _measurements.Y = 1;
        _measurements.Height = Dim.Fill(4);
        screen.Add(filterLabel, _filter, _sort, _measurements, _measurementDetails);
        _filter.TextChanged += (_, _) =>
        {
            _vm.Measurements.SetFilter(_filter.Text);
            RefreshMeasurements();
        };
        _filter.Accepting += (_, e) =>
        {
            e.Handled = true;
            _measurements.SetFocus();
        };
        _measurements.ValueChanged += (_, _) => ShowMeasurementDetails();
        return screen;
    }

    private View BuildSources()
    {
        var screen = new View { X = 0, Y = 0, Width = Dim.Fill(), Height = Dim.Fill(), CanFocus = true };
        _sources.Y = 0;
        _sources.Height = Dim.Fill(5);
        screen.Add(_sources, _sourceDetails);
        _sources.ValueChanged += (_, _) => ShowSourceDetails();
        return screen;
    }

    private View BuildTarget()
    {
        var screen = new View { X = 0, Y = 0, Width = Dim.Fill(), Height = Dim.Fill(), CanFocus = true };
        _targetLabel.Width = 20;
        _target.X = Pos.Right(_targetLabel);
        _targetCaret.X = Pos.Right(_targetLabel);
        var pickFrame = new FrameView { Title = "Species (Enter picks)", X = Pos.Percent(70), Y = 4, Width = Dim.Fill(), Height = Dim.Fill(2) };
        pickFrame.Add(_speciesPick);
        _routes.Y = 4;
        _routes.Width = Dim.Percent(70);
        _routes.Height = Dim.Fill(2);
        screen.Add(_targetLabel, _target, _targetCaret, _targetError, _routes, pickFrame, _estimate);
        // Terminal.Gui's TextField does work proportional to its length on every key, so a paste of thousands of
        // characters (arriving as single keys) took minutes; the field refuses keys past the cap at once instead.
        _target.KeyDown += (_, key) =>
        {
            // Only keys that insert a character are refused; Backspace, Delete and the arrows keep working at the cap.
            if (key.AsRune.Value != 0 && !System.Text.Rune.IsControl(key.AsRune) && !key.IsCtrl && !key.IsAlt && _target.Text.Length >= TargetViewModel.MaxInputLength)
            {
                key.Handled = true;
                _targetRefused++;
                ShowTargetCap();
            }
        };
        _target.TextChanging += (_, e) =>
        {
            if (e.Result is { Length: > TargetViewModel.MaxInputLength } text)
            {
                _targetRefused += text.Length - TargetViewModel.MaxInputLength;
                e.Result = text[..TargetViewModel.MaxInputLength];
                ShowTargetCap();
            }
        };
        _target.Accepting += (_, e) =>
        {
            e.Handled = true;
            _targetRefused = 0;
            _vm.Target.Submit(_target.Text);
            RefreshTarget();
        };
        _routes.Accepting += (_, e) =>
        {
            e.Handled = true;
            int row = _routes.Value?.SelectedCell.Y ?? -1;
            if (row >= 0 && row < _vm.Target.Routes.Count)
            {
                Dialogs.ShowText(_app, $"Route {row + 1}, step by step", _vm.Target.Explain(row));
            }
        };
        _speciesPick.Accepting += (_, e) =>
        {
            e.Handled = true;
            IReadOnlyList<string> choices = _vm.Target.SpeciesChoices;
            int index = _speciesPick.Value ?? -1;
            if (index >= 0 && index < choices.Count)
            {
                _target.Text = TerminalText.Visible(choices[index]);
                _vm.Target.PickSpecies(choices[index]);
                RefreshTarget();
            }
        };
        return screen;
    }

    private View BuildConsistency()
    {
        var screen = new View { X = 0, Y = 0, Width = Dim.Fill(), Height = Dim.Fill(), CanFocus = true };
        var suspectsFrame = new FrameView { Title = "Suspects (Enter: its cycles, Ctrl+G: measurement, Ctrl+J: source)", X = 0, Y = 1, Width = Dim.Fill(), Height = Dim.Percent(45) };
        var cyclesFrame = new FrameView { Title = "Cycles (Tab here; Ctrl+X .svg draws the selected one)", X = 0, Y = Pos.Bottom(suspectsFrame), Width = Dim.Fill(), Height = Dim.Fill() };
        _suspects.Height = Dim.Fill();
        _cycles.Height = Dim.Fill();
        suspectsFrame.Add(_suspects);
        cyclesFrame.Add(_cycles);
        screen.Add(_consistencySummary, suspectsFrame, cyclesFrame);
        _suspects.Accepting += (_, e) =>
        {
            e.Handled = true;
            if (SelectedSuspect() is { } suspect)
            {
                _vm.Consistency.ShowCyclesThrough(suspect.MeasurementId);
                RefreshConsistency();
            }
        };
        return screen;
    }

    private View BuildCuration()
    {
        var screen = new View { X = 0, Y = 0, Width = Dim.Fill(), Height = Dim.Fill(), CanFocus = true };
        _curation.Y = 2;
        _curation.Height = Dim.Fill();
        screen.Add(_curationInfo, _curation);
        return screen;
    }

    private void ShowScreen(Screen screen)
    {
        _current = screen;
        foreach ((Screen key, View view) in _screens)
        {
            view.Visible = key == screen;
        }

        _screenBar.Text = string.Join(" ", ScreenKeys.Select(s => s.Screen == screen ? $"[{s.Key} {s.Name}]" : $"{s.Key} {s.Name}"));
        FocusCurrentScreen();
        SetNeedsDraw();
    }

    private void FocusCurrentScreen()
    {
        View focus = _current switch
        {
            Screen.Measurements => _measurements,
            Screen.Species => _species,
            Screen.Sources => _sources,
            Screen.Target => _target,
            Screen.Consistency => _suspects,
            _ => _curation,
        };
        focus.SetFocus();
    }

    private void OnAppKeyDown(object? sender, Key key)
    {
        if (!ReferenceEquals(_app.TopRunnableView, this))
        {
            return;
        }

        key.Handled = HandleKey(key);
    }

    private bool HandleKey(Key key)
    {
        foreach ((Screen screen, Key screenKey, _) in ScreenKeys)
        {
            if (key == screenKey)
            {
                ShowScreen(screen);
                return true;
            }
        }

        if (key == Key.F1)
        {
            Dialogs.ShowText(_app, "Keys", KeyHelp.All.Select(k => $"{k.Keys,-17} {k.Action}").ToArray());
        }
        else if (key == Key.Q.WithCtrl)
        {
            Quit();
        }
        else if (key == Key.S.WithCtrl)
        {
            Save();
        }
        else if (key == Key.E.WithCtrl)
        {
            ToggleExclusion();
        }
        else if (key == Key.X.WithCtrl)
        {
            Export();
        }
        else if (key == Key.A.WithCtrl)
        {
            _vm.Recompute();
        }
        else if (key == Key.Esc)
        {
            // Esc never quits the explorer; it clears the current narrowing.
            if (_current == Screen.Measurements && _filter.Text.Length > 0)
            {
                _filter.Text = "";
            }
            else if (_current == Screen.Consistency)
            {
                _vm.Consistency.ShowCyclesThrough(null);
                RefreshConsistency();
            }
        }
        else if (_current == Screen.Measurements && key == Key.F.WithCtrl)
        {
            _filter.SetFocus();
        }
        else if (_current == Screen.Measurements && key == Key.O.WithCtrl)
        {
            _vm.Measurements.NextSortColumn();
            RefreshMeasurements();
        }
        else if (_current == Screen.Measurements && key == Key.R.WithCtrl)
        {
            _vm.Measurements.SortBy(_vm.Measurements.SortColumn);
            RefreshMeasurements();
        }
        else if (_current == Screen.Target && key == Key.P.WithCtrl)
        {
            _vm.Target.NextProperty();
            RefreshTarget();
        }
        else if (_current == Screen.Consistency && key == Key.G.WithCtrl && SelectedSuspect() is { } toMeasurement)
        {
            GoToMeasurement(toMeasurement.MeasurementId);
        }
        else if (_current == Screen.Consistency && key == Key.J.WithCtrl && SelectedSuspect() is { } toSource)
        {
            string? source = _vm.Consistency.SourceOf(toSource.MeasurementId);
            ShowScreen(Screen.Sources);
            int row = source is null ? -1 : _vm.Sources.IndexOf(source);
            if (row >= 0)
            {
                Select(_sources, row);
            }
        }
        else
        {
            return false;
        }

        return true;
    }

    private void GoToMeasurement(string id)
    {
        _filter.Text = "";
        ShowScreen(Screen.Measurements);
        int row = _vm.Measurements.IndexOf(id);
        if (row >= 0)
        {
            Select(_measurements, row);
        }
    }

    private void Quit()
    {
        if (_vm.HasUnsavedChanges)
        {
            int? answer = Dialogs.Ask(_app, "Unsaved decisions", $"Save the curation decisions to {_vm.CurationPath} before quitting?", "_Cancel", "_Discard", "_Save");
            if (answer is null or 0)
            {
                return;
            }

            if (answer == 2)
            {
                Save();
                if (_vm.HasUnsavedChanges)
                {
                    return;
                }
            }
            else
            {
                _vm.DiscardUnsaved();
            }
        }

        RequestStop();
    }

    private void Save()
    {
        string message = _vm.Save();
        if (_vm.SaveConflicts.Count > 0)
        {
            Dialogs.ShowText(_app, "Decided differently by someone else", [.. message.Split("; ")]);
        }
    }

    /// <summary>Offers the decisions an earlier session left unsaved (it ended without saving, e.g. the terminal was closed).</summary>
    private void OfferRecovered()
    {
        IReadOnlyList<PathFinder.Curation.CurationDecision> recovered = _vm.RecoveredDecisions;
        if (recovered.Count == 0)
        {
            return;
        }

        IEnumerable<string> lines = recovered.Take(8).Select(decision => "  " + decision).Concat(recovered.Count > 8 ? [$"  … and {recovered.Count - 8} more"] : []);
        string text = $"An earlier session ended without saving {recovered.Count} decision(s):\n{string.Join("\n", lines)}\nRestore them (as unsaved; Ctrl+S saves), discard them, or decide later?";
        int? answer = Dialogs.Ask(_app, "Unsaved decisions found", text, "_Later", "_Discard", "_Restore");
        if (answer == 2)
        {
            _vm.RestoreRecovered();
        }
        else if (answer == 1)
        {
            _vm.DiscardRecovered();
        }
    }

    private void ToggleExclusion()
    {
        string? id = _current switch
        {
            Screen.Measurements => SelectedMeasurement()?.Measurement.Id,
            Screen.Consistency => SelectedSuspect()?.MeasurementId,
            _ => null,
        };
        if (id is null)
        {
            _vm.Include("", "");
            return;
        }

        if (_vm.Curation.IsExcluded(id))
        {
            string? reason = Dialogs.AskText(_app, $"Re-include {id}", $"Take {id} back into the analysis. Reason (optional):", "");
            if (reason is not null)
            {
                _vm.Include(id, reason);
            }
        }
        else
        {
            string? reason = Dialogs.AskText(_app, $"Exclude {id}", $"Leave {id} out of the analysis. Reason (required, saved with the decision):", "");
            if (reason is not null)
            {
                _vm.Exclude(id, reason);
            }
        }
    }

    private void Export()
    {
        (TableSnapshot table, DiagramFocus focus, string drawing) = ExportChoice();
        string suggestion = Path.Combine(Path.GetDirectoryName(Path.GetFullPath(_vm.NetworkPath)) ?? ".", $"{table.Title.ToLowerInvariant()}.csv");
        string? path = Dialogs.AskText(_app, $"Export {table.Title}", $"File path: .csv, .json or .md writes this table; .svg draws {drawing}.", suggestion);
        if (path is not null)
        {
            _vm.Export(path, table, focus);
        }
    }

    /// <summary>The table of the current screen and what a diagram exported from here shows.</summary>
    private (TableSnapshot Table, DiagramFocus Focus, string Drawing) ExportChoice()
    {
        switch (_current)
        {
            case Screen.Species:
                return (_vm.Species.Snapshot(), DiagramFocus.Network, "the whole network");
            case Screen.Sources:
                return (_vm.Sources.Snapshot(), DiagramFocus.Network, "the whole network");
            case Screen.Curation:
                return (_vm.CurationLog.Snapshot(), DiagramFocus.Network, "the whole network");
            case Screen.Target:
                int route = _routes.Value?.SelectedCell.Y ?? -1;
                return route >= 0 && route < _vm.Target.Routes.Count
                    ? (_vm.Target.Snapshot(), new DiagramFocus(Route: _vm.Target.Routes[route]), $"route {route + 1} (network and levels)")
                    : (_vm.Target.Snapshot(), DiagramFocus.Network, "the whole network (no route selected)");
            case Screen.Consistency when _cycles.HasFocus:
                int cycle = _cycles.Value?.SelectedCell.Y ?? -1;
                IReadOnlyList<(int Number, CycleReport Cycle)> cycles = _vm.Consistency.Cycles;
                return cycle >= 0 && cycle < cycles.Count
                    ? (_vm.Consistency.CycleSnapshot(), new DiagramFocus(Cycle: cycles[cycle].Cycle), $"cycle {cycles[cycle].Number} (network and closure)")
                    : (_vm.Consistency.CycleSnapshot(), DiagramFocus.Network, "the whole network");
            case Screen.Consistency:
                string? suspect = SelectedSuspect()?.MeasurementId;
                return (_vm.Consistency.Snapshot(), new DiagramFocus(MeasurementId: suspect), suspect is null ? "the whole network" : $"the neighbourhood of {suspect}");
            default:
                string? id = SelectedMeasurement()?.Measurement.Id;
                return (_vm.Measurements.Snapshot(), new DiagramFocus(MeasurementId: id), id is null ? "the whole network" : $"the neighbourhood of {id}");
        }
    }

    private MeasurementRow? SelectedMeasurement()
    {
        int row = _measurements.Value?.SelectedCell.Y ?? -1;
        return row >= 0 && row < _vm.Measurements.Rows.Count ? _vm.Measurements.Rows[row] : null;
    }

    private SuspectReport? SelectedSuspect()
    {
        int row = _suspects.Value?.SelectedCell.Y ?? -1;
        return row >= 0 && row < _vm.Consistency.Suspects.Count ? _vm.Consistency.Suspects[row] : null;
    }

    private static void Select(TableView table, int row) => table.Value = new TableSelection(new Point(0, row));

    /// <summary>Shows <paramref name="rows"/> in <paramref name="table"/>, keeping the selected position.</summary>
    /// <param name="table">The table view.</param>
    /// <param name="headers">Column headers.</param>
    /// <param name="rows">The rows; when it is the list already shown (same instance), nothing is rebuilt.</param>
    /// <param name="cells">Formats one row (called only for rows drawn).</param>
    /// <param name="reuse">Whether the cells of an unchanged list may be kept (false when they depend on other state).</param>
    private static void SetRows<T>(TableView table, IReadOnlyList<string> headers, IReadOnlyList<T> rows, Func<T, int, IReadOnlyList<string>> cells, bool reuse = true)
    {
        if (reuse && table.Table is RowsTableSource<T> shown && ReferenceEquals(shown.RowList, rows))
        {
            return;
        }

        int selected = table.Value?.SelectedCell.Y ?? 0;
        table.Table = new RowsTableSource<T>(headers, rows, cells);
        if (rows.Count > 0)
        {
            Select(table, Math.Clamp(selected, 0, rows.Count - 1));
        }

        table.Update();
    }

    private void RefreshAll()
    {
        Title = TerminalText.Visible($"PathFinder explorer - {_vm.Title}");
        _status.Text = TerminalText.Visible(_vm.StatusText);
        RefreshMeasurements();
        SetRows(_species, SpeciesViewModel.Headers, _vm.Species.Rows, (row, _) => SpeciesViewModel.Cells(row));
        SetRows(_sources, SourcesViewModel.Headers, _vm.Sources.Rows, (row, _) => _vm.Sources.Cells(row), reuse: false);
        ShowSourceDetails();
        RefreshTarget();
        RefreshConsistency();
        SetRows(_curation, CurationLogViewModel.Headers, _vm.CurationLog.Rows, (row, _) => _vm.CurationLog.Cells(row), reuse: false);
        string unapplied = _vm.UnappliedCurationRows.Count == 0 ? "" : $"  {_vm.UnappliedCurationRows.Count} row(s) of the file NOT APPLIED (kept as written; listed first).";
        string problems = _vm.CurationDiagnostics.Count == 0 ? "" : $"  {_vm.CurationDiagnostics.Count} problem(s) in the file (`pathfinder validate` lists each with line and column).";
        _curationInfo.Text = TerminalText.Visible($"Decisions file: {_vm.CurationPath} ({(_vm.HasUnsavedChanges ? "UNSAVED changes, Ctrl+S saves" : "saved")})") + "\n" +
            TerminalText.Visible($"{_vm.Curated.Excluded.Count} measurement(s) excluded now.{unapplied}{problems}");
        SetNeedsDraw();
    }

    private void RefreshMeasurements()
    {
        SetRows(_measurements, MeasurementsViewModel.Headers, _vm.Measurements.Rows, (row, _) => row.Cells);
        _sort.Text = $"{_vm.Measurements.Rows.Count} shown, {_vm.Measurements.SortText}";
        ShowMeasurementDetails();
    }

    private void ShowMeasurementDetails() => _measurementDetails.Text = string.Join("\n", _vm.Measurements.Details(SelectedMeasurement()).Select(Fit));

    /// <summary>Cuts a detail line to the screen width with "…", so one long line never wraps over the next; control characters from data are shown, not sent.</summary>
    private string Fit(string line)
    {
        line = TerminalText.Visible(line);
        int width = Math.Max(20, _app.Screen.Width - 2);
        return line.Length <= width ? line : string.Concat(line.AsSpan(0, width - 1), "…");
    }

    private void ShowSourceDetails()
    {
        int row = _sources.Value?.SelectedCell.Y ?? -1;
        SourceReport? report = row >= 0 && row < _vm.Sources.Rows.Count ? _vm.Sources.Rows[row] : null;
        IReadOnlyList<string> lines = _vm.Sources.Details(report);
        // Only what fits is drawn; a big source can have thousands of warnings (export or `validate` lists them all).
        const int shown = 4;
        _sourceDetails.Text = lines.Count <= shown + 1
            ? string.Join("\n", lines.Select(Fit))
            : string.Join("\n", lines.Take(shown).Select(Fit).Append($"… and {lines.Count - shown} more line(s); `pathfinder validate` lists every warning"));
    }

    private void RefreshTarget()
    {
        _targetLabel.Text = $"Target ({_vm.Target.Property.Code()}):";
        bool hasError = _vm.Target.Error.Length > 0;
        _targetCaret.Text = hasError && _vm.Target.ErrorOffset is { } offset ? new string(' ', Math.Max(0, offset)) + "^ here" : "";
        _targetError.Text = hasError ? TerminalText.Visible($"INVALID: {_vm.Target.Error}") : _vm.Target.IsWaitingForAnalysis ? "computing… (the search starts when the analysis is ready)" : "";
        if (_targetRefused > 0)
        {
            ShowTargetCap();
        }

        SetRows(_routes, TargetViewModel.Headers, _vm.Target.Routes, (route, i) => _vm.Target.Cells(i, route));
        IReadOnlyList<string> choices = _vm.Target.SpeciesChoices;
        if (_speciesPick.Source is null || _speciesPick.Source.Count != choices.Count)
        {
            _speciesPick.SetSource(new ObservableCollection<string>(choices.Select(choice => TerminalText.Visible(choice))));
        }

        _estimate.Text = TerminalText.Visible(_vm.Target.EstimateText, keepLineBreaks: true);
    }

    private void ShowTargetCap() =>
        _targetError.Text = string.Create(
            System.Globalization.CultureInfo.InvariantCulture,
            $"The target field holds at most {TargetViewModel.MaxInputLength:N0} characters; {_targetRefused:N0} more were refused. Type one reaction, or one species.");

    private void RefreshConsistency()
    {
        _consistencySummary.Text = TerminalText.Visible(_vm.Consistency.Summary, keepLineBreaks: true);
        SetRows(_suspects, ConsistencyViewModel.SuspectHeaders, _vm.Consistency.Suspects, (row, _) => _vm.Consistency.Cells(row));
        SetRows(_cycles, ConsistencyViewModel.CycleHeaders, _vm.Consistency.Cycles, (pair, _) => ConsistencyViewModel.Cells(pair.Number, pair.Cycle));
    }
}
