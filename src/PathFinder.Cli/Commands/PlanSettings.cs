namespace PathFinder.Cli.Commands;

/// <summary>The options of <c>pathfinder plan</c>, as given on the command line.</summary>
/// <param name="Property">dH, dG, dS or dU.</param>
/// <param name="Factor">Re-measurement uncertainty as a multiple of the current one.</param>
/// <param name="Uncertainty">Absolute re-measurement uncertainty (overrides the factor), or null.</param>
/// <param name="Candidates">Candidate reactions typed by the user.</param>
/// <param name="CandidateUncertainty">Uncertainty assumed for new measurements, or null for the data's median.</param>
/// <param name="Generate">Whether to generate candidates near the target.</param>
/// <param name="Depth">Neighbourhood depth for generated candidates.</param>
/// <param name="Top">How many options of each kind to list.</param>
/// <param name="Adjust">Whether the solve runs the suspect procedure first.</param>
/// <param name="Json">Whether to write JSON.</param>
/// <param name="SkipInvalid">Whether to use the valid rows of invalid data.</param>
public sealed record PlanSettings(
    string Property,
    double Factor,
    double? Uncertainty,
    IReadOnlyList<string> Candidates,
    double? CandidateUncertainty,
    bool Generate,
    int Depth,
    int Top,
    bool Adjust,
    bool Json,
    bool SkipInvalid);
