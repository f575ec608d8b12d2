using PathFinder.Chemistry;

namespace PathFinder.Analysis;

/// <summary>What measuring a new reaction would do to a target's uncertainty.</summary>
/// <param name="Equation">The candidate reaction.</param>
/// <param name="Origin">Where the candidate came from.</param>
/// <param name="Uncertainty">The uncertainty assumed for its measurement (family unit).</param>
/// <param name="TargetUncertainty">The target's standard uncertainty afterwards.</param>
/// <param name="VarianceReduction">The fraction of the target's variance removed (0..1).</param>
/// <param name="NewSpecies">Species of the candidate no measurement contains yet (such a candidate cannot help the target).</param>
public sealed record CandidateSuggestion(
    ChemicalEquation Equation,
    CandidateOrigin Origin,
    double Uncertainty,
    double TargetUncertainty,
    double VarianceReduction,
    IReadOnlyList<Species> NewSpecies);
