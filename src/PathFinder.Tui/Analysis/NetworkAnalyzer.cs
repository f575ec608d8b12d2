using PathFinder.Data;

namespace PathFinder.Tui.Analysis;

/// <summary>Analyses a curated network; called off the UI thread, so it must not touch any view.</summary>
/// <param name="network">The network after curation.</param>
/// <param name="data">What reading the data produced (diagnostics for per-source reports, heat capacities).</param>
/// <param name="cancellationToken">Set when a newer analysis supersedes this one.</param>
public delegate INetworkAnalysis NetworkAnalyzer(ReactionNetwork network, NetworkReadResult data, CancellationToken cancellationToken);
