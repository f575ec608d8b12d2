using PathFinder.Solving;

namespace PathFinder.Analysis;

/// <summary>The least-squares solution of one property family: the best self-consistent set of species values.</summary>
/// <param name="Model">The model solved.</param>
/// <param name="Solution">The solution (after the suspect procedure when <paramref name="Adjusted"/>).</param>
/// <param name="Species">Every unknown species with its estimate (NaN when not determined), in model order.</param>
/// <param name="Undetermined">Species the data do not determine.</param>
/// <param name="RelativeGroups">Groups of undetermined species known only relative to each other: (anchor, member, ratio) descriptions.</param>
/// <param name="Adjusted">Whether the suspect procedure ran.</param>
/// <param name="Adjustments">The uncertainty enlargements it made.</param>
/// <param name="Suspects">Measurements it found inconsistent.</param>
public sealed record SolveReport(
    PropertyModel Model,
    LeastSquaresSolution Solution,
    IReadOnlyList<SpeciesEstimate> Species,
    IReadOnlyList<SpeciesEstimate> Undetermined,
    IReadOnlyList<string> RelativeGroups,
    bool Adjusted,
    IReadOnlyList<UncertaintyAdjustment> Adjustments,
    IReadOnlyList<OutlierSuspect> Suspects)
{
    /// <summary>The family solved.</summary>
    public PropertyFamily Family => Model.Family;
}
