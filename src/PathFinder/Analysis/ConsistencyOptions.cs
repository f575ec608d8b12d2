namespace PathFinder.Analysis;

/// <summary>Settings of the consistency analysis.</summary>
public sealed record ConsistencyOptions
{
    /// <summary>|z| above which a cycle, source offset or cross check is flagged and the suspect procedure acts. Default 2.</summary>
    public double Threshold { get; init; } = 2.0;

    /// <summary>Factor by which the suspect procedure enlarges an offending uncertainty at each step. Default 2.</summary>
    public double InflationFactor { get; init; } = 2.0;

    /// <summary>Largest cycle (number of measurements) enumerated. Default 6.</summary>
    public int MaxCycleSize { get; init; } = 6;

    /// <summary>At most this many cycles are kept (worst first). Default 1000.</summary>
    public int MaxCycles { get; init; } = 1000;

    /// <summary>Search steps allowed for cycle enumeration per family, so that a large network's cycle list is the same on every run and machine. Default 100 000 (about 0.3 s with the exact rank on the 2-core benchmark machine).</summary>
    /// <remarks>
    /// A network of tens of thousands of measurements has far more minimal cycles than any report can show (the
    /// benchmark network of 30 000 has millions within 6 measurements), so its list is a sample either way: the
    /// first cycles the deterministic enumeration reaches, worst |z| first. The suspects do not depend on it.
    /// </remarks>
    public long CycleWorkBudget { get; init; } = 100_000;

    /// <summary>Time allowed for cycle enumeration per family, a safety net behind <see cref="CycleWorkBudget"/>. Default 10 s.</summary>
    public TimeSpan CycleTimeBudget { get; init; } = TimeSpan.FromSeconds(10);

    /// <summary>Whether to run the suspect procedure (otherwise suspects are empty and the adjusted solution is the given one).</summary>
    public bool RunSuspectProcedure { get; init; } = true;

    /// <summary>Cancels the analysis.</summary>
    public CancellationToken CancellationToken { get; init; }
}
