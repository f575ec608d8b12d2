using PathFinder.Solving;

namespace PathFinder.Analysis;

/// <summary>One view of the joint least-squares solution: every species' ΔfH°, S° or ΔfG°(298.15 K), all from one solution.</summary>
/// <param name="Model">The joint model solved.</param>
/// <param name="Solution">The solution (after the suspect procedure when <paramref name="Adjusted"/>).</param>
/// <param name="Family">Which species quantity this view shows: ΔfH° (enthalpy), S° (entropy) or ΔfG° (Gibbs energy, derived: ΔfH° − T·ΔfS°).</param>
/// <param name="Species">Every species the view concerns with its estimate (NaN when not determined), in model order.</param>
/// <param name="Undetermined">Species the data do not determine.</param>
/// <param name="RelativeGroups">Undetermined species known only relative to each other, described in words.</param>
/// <param name="Adjusted">Whether the suspect procedure ran.</param>
/// <param name="Adjustments">The uncertainty enlargements it made.</param>
/// <param name="Suspects">Observations it found inconsistent.</param>
public sealed record SolveReport(
    ThermoModel Model,
    LeastSquaresSolution Solution,
    PropertyFamily Family,
    IReadOnlyList<SpeciesEstimate> Species,
    IReadOnlyList<SpeciesEstimate> Undetermined,
    IReadOnlyList<string> RelativeGroups,
    bool Adjusted,
    IReadOnlyList<UncertaintyAdjustment> Adjustments,
    IReadOnlyList<OutlierSuspect> Suspects)
{
    /// <summary>The ids of the measurements among <see cref="Suspects"/> (source priors left out).</summary>
    public IEnumerable<string> SuspectIds => Suspects.Where(suspect => !Model.IsPrior(suspect.ObservationIndex)).Select(suspect => Model.Measurements[suspect.ObservationIndex].Id);
}
