using PathFinder.Quantities;

namespace PathFinder.Cli.Output;

/// <summary>The accepted range of every numeric option, in one place: checked by <see cref="OptionParsing"/>, shown in <c>--help</c> and the README.</summary>
/// <remarks>
/// Upper bounds are far above any useful value; they keep arithmetic finite (a time budget of 1e308 s overflowed a
/// TimeSpan, an inflation of 1e308 an uncertainty) and memory bounded (route search state grows with the square of
/// <c>--max-steps</c>). A value outside its range is refused with exit code 2 before any work.
/// </remarks>
public static class OptionRanges
{
    /// <summary>Longest route searched (<c>--max-steps</c>): 1 to 64 measurements.</summary>
    public const int MaxSteps = 64;

    /// <summary>Largest cycle enumerated (<c>check --max-cycle</c>): 1 to 64 measurements.</summary>
    public const int MaxCycle = 64;

    /// <summary>How many items a list shows at most (<c>--top</c>, <c>--show-cycles</c>, <c>draw --route</c>): 100,000.</summary>
    public const int MaxListed = 100_000;

    /// <summary>How many routes <c>routes --explain</c> spells out at most: 1,000.</summary>
    public const int MaxExplained = 1_000;

    /// <summary>Neighbourhood depth at most (<c>draw --depth</c>, <c>plan --depth</c>): 100 measurement steps.</summary>
    public const int MaxDepth = 100;

    /// <summary>Largest <c>draw --max-nodes</c>: 10,000 (layouts beyond are slow and unreadable).</summary>
    public const int MaxNodes = 10_000;

    /// <summary>Longest <c>routes --time-budget</c>: one day, in seconds.</summary>
    public const double MaxTimeBudgetSeconds = 86_400;

    /// <summary>Largest |z| threshold (<c>--threshold</c>): 100.</summary>
    public const double MaxThreshold = 100;

    /// <summary>Largest <c>check --inflation</c> factor: 100 (it must exceed 1).</summary>
    public const double MaxInflation = 100;

    /// <summary>Smallest <c>plan --factor</c>: 0.001 (at most 1: a re-measurement is no worse than the current one).</summary>
    public const double MinFactor = 0.001;

    /// <summary>Smallest assumed uncertainty (<c>plan --uncertainty</c>, <c>--candidate-uncertainty</c>), as for data.</summary>
    public const double MinUncertainty = AcceptedRanges.AbsoluteUncertaintyFloor;

    /// <summary>Largest assumed uncertainty, as for data (kJ/mol or J/(mol·K)).</summary>
    public const double MaxUncertainty = AcceptedRanges.MaxEnergy;
}
