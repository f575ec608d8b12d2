using PathFinder.Routes;
using PathFinder.Solving;

namespace PathFinder.Analysis;

/// <summary>The consistency analysis of a network's joint model.</summary>
/// <param name="Model">The model analysed, with any offsets the check inferred for sources.</param>
/// <param name="Measurements">Every measurement's residual, normalized residual and leave-one-out prediction, in data order.</param>
/// <param name="Cycles">Minimal cycles up to the size bound, worst |z| first; they may mix ΔH, S°, ΔS, ΔG and K data.</param>
/// <param name="CyclesFound">How many minimal cycles the search found.</param>
/// <param name="CycleCut">What cut the cycle enumeration short, if anything.</param>
/// <param name="IndependentCycles">Measurements − rank: the number of independent cycles.</param>
/// <param name="Suspects">Suspect measurements, most serious first.</param>
/// <param name="Adjustments">Each uncertainty enlargement made by the procedure, in order.</param>
/// <param name="Sources">Per-source agreement, sources with an inferred or significant offset first.</param>
/// <param name="AsGiven">The least-squares solution of the data as given (with the declared and inferred source offsets).</param>
/// <param name="Adjusted">The solution after the suspect procedure.</param>
public sealed record ModelConsistency(
    ThermoModel Model,
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

    /// <summary>Cycles whose closure fails beyond the threshold.</summary>
    public IEnumerable<CycleCheck> FlaggedCycles => Cycles.Where(cycle => cycle.Flagged);

    /// <summary>Sources whose common offset the check inferred (they come before the suspects).</summary>
    public IEnumerable<SourceCheck> OffsetSources => Sources.Where(source => source.HasInferredOffset);

    /// <summary>Declared offsets fitted beyond their declared systematic (|z| over the threshold is judged by the caller's options).</summary>
    public IEnumerable<(SourceCheck Source, SourceOffset Offset)> DeclaredOffsets =>
        Sources.SelectMany(source => source.Offsets.Where(offset => !offset.IsInferred).Select(offset => (source, offset)));

    /// <summary>Consistent when the suspect procedure found no suspect and no source offset had to be inferred.</summary>
    public bool Consistent => Suspects.Count == 0 && !OffsetSources.Any();
}
