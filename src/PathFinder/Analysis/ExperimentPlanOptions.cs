namespace PathFinder.Analysis;

/// <summary>What an experiment plan assumes about new measurements and which candidates it considers.</summary>
public sealed record ExperimentPlanOptions
{
    /// <summary>A re-measurement's uncertainty as a multiple of the uncertainty used now (default 0.5); ignored when <see cref="RemeasurementUncertainty"/> is set.</summary>
    public double UncertaintyFactor { get; init; } = 0.5;

    /// <summary>An absolute uncertainty for every re-measurement, in the family's unit (default none: use <see cref="UncertaintyFactor"/>).</summary>
    public double? RemeasurementUncertainty { get; init; }

    /// <summary>Candidate new reactions given by the user.</summary>
    public IReadOnlyList<Chemistry.ChemicalEquation> Candidates { get; init; } = [];

    /// <summary>The uncertainty assumed for a new measurement, in the family's unit (default: the median uncertainty of the family's measurements).</summary>
    public double? CandidateUncertainty { get; init; }

    /// <summary>Whether to generate candidates among the species near the target (default true).</summary>
    public bool GenerateCandidates { get; init; } = true;

    /// <summary>How many measurement steps from the target's species count as near (default 2).</summary>
    public int NeighbourhoodDepth { get; init; } = 2;
}
