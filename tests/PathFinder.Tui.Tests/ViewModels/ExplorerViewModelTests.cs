using PathFinder.Curation;
using PathFinder.Tui.Analysis;
using PathFinder.Tui.ViewModels;

namespace PathFinder.Tui.Tests.ViewModels;

public sealed class ExplorerViewModelTests : IDisposable
{
    private static readonly DateOnly Day = new(2024, 5, 17);
    private readonly DemoNetwork _demo = new();

    public void Dispose() => _demo.Dispose();

    private ExplorerViewModel Open(NetworkAnalyzer? analyzer = null) =>
        new(_demo.Folder, analyzer ?? SolvedAnalysis.Analyzer, new InlineDispatcher(), () => Day);

    [Fact]
    public async Task Opening_the_demo_shows_every_measurement_with_its_residual_and_the_slipped_value_as_suspect()
    {
        ExplorerViewModel vm = Open();
        await vm.WhenIdleAsync();

        Assert.False(vm.IsBusy);
        Assert.NotNull(vm.Analysis);
        Assert.Equal(vm.Data.Network.Measurements.Count, vm.Measurements.Rows.Count);
        MeasurementRow slipped = vm.Measurements.Rows.Single(r => r.Measurement.Id == "C03");
        Assert.Equal("SUSPECT", slipped.StatusText);
        Assert.NotEqual(Display.NotAvailable, slipped.Cells[MeasurementsViewModel.ResidualColumn]);
        Assert.Contains("ready", vm.StatusText, StringComparison.Ordinal);
    }

    [Fact]
    public async Task Excluding_marks_the_row_removes_it_from_the_analysis_and_tracks_unsaved_changes()
    {
        ExplorerViewModel vm = Open();
        await vm.WhenIdleAsync();

        string problem = vm.Exclude("C03", "value slipped in the notebook");
        await vm.WhenIdleAsync();

        Assert.Equal("", problem);
        MeasurementRow row = vm.Measurements.Rows.Single(r => r.Measurement.Id == "C03");
        Assert.Equal("excluded", row.StatusText);
        Assert.False(vm.Analysis!.Network.TryGetMeasurement("C03", out _));
        Assert.True(vm.HasUnsavedChanges);
        Assert.Contains("UNSAVED", vm.StatusText, StringComparison.Ordinal);
        Assert.Equal("UNSAVED", vm.CurationLog.Cells(vm.CurationLog.Rows[0])[4]);
    }

    [Fact]
    public async Task Saved_decisions_are_honoured_when_the_network_is_opened_again()
    {
        ExplorerViewModel first = Open();
        first.Exclude("B05", "phase-change value from an old calibration");
        first.Save();
        await first.WhenIdleAsync();

        ExplorerViewModel second = Open();
        await second.WhenIdleAsync();

        Assert.False(first.HasUnsavedChanges);
        Assert.True(File.Exists(_demo.CurationPath));
        Assert.False(second.HasUnsavedChanges);
        Assert.Equal(["B05"], second.Curated.Excluded.Select(e => e.Measurement.Id));
        Assert.Equal("phase-change value from an old calibration", second.Curated.Excluded[0].Decision.Reason);
        Assert.False(second.Analysis!.Network.TryGetMeasurement("B05", out _));
    }

    [Fact]
    public async Task Re_including_takes_the_measurement_back_and_keeps_the_history()
    {
        ExplorerViewModel vm = Open();
        vm.Exclude("A07", "doubtful");
        vm.Include("A07", "checked the raw data");
        await vm.WhenIdleAsync();

        Assert.NotEqual("excluded", vm.Measurements.Rows.Single(r => r.Measurement.Id == "A07").StatusText);
        Assert.Equal([CurationAction.Exclude, CurationAction.Include], vm.Curation.Decisions.Select(d => d.Action));
        Assert.True(vm.Analysis!.Network.TryGetMeasurement("A07", out _));
    }

    [Fact]
    public void Exclude_without_a_reason_or_of_an_unknown_id_changes_nothing_and_says_why()
    {
        ExplorerViewModel vm = Open();

        Assert.Contains("reason", vm.Exclude("A01", "  "), StringComparison.Ordinal);
        Assert.Contains("no measurement", vm.Exclude("Z99", "x"), StringComparison.Ordinal);
        Assert.Empty(vm.Curation.Decisions);
    }

    [Fact]
    public void Filter_keeps_rows_containing_the_text_in_any_cell()
    {
        ExplorerViewModel vm = Open();

        vm.Measurements.SetFilter("group-c");

        Assert.NotEmpty(vm.Measurements.Rows);
        Assert.All(vm.Measurements.Rows, row => Assert.Equal("group-c", row.Measurement.Source));
        Assert.Equal(vm.Data.Network.Measurements.Count(m => m.Source == "group-c"), vm.Measurements.Rows.Count);
    }

    [Fact]
    public void Sorting_by_value_orders_rows_numerically_and_again_reverses()
    {
        ExplorerViewModel vm = Open();

        vm.Measurements.SortBy(MeasurementsViewModel.ValueColumn);
        double[] ascending = vm.Measurements.Rows.Select(r => r.Measurement.Value).ToArray();
        vm.Measurements.SortBy(MeasurementsViewModel.ValueColumn);
        double[] descending = vm.Measurements.Rows.Select(r => r.Measurement.Value).ToArray();

        Assert.Equal(ascending.Order().ToArray(), ascending);
        Assert.Equal(ascending.Reverse().ToArray(), descending);
        Assert.Contains("descending", vm.Measurements.SortText, StringComparison.Ordinal);
    }

    [Fact]
    public async Task Target_explains_invalid_input_inline_with_its_position()
    {
        ExplorerViewModel vm = Open();
        await vm.WhenIdleAsync();

        bool started = vm.Target.Submit("CH4(g) + 2 O2(g) -> CO2(g) + H2O(l)");

        Assert.False(started);
        Assert.Contains("not balanced", vm.Target.Error, StringComparison.Ordinal);

        vm.Target.Submit("CH4(g) -> C(cr,graphite) + 2 Xe(g)");
        Assert.NotEqual("", vm.Target.Error);
    }

    [Fact]
    public async Task Target_routes_include_the_direct_measurement_scaled_by_its_exact_factor()
    {
        // Given the demo's A08, CO(g) + 1/2 O2(g) -> CO2(g), measured dH = -283.0 ± 0.2 kJ/mol (demo data)
        ExplorerViewModel vm = Open();
        await vm.WhenIdleAsync();
        Measurement a08 = vm.Data.Network["A08"];

        // When the doubled reaction is asked for
        Assert.True(vm.Target.Submit("2 CO(g) + O2(g) -> 2 CO2(g)"));
        await vm.WhenIdleAsync();

        // Then one route is A08 × 2 with twice the measured value, and the network estimate agrees with it
        RouteReport route = vm.Target.Routes.Single(r => r.Steps.Count == 1 && r.Steps[0].MeasurementId == "A08");
        Assert.Equal("2", route.Steps[0].Factor);
        Assert.Equal(2.0 * a08.Value, route.Value!.Value, 9);
        Assert.Equal(2.0 * a08.Uncertainty, route.Uncertainty!.Value, 9);
        double network = vm.Target.Report!.NetworkValue!.Value;
        double spread = vm.Target.Report.NetworkUncertainty!.Value;
        Assert.True(Math.Abs(network - route.Value!.Value) < 3 * (spread + route.Uncertainty!.Value));
        int index = vm.Target.Routes.ToList().IndexOf(route);
        Assert.Contains(vm.Target.Explain(index), line => line.Contains("2 × A08", StringComparison.Ordinal));
    }

    [Fact]
    public async Task A_route_that_uses_a_suspect_says_so_in_its_row()
    {
        // Given the demo, where the analysis finds C03 (the slipped water-gas shift value) a suspect
        ExplorerViewModel vm = Open();
        await vm.WhenIdleAsync();

        // When the water-gas shift is asked for
        Assert.True(vm.Target.Submit("CO(g) + H2O(g) -> CO2(g) + H2(g)"));
        await vm.WhenIdleAsync();

        // Then the direct route through C03 is marked, and a route without it is not
        int direct = vm.Target.Routes.ToList().FindIndex(r => r.Steps.Count == 1 && r.Steps[0].MeasurementId == "C03");
        Assert.StartsWith("! uses suspect C03", vm.Target.Cells(direct, vm.Target.Routes[direct])[3], StringComparison.Ordinal);
        int clean = vm.Target.Routes.ToList().FindIndex(r => r.Steps.All(step => step.MeasurementId != "C03"));
        Assert.DoesNotContain("suspect", vm.Target.Cells(clean, vm.Target.Routes[clean])[3], StringComparison.Ordinal);
    }

    [Fact]
    public async Task Export_writes_the_table_in_the_format_of_the_extension()
    {
        ExplorerViewModel vm = Open();
        await vm.WhenIdleAsync();
        string path = Path.Combine(_demo.Folder, "table.md");

        string message = vm.Export(path, vm.Measurements.Snapshot());

        Assert.StartsWith("wrote", message, StringComparison.Ordinal);
        string[] lines = File.ReadAllLines(path);
        Assert.Equal("## Measurements", lines[0]);
        Assert.Equal(2 + 2 + vm.Measurements.Rows.Count, lines.Length);
        Assert.Contains("unknown export type", vm.Export(Path.Combine(_demo.Folder, "x.txt"), vm.Measurements.Snapshot()), StringComparison.Ordinal);
        string svg = Path.Combine(_demo.Folder, "x.svg");
        Assert.Contains("in the background", vm.Export(svg, vm.Measurements.Snapshot()), StringComparison.Ordinal);
        await vm.WhenIdleAsync();
        Assert.Contains("wrote", vm.StatusText, StringComparison.Ordinal);
        Assert.Equal("svg", System.Xml.Linq.XDocument.Load(svg).Root!.Name.LocalName);
    }

    [Fact]
    public async Task A_route_explanation_names_the_reversed_step_the_cancelling_intermediate_and_the_sum()
    {
        // Given the demo, where CO(g) is formed by burning graphite to CO2 (A01) and reversing CO combustion (A08)
        ExplorerViewModel vm = Open();
        await vm.WhenIdleAsync();

        // When the formation of CO(g) is the target
        Assert.True(vm.Target.Submit("CO(g)"));
        await vm.WhenIdleAsync();

        // Then that route's explanation says A08 is reversed, CO2(g) cancels, and the sum is the formation of CO(g)
        int index = vm.Target.Routes.ToList().FindIndex(r => r.Steps.Select(step => step.MeasurementId).Order().SequenceEqual(["A01", "A08"]));
        Assert.True(index >= 0, "route A01 - A08 not found");
        IReadOnlyList<string> lines = vm.Target.Explain(index);
        Assert.Contains(lines, line => line.Contains("A08: reversed", StringComparison.Ordinal));
        Assert.Contains("Cancelling intermediates: CO2(g)", lines.Single(line => line.StartsWith("Cancelling", StringComparison.Ordinal)), StringComparison.Ordinal);
        string sum = lines.Single(line => line.StartsWith("Sum of the steps:", StringComparison.Ordinal));
        Assert.EndsWith("-> CO(g)", sum, StringComparison.Ordinal);
        Assert.Contains(lines, line => line.StartsWith("Network estimate:", StringComparison.Ordinal));
    }

    [Theory]
    [InlineData("1", "as measured")]
    [InlineData("-1", "reversed")]
    [InlineData("2", "scaled by 2")]
    [InlineData("-1/2", "reversed and scaled by 1/2")]
    public void A_factor_is_described_in_words(string factor, string words) =>
        Assert.Equal(words, TargetViewModel.Transform(factor));

    [Fact]
    public async Task Exporting_a_route_or_a_cycle_as_svg_writes_its_network_and_its_level_diagram()
    {
        ExplorerViewModel vm = Open();
        await vm.WhenIdleAsync();
        Assert.True(vm.Target.Submit("CO(g)"));
        await vm.WhenIdleAsync();
        string route = Path.Combine(_demo.Folder, "route.svg");
        string cycle = Path.Combine(_demo.Folder, "cycle.svg");

        vm.Export(route, vm.Target.Snapshot(), new DiagramFocus(Route: vm.Target.Routes[0]));
        await vm.WhenIdleAsync();
        string routeStatus = vm.StatusText;
        vm.Export(cycle, vm.Consistency.CycleSnapshot(), new DiagramFocus(Cycle: vm.Consistency.Cycles[0].Cycle));
        await vm.WhenIdleAsync();
        string cycleStatus = vm.StatusText;

        // The status names both files of each export (a failure would say "could not export" instead)
        Assert.Contains($"wrote {route} (network) and {Path.Combine(_demo.Folder, "route-levels.svg")} (levels)", routeStatus, StringComparison.Ordinal);
        Assert.Contains($"wrote {cycle} (network) and {Path.Combine(_demo.Folder, "cycle-closure.svg")} (closure)", cycleStatus, StringComparison.Ordinal);
        foreach (string file in new[] { route, Path.Combine(_demo.Folder, "route-levels.svg"), cycle, Path.Combine(_demo.Folder, "cycle-closure.svg") })
        {
            Assert.Equal("svg", System.Xml.Linq.XDocument.Load(file).Root!.Name.LocalName);
        }

        // The demo's worst cycle is the G = H − TS closure through E04 (ΔG from a kcal/mol column): it gets the ladder
        // of its terms, not nothing
        string closure = File.ReadAllText(Path.Combine(_demo.Folder, "cycle-closure.svg"));
        Assert.Contains("(G = H − TS)", closure, StringComparison.Ordinal);
        Assert.Contains(">E04", closure, StringComparison.Ordinal);
        Assert.Contains("does not close", closure, StringComparison.Ordinal);
    }

    [Fact]
    public async Task Typing_a_filter_one_key_at_a_time_shows_the_same_rows_as_filtering_from_scratch()
    {
        // Given the rows sorted by source and one exclusion made while a filter is typed
        ExplorerViewModel vm = Open();
        await vm.WhenIdleAsync();
        vm.Measurements.SortBy(5);
        string[] typed = ["g", "gr", "gro", "grou", "group", "group-", "group-c", "group-", "group-b", "", "C0", "C03"];

        foreach (string filter in typed)
        {
            // When the filter grows, shrinks or changes (and once a row changes under it)
            vm.Measurements.SetFilter(filter);
            if (filter == "group-")
            {
                vm.Exclude("B02", "test");
                await vm.WhenIdleAsync();
            }

            // Then the rows are exactly a brute-force filter of freshly built rows in the same (stable) order
            string[] expected = vm.AllMeasurementRows()
                .OrderBy(r => r.Measurement.Source, StringComparer.Ordinal)
                .Where(r => r.Cells.Any(cell => cell.Contains(filter, StringComparison.OrdinalIgnoreCase)) || r.Measurement.EquationText.Contains(filter, StringComparison.OrdinalIgnoreCase))
                .Select(r => r.Measurement.Id)
                .ToArray();
            Assert.Equal(expected, vm.Measurements.Rows.Select(r => r.Measurement.Id).ToArray());
        }

        Assert.Equal(["C03"], vm.Measurements.Rows.Select(r => r.Measurement.Id));
        Assert.Equal("excluded", vm.AllMeasurementRows().Single(r => r.Measurement.Id == "B02").StatusText);
    }

    [Fact]
    public async Task Rows_the_explorer_cannot_use_are_shown_and_survive_a_save_byte_for_byte()
    {
        // Given a curation file with a day-first date (usable), an unknown action and a comment (not decisions)
        const string before = "# reviewed by AB\nid,action,reason,date\nA07,exclude,doubtful,17/05/2024\nB02,drop,wrong unit,2024-05-18\n";
        File.WriteAllText(_demo.CurationPath, before);
        ExplorerViewModel vm = Open();
        await vm.WhenIdleAsync();

        // When a decision is made and saved
        vm.Exclude("C03", "slipped digit");
        vm.Save();

        // Then the unusable row is on the curation screen as written, and the file keeps every byte it had
        Assert.Equal(["A07", "C03"], vm.Curated.Excluded.Select(e => e.Measurement.Id));
        IReadOnlyList<string> shown = vm.CurationLog.Cells(vm.CurationLog.Rows[0]);
        Assert.Equal("NOT APPLIED", shown[1]);
        Assert.StartsWith("B02,drop,wrong unit,2024-05-18", shown[3], StringComparison.Ordinal);
        Assert.Equal(before + "C03,exclude,slipped digit,2024-05-17\n", File.ReadAllText(_demo.CurationPath));
    }

    [Fact]
    public async Task A_decision_written_by_someone_else_meanwhile_is_kept_and_a_clash_on_the_same_id_is_reported()
    {
        // Given the explorer open on the demo, and someone else then writes decisions on B05 and C03 to the file
        ExplorerViewModel vm = Open();
        await vm.WhenIdleAsync();
        File.WriteAllText(_demo.CurationPath, "id,action,reason,date\nB05,exclude,old calibration,2024-05-16\nC03,exclude,their reason,2024-05-16\n");

        // When this session excludes C03 and A07 and saves
        vm.Exclude("C03", "my reason");
        vm.Exclude("A07", "doubtful");
        string message = vm.Save();
        await vm.WhenIdleAsync();

        // Then every decision is in force or kept, C03 is named as a conflict, and the analysis follows the merged file
        Assert.Equal(["A07", "B05", "C03"], vm.Curated.Excluded.Select(e => e.Measurement.Id).Order());
        Assert.Equal(["C03"], vm.SaveConflicts);
        Assert.Contains("CONFLICT on C03", message, StringComparison.Ordinal);
        Assert.Contains("2 decision(s) written there meanwhile are kept", message, StringComparison.Ordinal);
        Assert.Equal("my reason", vm.Curation.CurrentDecision("C03")!.Reason);
        Assert.Contains(vm.CurationLog.Rows, row => vm.CurationLog.Cells(row)[4] == "CONFLICT");
        Assert.False(vm.HasUnsavedChanges);
        Assert.False(vm.Analysis!.Network.TryGetMeasurement("B05", out _));
        string text = File.ReadAllText(_demo.CurationPath);
        Assert.Contains("C03,exclude,their reason", text, StringComparison.Ordinal);
        Assert.Contains("C03,exclude,my reason", text, StringComparison.Ordinal);
    }

    [Fact]
    public async Task Unsaved_decisions_survive_a_session_that_ends_without_saving_and_are_offered_next_time()
    {
        // Given a session that excludes two measurements and ends without saving (as when the terminal is closed)
        ExplorerViewModel first = Open();
        first.Exclude("C03", "slipped digit");
        first.Exclude("A07", "doubtful");
        await first.WhenIdleAsync();
        Assert.True(File.Exists(first.RecoveryPath));
        Assert.False(File.Exists(_demo.CurationPath));

        // When the network is opened again
        ExplorerViewModel second = Open();
        await second.WhenIdleAsync();

        // Then both decisions are offered; restored they are unsaved; saving writes them and removes the recovery file
        Assert.Equal(["C03", "A07"], second.RecoveredDecisions.Select(d => d.MeasurementId));
        Assert.Empty(second.Curated.Excluded);
        second.RestoreRecovered();
        await second.WhenIdleAsync();
        Assert.True(second.HasUnsavedChanges);
        Assert.Equal(["A07", "C03"], second.Curated.Excluded.Select(e => e.Measurement.Id));
        second.Save();
        Assert.False(File.Exists(second.RecoveryPath));
        Assert.Equal(["C03", "A07"], CurationFile.Read(_demo.CurationPath).Set.ExcludedIds);

        // And a recovery the user discards is gone for good
        ExplorerViewModel third = Open();
        third.Exclude("B05", "x");
        ExplorerViewModel fourth = Open();
        Assert.Single(fourth.RecoveredDecisions);
        fourth.DiscardRecovered();
        Assert.False(File.Exists(fourth.RecoveryPath));
        await third.WhenIdleAsync();
        await fourth.WhenIdleAsync();
    }

    [Fact]
    public async Task A_target_typed_while_the_analysis_computes_says_computing_and_is_searched_when_it_is_ready()
    {
        // Given an analysis that is held back
        using var gate = new ManualResetEventSlim();
        ExplorerViewModel vm = Open((network, data, token) =>
        {
            gate.Wait(token);
            return SolvedAnalysis.Analyzer(network, data, token);
        });

        // When a valid target is submitted before it is ready
        bool started = vm.Target.Submit("CO(g)");

        // Then it is no error: the screen says computing, and the routes come once the analysis is there
        Assert.False(started);
        Assert.Equal("", vm.Target.Error);
        Assert.True(vm.Target.IsWaitingForAnalysis);
        Assert.StartsWith("computing…", vm.Target.EstimateText, StringComparison.Ordinal);
        gate.Set();
        await vm.WhenIdleAsync();
        Assert.False(vm.Target.IsWaitingForAnalysis);
        Assert.NotEmpty(vm.Target.Routes);
    }

    [Fact]
    public void A_target_longer_than_the_limit_is_refused_with_its_length()
    {
        ExplorerViewModel vm = Open();
        string pasted = string.Concat(Enumerable.Repeat("CH4(g) + ", 300)) + "CH4(g)";

        bool started = vm.Target.Submit(pasted);

        Assert.False(started);
        Assert.Contains("2,706 characters long; at most 2,000", vm.Target.Error, StringComparison.Ordinal);
        Assert.Null(vm.Target.ErrorOffset);
    }
}
