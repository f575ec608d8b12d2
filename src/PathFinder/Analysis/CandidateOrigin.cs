namespace PathFinder.Analysis;

/// <summary>Where a candidate new measurement in an experiment plan came from.</summary>
public enum CandidateOrigin
{
    /// <summary>Given by the user.</summary>
    Given,

    /// <summary>The target reaction itself, measured directly.</summary>
    Target,

    /// <summary>The formation reaction of a species near the target.</summary>
    Formation,

    /// <summary>The combustion of a C/H/O species near the target to CO2(g) and H2O(l).</summary>
    Combustion,

    /// <summary>A reaction turning one species near the target into another (balanced with elements in reference states).</summary>
    Pair,
}
