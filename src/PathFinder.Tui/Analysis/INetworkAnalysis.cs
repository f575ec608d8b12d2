using PathFinder.Chemistry;
using PathFinder.Quantities;

namespace PathFinder.Tui.Analysis;

/// <summary>The results of analysing one (curated) network, as the explorer shows them.</summary>
/// <remarks>
/// Every number is nullable: null means "not available from this analysis" and is shown as "—", never invented.
/// Implementations are built off the UI thread and then only read, so they must be safe to read from any thread.
/// Energies are in kJ/mol and entropies in J/(mol·K) (the canonical units of <see cref="Measurement"/>).
/// </remarks>
public interface INetworkAnalysis
{
    /// <summary>The network analysed (after curation: excluded measurements are not in it).</summary>
    ReactionNetwork Network { get; }

    /// <summary>A short description of what was computed, shown in the status line (e.g. "data only: no solver").</summary>
    string Description { get; }

    /// <summary>The assessment of each measurement of <see cref="Network"/>, by id.</summary>
    IReadOnlyDictionary<string, MeasurementAssessment> Measurements { get; }

    /// <summary>Independent cycles found, flagged ones first.</summary>
    IReadOnlyList<CycleReport> Cycles { get; }

    /// <summary>Measurements suspected of being wrong, worst first.</summary>
    IReadOnlyList<SuspectReport> Suspects { get; }

    /// <summary>Best estimates of species properties (e.g. ΔfH°), one row per species and property.</summary>
    IReadOnlyList<SpeciesEstimate> Species { get; }

    /// <summary>Per-source summary and diagnostics.</summary>
    IReadOnlyList<SourceReport> Sources { get; }

    /// <summary>Whether <see cref="ExportDiagram"/> can draw anything.</summary>
    bool CanExportDiagram { get; }

    /// <summary>Routes to a target reaction for one property, best first, with the network's own estimate beside them.</summary>
    /// <param name="target">The target reaction (a formation when the user picked a species).</param>
    /// <param name="property">The property wanted.</param>
    /// <param name="maxRoutes">At most this many routes.</param>
    /// <param name="cancellationToken">Cancels a long search.</param>
    TargetReport FindRoutes(ChemicalEquation target, ThermoProperty property, int maxRoutes, CancellationToken cancellationToken);

    /// <summary>Writes SVG diagrams of <paramref name="focus"/> (a route, a cycle, a neighbourhood or the network) to <paramref name="path"/>.</summary>
    /// <remarks>May take seconds (graph layout): call it off the UI thread. A route or cycle also gets its level diagram beside <paramref name="path"/>.</remarks>
    /// <returns>A one-line message saying what was written, or why nothing was.</returns>
    string ExportDiagram(string path, DiagramFocus focus);
}
