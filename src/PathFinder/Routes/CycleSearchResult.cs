namespace PathFinder.Routes;

/// <summary>The outcome of a cycle search.</summary>
public sealed record CycleSearchResult
{
    /// <summary>The cycles kept, by decreasing |z|, then size, then measurement indices.</summary>
    public required IReadOnlyList<Cycle> Cycles { get; init; }

    /// <summary>Number of distinct minimal cycles found (saturates at <see cref="long.MaxValue"/>).</summary>
    public required long CyclesFound { get; init; }

    /// <summary>What cut the search, if anything.</summary>
    public required SearchCut Cut { get; init; }

    /// <summary>True when every minimal cycle within the size bound was found.</summary>
    public bool Complete => Cut == SearchCut.None;

    /// <summary>Number of independent cycles of the whole network: measurements − rank (see <see cref="Algebra.ExactRank"/>).</summary>
    public required int IndependentCycleCount { get; init; }

    /// <summary>True when the Hadamard bound proves the modular pruning exact (no cycle lost to arithmetic modulo 2^61 − 1).</summary>
    public required bool ExactnessCertified { get; init; }

    /// <summary>Search steps taken (see <see cref="CycleSearchOptions.WorkBudget"/>).</summary>
    public long SearchSteps { get; init; }

    /// <summary>Wall-clock time of the search.</summary>
    public required TimeSpan Elapsed { get; init; }
}
