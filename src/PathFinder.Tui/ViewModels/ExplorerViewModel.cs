using PathFinder.Curation;
using PathFinder.Data;
using PathFinder.Diagnostics;
using PathFinder.IO;
using PathFinder.Tui.Analysis;

namespace PathFinder.Tui.ViewModels;

/// <summary>The explorer's state: the data, the curation (saved and current), the analysis, and background work.</summary>
/// <remarks>
/// All members are called on the UI thread. Heavy work (<see cref="NetworkAnalyzer"/>, route search) runs on the
/// thread pool through <see cref="RunInBackground{T}"/>; its result comes back through the <see cref="IUiDispatcher"/>,
/// and a result superseded by newer work is dropped. <see cref="Changed"/> tells the views to redraw.
/// </remarks>
public sealed class ExplorerViewModel
{
    private readonly NetworkAnalyzer _analyzer;
    private readonly IUiDispatcher _dispatcher;
    private readonly Func<DateOnly> _today;
    private readonly Dictionary<string, long> _running = new(StringComparer.Ordinal);
    private readonly Func<long> _clock;
    private readonly List<Task> _tasks = [];
    private CancellationTokenSource? _analysisCancel;
    private int _analysisVersion;
    private string _message = "";
    private CurationReadResult _curationFile;

    /// <summary>Loads the network and its curation file; the first analysis starts at once.</summary>
    public ExplorerViewModel(string networkPath, NetworkAnalyzer analyzer, IUiDispatcher dispatcher, Func<DateOnly>? today = null)
        : this(NetworkReader.Read(networkPath ?? throw new ArgumentNullException(nameof(networkPath))), networkPath, analyzer, dispatcher, today)
    {
    }

    /// <summary>Starts from data already read (so a large network can be read before the screen opens); loads the curation file.</summary>
    public ExplorerViewModel(NetworkReadResult data, string networkPath, NetworkAnalyzer analyzer, IUiDispatcher dispatcher, Func<DateOnly>? today = null)
    {
        ArgumentNullException.ThrowIfNull(data);
        ArgumentNullException.ThrowIfNull(networkPath);
        _analyzer = analyzer ?? throw new ArgumentNullException(nameof(analyzer));
        _dispatcher = dispatcher ?? throw new ArgumentNullException(nameof(dispatcher));
        _today = today ?? (() => DateOnly.FromDateTime(DateTime.Now));
        _clock = System.Diagnostics.Stopwatch.GetTimestamp;
        NetworkPath = networkPath;
        Data = data;
        CurationPath = CurationFile.PathFor(networkPath);
        RecoveryPath = CurationRecovery.PathFor(CurationPath);
        _curationFile = CurationFile.Read(CurationPath);
        SavedCuration = _curationFile.Set;
        Curation = _curationFile.Set;
        Curated = Curation.Apply(Data.Network);
        CurationReadResult recovered = CurationRecovery.Read(RecoveryPath, SavedCuration);
        RecoveredDecisions = recovered.Set.Decisions;
        if (RecoveredDecisions.Count == 0 && !recovered.HasErrors)
        {
            // Nothing left to offer (or everything in it was saved before the session ended).
            TryDeleteRecovery();
        }
        Measurements = new MeasurementsViewModel(this);
        Species = new SpeciesViewModel(this);
        Sources = new SourcesViewModel(this);
        Target = new TargetViewModel(this);
        Consistency = new ConsistencyViewModel(this);
        CurationLog = new CurationLogViewModel(this);
        Measurements.Refresh();
        Recompute();
    }

    /// <summary>Raised on the UI thread whenever state shown on any screen changed.</summary>
    public event EventHandler? Changed;

    /// <summary>The network path given.</summary>
    public string NetworkPath { get; }

    /// <summary>The curation file beside the data.</summary>
    public string CurationPath { get; }

    /// <summary>The data as read, with every measurement (excluded ones too) and the data diagnostics.</summary>
    public NetworkReadResult Data { get; }

    /// <summary>Where unsaved decisions are kept until they are saved or discarded (<see cref="CurationRecovery"/>).</summary>
    public string RecoveryPath { get; }

    /// <summary>Problems found in the curation file when it was last read or saved.</summary>
    public IReadOnlyList<Diagnostic> CurationDiagnostics => _curationFile.Diagnostics;

    /// <summary>Rows of the curation file that are not usable decisions: kept in the file as written, shown, not applied.</summary>
    public IReadOnlyList<UnappliedCurationRow> UnappliedCurationRows => _curationFile.Unapplied;

    /// <summary>Unsaved decisions left by an earlier session that ended without saving, offered until restored or discarded.</summary>
    public IReadOnlyList<CurationDecision> RecoveredDecisions { get; private set; }

    /// <summary>Ids decided in this session that someone else decided differently in the file meanwhile (from the last save).</summary>
    public IReadOnlyList<string> SaveConflicts { get; private set; } = [];

    /// <summary>The decisions as last saved (or read).</summary>
    public CurationSet SavedCuration { get; private set; }

    /// <summary>The decisions now, saved or not.</summary>
    public CurationSet Curation { get; private set; }

    /// <summary>The network after the current decisions.</summary>
    public CurationResult Curated { get; private set; }

    /// <summary>Whether there are decisions not written to <see cref="CurationPath"/>.</summary>
    public bool HasUnsavedChanges => Curation.Decisions.Count != SavedCuration.Decisions.Count;

    /// <summary>The latest finished analysis of <see cref="Curated"/>, or null before the first one.</summary>
    public INetworkAnalysis? Analysis { get; private set; }

    /// <summary>Whether the analysis shown is older than the current curation (a newer one is computing).</summary>
    public bool IsAnalysisStale { get; private set; }

    /// <summary>Whether any background work is running.</summary>
    public bool IsBusy => _running.Count > 0;

    /// <summary>The measurements screen.</summary>
    public MeasurementsViewModel Measurements { get; }

    /// <summary>The species screen.</summary>
    public SpeciesViewModel Species { get; }

    /// <summary>The sources screen.</summary>
    public SourcesViewModel Sources { get; }

    /// <summary>The target screen.</summary>
    public TargetViewModel Target { get; }

    /// <summary>The consistency screen.</summary>
    public ConsistencyViewModel Consistency { get; }

    /// <summary>The curation screen.</summary>
    public CurationLogViewModel CurationLog { get; }

    /// <summary>The status line: what is computing, the analysis used, exclusions, unsaved changes, and the last message.</summary>
    public string StatusText
    {
        get
        {
            string work = IsBusy ? $"computing: {string.Join(", ", _running.Select(Elapsed))}…" : Analysis is null ? "no analysis yet" : "ready";
            string excluded = $"{Curated.Excluded.Count} excluded";
            string unsaved = HasUnsavedChanges ? "UNSAVED (Ctrl+S saves)" : "saved";
            string message = _message.Length > 0 ? $" | {_message}" : "";
            return $"{work} | {excluded}, {unsaved}{message}";
        }
    }

    /// <summary>A title line: network name and counts.</summary>
    public string Title =>
        $"{Data.Network.Name}: {Data.Network.Measurements.Count} measurements, {Data.Network.Species.Count} species, {Data.Network.Sources.Count} sources" +
        (Data.HasErrors ? $", {Data.Errors.Count()} data error(s)" : "");

    /// <summary>Excludes measurement <paramref name="id"/> with a reason dated today; the analysis re-runs.</summary>
    /// <returns>An empty string on success, else why nothing was done.</returns>
    public string Exclude(string id, string reason)
    {
        if (!Data.Network.TryGetMeasurement(id, out _))
        {
            return Fail($"no measurement '{id}'");
        }

        if (string.IsNullOrWhiteSpace(reason))
        {
            return Fail("an exclusion needs a reason");
        }

        if (Curation.IsExcluded(id))
        {
            return Fail($"{id} is already excluded");
        }

        ApplyCuration(Curation.Exclude(id, reason, _today()), id, $"excluded {id}");
        return "";
    }

    /// <summary>Takes an excluded measurement back in (the reason may be empty); the analysis re-runs.</summary>
    /// <returns>An empty string on success, else why nothing was done.</returns>
    public string Include(string id, string reason)
    {
        if (!Curation.IsExcluded(id))
        {
            return Fail($"{id} is not excluded");
        }

        ApplyCuration(Curation.Include(id, reason ?? "", _today()), id, $"re-included {id}");
        return "";
    }

    /// <summary>Adds the unsaved decisions to <see cref="CurationPath"/> (atomically), keeping whatever the file holds now.</summary>
    /// <remarks>
    /// When someone else wrote to the file since it was read, their content is kept and this session's decisions are added
    /// after it (<see cref="CurationFile.Save"/>); the explorer then shows the merged file. Ids decided on both sides
    /// differently are listed in <see cref="SaveConflicts"/> and in the message: both rows are in the file, this session's
    /// in force.
    /// </remarks>
    /// <returns>A one-line message saying what happened.</returns>
    public string Save()
    {
        CurationDecision[] added = Curation.Decisions.Skip(SavedCuration.Decisions.Count).ToArray();
        CurationSaveResult result;
        try
        {
            result = CurationFile.Save(CurationPath, _curationFile, added);
        }
        catch (Exception exception) when (exception is IOException or UnauthorizedAccessException)
        {
            return Say($"could not save: {exception.Message} (the decisions stay in {Path.GetFileName(RecoveryPath)} until saved)");
        }

        _curationFile = result.Read;
        SaveConflicts = result.Conflicts;
        SavedCuration = result.Read.Set;
        Curation = result.Read.Set;
        TryDeleteRecovery();
        if (result.ChangedByOthers)
        {
            Curated = Curation.Apply(Data.Network);
            Measurements.Refresh();
            Recompute();
        }

        return Say(SaveMessage(added.Length, result));
    }

    /// <summary>Takes the <see cref="RecoveredDecisions"/> back as unsaved decisions (Ctrl+S then saves them).</summary>
    /// <returns>A one-line message.</returns>
    public string RestoreRecovered()
    {
        IReadOnlyList<CurationDecision> recovered = RecoveredDecisions;
        if (recovered.Count == 0)
        {
            return Say("nothing to restore");
        }

        RecoveredDecisions = [];
        Curation = new CurationSet(Curation.Decisions.Concat(recovered));
        Curated = Curation.Apply(Data.Network);
        _message = $"restored {recovered.Count} unsaved decision(s); Ctrl+S saves them";
        WriteRecovery();
        Measurements.Refresh();
        Recompute();
        return _message;
    }

    /// <summary>Drops the <see cref="RecoveredDecisions"/> and their file.</summary>
    /// <returns>A one-line message.</returns>
    public string DiscardRecovered()
    {
        int count = RecoveredDecisions.Count;
        RecoveredDecisions = [];
        TryDeleteRecovery();
        return Say($"discarded {count} recovered decision(s)");
    }

    /// <summary>Forgets the unsaved decisions on quitting without saving: the recovery file is removed.</summary>
    public void DiscardUnsaved() => TryDeleteRecovery();

    /// <summary>Exports <paramref name="table"/> (or, for a .svg path, a diagram of <paramref name="focus"/> through the analysis) to <paramref name="path"/>.</summary>
    /// <remarks>A diagram is laid out in the background (it can take seconds); its outcome then appears in the status line.</remarks>
    /// <returns>A one-line message saying what was written, or why not, or that the diagram is being drawn.</returns>
    public string Export(string path, TableSnapshot table, DiagramFocus? focus = null)
    {
        ArgumentNullException.ThrowIfNull(table);
        if (string.IsNullOrWhiteSpace(path))
        {
            return Say("give a file path ending in .csv, .json, .md or .svg");
        }

        path = path.Trim();
        ExportFormat? format = TableExporter.FormatFromPath(path);
        if (format is null)
        {
            return Say($"unknown export type '{Path.GetExtension(path)}': use .csv, .json, .md or .svg");
        }

        try
        {
            if (format == ExportFormat.Svg)
            {
                if (Analysis is not { } analysis)
                {
                    return Say("the analysis is not ready yet");
                }

                string target = path;
                DiagramFocus what = focus ?? DiagramFocus.Network;
                RunInBackground(
                    "drawing " + Path.GetFileName(target),
                    _ =>
                    {
                        try
                        {
                            return analysis.ExportDiagram(target, what);
                        }
                        catch (Exception exception) when (exception is IOException or UnauthorizedAccessException)
                        {
                            return $"could not export: {exception.Message}";
                        }
                    },
                    message => _message = message);
                return Say($"drawing {target} in the background…");
            }

            AtomicFile.WriteAllText(path, TableExporter.Format(table, format.Value));
            return Say($"wrote {table.Rows.Count} row(s) of {table.Title} to {path}");
        }
        catch (Exception exception) when (exception is IOException or UnauthorizedAccessException)
        {
            return Say($"could not export: {exception.Message}");
        }
    }

    /// <summary>Starts a new analysis of the current curation; an older one still running is cancelled and its result dropped.</summary>
    public void Recompute()
    {
        _analysisCancel?.Cancel();
        var cancel = new CancellationTokenSource();
        _analysisCancel = cancel;
        int version = ++_analysisVersion;
        IsAnalysisStale = true;
        ReactionNetwork network = Curated.Network;
        NetworkReadResult data = Data;
        CurationSet curation = Curation;
        RunInBackground(
            "analysis",
            token =>
            {
                INetworkAnalysis analysis = _analyzer(network, data, cancel.Token);
                // The rows and their search keys are made here too, so the UI thread only swaps them in.
                MeasurementRow[] rows = BuildRows(data.Network, curation, analysis);
                foreach (MeasurementRow row in rows)
                {
                    token.ThrowIfCancellationRequested();
                    _ = row.SearchKey;
                }

                return (analysis, rows, curation);
            },
            result =>
            {
                if (version != _analysisVersion)
                {
                    return;
                }

                Analysis = result.analysis;
                IsAnalysisStale = false;
                // A decision made while this analysis ran is already in Curation; rebuild the rows from it then.
                if (ReferenceEquals(result.curation, Curation))
                {
                    Measurements.SetAllRows(result.rows);
                }
                else
                {
                    Measurements.Refresh();
                }

                Target.AnalysisReady();
            },
            null,
            cancel.Token);
    }

    /// <summary>A task that completes when all background work started so far has finished and been applied.</summary>
    public async Task WhenIdleAsync()
    {
        while (true)
        {
            Task[] pending;
            lock (_tasks)
            {
                pending = _tasks.Where(task => !task.IsCompleted).ToArray();
            }

            if (pending.Length == 0)
            {
                return;
            }

            await Task.WhenAll(pending).ConfigureAwait(false);
        }
    }

    /// <summary>Runs <paramref name="work"/> on the thread pool and applies its result on the UI thread.</summary>
    /// <param name="what">Shown in the status line while running.</param>
    /// <param name="work">The heavy part; must not touch views or this view model.</param>
    /// <param name="apply">Applies the result (UI thread).</param>
    /// <param name="failed">Called on the UI thread when the work throws or is cancelled (optional).</param>
    /// <param name="cancellationToken">Cancels the work.</param>
    public void RunInBackground<T>(string what, Func<CancellationToken, T> work, Action<T> apply, Action? failed = null, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(work);
        ArgumentNullException.ThrowIfNull(apply);
        string label = what;
        for (int i = 2; _running.ContainsKey(label); i++)
        {
            label = $"{what} ({i})";
        }

        _running.Add(label, _clock());
        RaiseChanged();
        var completion = new TaskCompletionSource(TaskCreationOptions.RunContinuationsAsynchronously);
        lock (_tasks)
        {
            _tasks.RemoveAll(task => task.IsCompleted);
            _tasks.Add(completion.Task);
        }

        Task.Run(() => work(cancellationToken), cancellationToken).ContinueWith(
            task => _dispatcher.Post(() =>
            {
                try
                {
                    _running.Remove(label);
                    if (task.IsCompletedSuccessfully)
                    {
                        apply(task.Result);
                    }
                    else
                    {
                        failed?.Invoke();
                        if (task.IsFaulted)
                        {
                            _message = $"{what} failed: {task.Exception?.GetBaseException().Message}";
                        }
                    }

                    RaiseChanged();
                }
                finally
                {
                    completion.TrySetResult();
                }
            }),
            CancellationToken.None,
            TaskContinuationOptions.None,
            TaskScheduler.Default);
    }

    /// <summary>The rows of every measurement (excluded ones too), in data order.</summary>
    internal IEnumerable<MeasurementRow> AllMeasurementRows() => BuildRows(Data.Network, Curation, Analysis);

    /// <summary>The row of one measurement under the current curation and analysis.</summary>
    internal MeasurementRow RowOf(Measurement measurement) => RowOf(measurement, Curation, Analysis?.Measurements);

    /// <summary>The time since <see cref="System.Diagnostics.Stopwatch.GetTimestamp"/> gave <paramref name="start"/>, as "label 3 s".</summary>
    private string Elapsed(KeyValuePair<string, long> running)
    {
        TimeSpan elapsed = System.Diagnostics.Stopwatch.GetElapsedTime(running.Value, _clock());
        return string.Create(System.Globalization.CultureInfo.InvariantCulture, $"{running.Key} {elapsed.TotalSeconds:0} s");
    }

    private static MeasurementRow[] BuildRows(ReactionNetwork network, CurationSet curation, INetworkAnalysis? analysis)
    {
        IReadOnlyDictionary<string, MeasurementAssessment>? assessments = analysis?.Measurements;
        var rows = new MeasurementRow[network.Measurements.Count];
        for (int i = 0; i < rows.Length; i++)
        {
            rows[i] = RowOf(network.Measurements[i], curation, assessments);
        }

        return rows;
    }

    private static MeasurementRow RowOf(Measurement measurement, CurationSet curation, IReadOnlyDictionary<string, MeasurementAssessment>? assessments)
    {
        CurationDecision? decision = curation.CurrentDecision(measurement.Id);
        string? reason = decision is { Action: CurationAction.Exclude } ? decision.Reason : null;
        MeasurementAssessment? assessment = reason is null && assessments is not null && assessments.TryGetValue(measurement.Id, out MeasurementAssessment? found) ? found : null;
        return new MeasurementRow(measurement, assessment, reason);
    }

    private string SaveMessage(int added, CurationSaveResult result)
    {
        string saved = added == 0 ? "nothing new to save" : $"saved {added} decision(s) to {CurationPath}";
        if (!result.ChangedByOthers)
        {
            return saved;
        }

        string merged = $"{saved}; the file had changed since it was read: {result.DecisionsByOthers.Count} decision(s) written there meanwhile are kept";
        return result.Conflicts.Count == 0
            ? merged
            : $"{merged}; CONFLICT on {string.Join(", ", result.Conflicts)}: decided differently there too, both rows are in the file and yours (the later) is in force, review them on the curation screen (F7)";
    }

    private void WriteRecovery()
    {
        try
        {
            CurationRecovery.Write(RecoveryPath, Curation.Decisions.Skip(SavedCuration.Decisions.Count).ToArray());
        }
        catch (Exception exception) when (exception is IOException or UnauthorizedAccessException)
        {
            _message = $"{_message}; could not write the recovery file: {exception.Message}";
        }
    }

    private void TryDeleteRecovery()
    {
        try
        {
            CurationRecovery.Delete(RecoveryPath);
        }
        catch (Exception exception) when (exception is IOException or UnauthorizedAccessException)
        {
            _message = $"could not remove {RecoveryPath}: {exception.Message}";
        }
    }

    private void ApplyCuration(CurationSet curation, string id, string message)
    {
        Curation = curation;
        Curated = curation.Apply(Data.Network);
        _message = message;
        WriteRecovery();
        Measurements.RefreshRow(id);
        Recompute();
    }

    private string Fail(string message)
    {
        _message = message;
        RaiseChanged();
        return message;
    }

    private string Say(string message)
    {
        _message = message;
        RaiseChanged();
        return message;
    }

    private void RaiseChanged() => Changed?.Invoke(this, EventArgs.Empty);
}
