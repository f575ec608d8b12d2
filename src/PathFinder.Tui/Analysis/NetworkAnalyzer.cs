using PathFinder.Diagnostics;

namespace PathFinder.Tui.Analysis;

/// <summary>Analyses a curated network; called off the UI thread, so it must not touch any view.</summary>
/// <param name="network">The network after curation.</param>
/// <param name="dataDiagnostics">The problems found when reading the data (for per-source reports).</param>
/// <param name="cancellationToken">Set when a newer analysis supersedes this one.</param>
public delegate INetworkAnalysis NetworkAnalyzer(ReactionNetwork network, IReadOnlyList<Diagnostic> dataDiagnostics, CancellationToken cancellationToken);
