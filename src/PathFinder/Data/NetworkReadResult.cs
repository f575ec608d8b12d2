using PathFinder.Chemistry;
using PathFinder.Diagnostics;
using PathFinder.Thermodynamics;

namespace PathFinder.Data;

/// <summary>What reading a network produced: the usable measurements and every problem found.</summary>
/// <remarks>
/// Network-wide warnings (repeated measurements, single-use species, merged spellings, missing heat capacities)
/// are worked out the first time <see cref="Diagnostics"/> or <see cref="Warnings"/> is read: on a large network
/// they are thousands of messages, and the analysis commands, which stop only on errors, never show them.
/// </remarks>
public sealed class NetworkReadResult
{
    private readonly IReadOnlyList<Diagnostic> _rowDiagnostics;
    private readonly Lazy<IReadOnlyList<Diagnostic>> _diagnostics;

    /// <summary>A result whose diagnostics are all known.</summary>
    /// <param name="network">The network of measurements that passed validation (rows with errors are left out).</param>
    /// <param name="diagnostics">Errors and warnings, in file and line order.</param>
    /// <param name="files">The measurement files read.</param>
    /// <param name="speciesFile">The species declaration file used, if any.</param>
    /// <param name="heatCapacityFile">The heat-capacity file beside the network, if any.</param>
    /// <param name="heatCapacities">Heat-capacity models by species, from <paramref name="heatCapacityFile"/>.</param>
    /// <param name="sourcesFile">The file of declared source systematics beside the network, if any.</param>
    /// <param name="sourceSystematics">The declarations read from <paramref name="sourcesFile"/>; none when null.</param>
    public NetworkReadResult(
        ReactionNetwork network,
        IReadOnlyList<Diagnostic> diagnostics,
        IReadOnlyList<string> files,
        string? speciesFile,
        string? heatCapacityFile,
        IReadOnlyDictionary<Species, IHeatCapacity> heatCapacities,
        string? sourcesFile = null,
        IReadOnlyList<SourceSystematic>? sourceSystematics = null)
        : this(network, diagnostics, () => [], files, speciesFile, heatCapacityFile, heatCapacities, sourcesFile, sourceSystematics)
    {
    }

    /// <summary>A result whose network-wide warnings are found on first use.</summary>
    /// <param name="network">The network of measurements that passed validation.</param>
    /// <param name="rowDiagnostics">Every error, and the warnings found while reading the files.</param>
    /// <param name="networkWarnings">Finds the network-wide warnings (warnings only; called at most once).</param>
    /// <param name="files">The measurement files read.</param>
    /// <param name="speciesFile">The species declaration file used, if any.</param>
    /// <param name="heatCapacityFile">The heat-capacity file beside the network, if any.</param>
    /// <param name="heatCapacities">Heat-capacity models by species.</param>
    /// <param name="sourcesFile">The file of declared source systematics beside the network, if any.</param>
    /// <param name="sourceSystematics">The declarations read from <paramref name="sourcesFile"/>; none when null.</param>
    internal NetworkReadResult(
        ReactionNetwork network,
        IReadOnlyList<Diagnostic> rowDiagnostics,
        Func<IEnumerable<Diagnostic>> networkWarnings,
        IReadOnlyList<string> files,
        string? speciesFile,
        string? heatCapacityFile,
        IReadOnlyDictionary<Species, IHeatCapacity> heatCapacities,
        string? sourcesFile = null,
        IReadOnlyList<SourceSystematic>? sourceSystematics = null)
    {
        ArgumentNullException.ThrowIfNull(network);
        ArgumentNullException.ThrowIfNull(rowDiagnostics);
        ArgumentNullException.ThrowIfNull(networkWarnings);
        Network = network;
        Files = files;
        SpeciesFile = speciesFile;
        HeatCapacityFile = heatCapacityFile;
        HeatCapacities = heatCapacities;
        SourcesFile = sourcesFile;
        SourceSystematics = sourceSystematics ?? [];
        _rowDiagnostics = InFileOrder(rowDiagnostics);
        _diagnostics = new Lazy<IReadOnlyList<Diagnostic>>(() => InFileOrder(rowDiagnostics.Concat(networkWarnings())));
    }

    /// <summary>The network of measurements that passed validation (rows with errors are left out).</summary>
    public ReactionNetwork Network { get; }

    /// <summary>Errors and warnings, in file and line order.</summary>
    public IReadOnlyList<Diagnostic> Diagnostics => _diagnostics.Value;

    /// <summary>The measurement files read.</summary>
    public IReadOnlyList<string> Files { get; }

    /// <summary>The species declaration file used, if any.</summary>
    public string? SpeciesFile { get; }

    /// <summary>The heat-capacity file beside the network, if any.</summary>
    public string? HeatCapacityFile { get; }

    /// <summary>Heat-capacity models by species, from <see cref="HeatCapacityFile"/>.</summary>
    public IReadOnlyDictionary<Species, IHeatCapacity> HeatCapacities { get; }

    /// <summary>The file of declared source systematics beside the network (<c>sources.csv</c>), if any.</summary>
    public string? SourcesFile { get; }

    /// <summary>The systematic uncertainty declared for each source, from <see cref="SourcesFile"/>, in file order; empty when there is no file.</summary>
    /// <remarks>Declarations with errors are left out; every source named here is named by rows of the data, before any curation.</remarks>
    public IReadOnlyList<SourceSystematic> SourceSystematics { get; }

    /// <summary>Whether any error was found.</summary>
    public bool HasErrors => _rowDiagnostics.Any(diagnostic => diagnostic.Severity == Severity.Error);

    /// <summary>The errors, in file and line order.</summary>
    public IEnumerable<Diagnostic> Errors => _rowDiagnostics.Where(diagnostic => diagnostic.Severity == Severity.Error);

    /// <summary>The notes (entries of a network folder not read on purpose), in file order.</summary>
    public IEnumerable<Diagnostic> Notes => _rowDiagnostics.Where(diagnostic => diagnostic.Severity == Severity.Note);

    /// <summary>The warnings about rows that are valid but used by no analysis (<c>conventional-only</c>), found while reading, in file and line order.</summary>
    /// <remarks>Analysis commands show these even though they show no other warning: a row left out must never go unsaid.</remarks>
    public IEnumerable<Diagnostic> UnusedRows => _rowDiagnostics.Where(diagnostic => diagnostic.Code == NetworkReader.ConventionalOnlyCode);

    /// <summary>Errors and warnings per file, files with errors first (most first), then by name; files without either are left out.</summary>
    /// <remarks>Answers "which file is the problem in?" before the list: a stray CSV in a network folder shows as one line.</remarks>
    public IReadOnlyList<FileProblemCount> ProblemsByFile =>
        Diagnostics
            .Where(diagnostic => diagnostic.Severity != Severity.Note)
            .GroupBy(diagnostic => diagnostic.Location.File, StringComparer.Ordinal)
            .Select(group => new FileProblemCount(group.Key, group.Count(diagnostic => diagnostic.Severity == Severity.Error), group.Count(diagnostic => diagnostic.Severity == Severity.Warning)))
            .OrderByDescending(count => count.Errors)
            .ThenBy(count => count.File, StringComparer.Ordinal)
            .ToList();

    /// <summary>The warnings, in file and line order.</summary>
    public IEnumerable<Diagnostic> Warnings => Diagnostics.Where(diagnostic => diagnostic.Severity == Severity.Warning);

    // A stable sort: diagnostics of one place keep the order they were found in.
    private static List<Diagnostic> InFileOrder(IEnumerable<Diagnostic> diagnostics) =>
        diagnostics
            .OrderBy(diagnostic => diagnostic.Location.File, StringComparer.Ordinal)
            .ThenBy(diagnostic => diagnostic.Location.Line)
            .ThenBy(diagnostic => diagnostic.Location.Column)
            .ToList();
}
