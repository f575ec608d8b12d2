using PathFinder.Routes;
using PathFinder.Solving;

namespace PathFinder.Analysis;

/// <summary>The consistency analysis of one property family.</summary>
/// <param name="Model">The model analysed.</param>
/// <param name="Measurements">Every measurement's residual, normalized residual and leave-one-out prediction, in data order.</param>
/// <param name="Cycles">Minimal cycles up to the size bound, worst |z| first.</param>
/// <param name="CyclesFound">How many minimal cycles the search found.</param>
/// <param name="CycleCut">What cut the cycle enumeration short, if anything.</param>
/// <param name="IndependentCycles">Measurements − rank: the number of independent cycles.</param>
/// <param name="Suspects">Suspects, most serious first.</param>
/// <param name="Adjustments">Each uncertainty enlargement made by the procedure, in order.</param>
/// <param name="Sources">Per-source agreement.</param>
/// <param name="AsGiven">The least-squares solution of the data as given.</param>
/// <param name="Adjusted">The solution after the suspect procedure.</param>
public sealed record FamilyConsistency(
    PropertyModel Model,
    IReadOnlyList<MeasurementCheck> Measurements,
    IReadOnlyList<CycleCheck> Cycles,
    long CyclesFound,
    SearchCut CycleCut,
    int IndependentCycles,
    IReadOnlyList<SuspectReport> Suspects,
    IReadOnlyList<UncertaintyAdjustment> Adjustments,
    IReadOnlyList<SourceCheck> Sources,
    LeastSquaresSolution AsGiven,
    LeastSquaresSolution Adjusted)
{
    /// <summary>Whether every minimal cycle up to the size bound was found.</summary>
    public bool CyclesComplete => CycleCut == SearchCut.None;

    /// <summary>The family.</summary>
    public PropertyFamily Family => Model.Family;

    /// <summary>Cycles whose closure fails beyond the threshold.</summary>
    public IEnumerable<CycleCheck> FlaggedCycles => Cycles.Where(cycle => cycle.Flagged);

    /// <summary>Consistent when the suspect procedure found no suspect.</summary>
    public bool Consistent => Suspects.Count == 0;
}
