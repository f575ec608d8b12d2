namespace PathFinder.Analysis;

/// <summary>A source's common offset: declared in <c>sources.csv</c> and fitted, or inferred because it explains the data at least as well as the suspect it displaces.</summary>
/// <param name="IsEnergy">Whether the offset acts on energies (kJ/mol) rather than entropies (J/(mol·K)).</param>
/// <param name="Value">The fitted offset, positive when the source reads high (kJ/mol or J/(mol·K)).</param>
/// <param name="Uncertainty">Its standard uncertainty.</param>
/// <param name="Z">For a declared offset, how far the fitted offset is beyond the declared systematic (the prior's normalized residual, sign of the offset); for an inferred one, Value / Uncertainty.</param>
/// <param name="Declared">The declared systematic standard uncertainty, or null for an inferred offset.</param>
/// <param name="ChiSquaredDrop">How much χ² falls when the offset is fitted (for an inferred offset; 0 for a declared one).</param>
/// <param name="DisplacedSuspect">The measurement the suspect procedure blamed instead, which the offset clears (inferred offsets), or null.</param>
/// <param name="DisplacedChiSquared">The χ² that blaming <paramref name="DisplacedSuspect"/> accounted for (about its z²), for comparison.</param>
/// <param name="Rows">The ids of the rows the offset acts on.</param>
public sealed record SourceOffset(bool IsEnergy, double Value, double Uncertainty, double Z, double? Declared, double ChiSquaredDrop, string? DisplacedSuspect, double DisplacedChiSquared, IReadOnlyList<string> Rows)
{
    /// <summary>Whether the consistency check inferred the offset (no declaration).</summary>
    public bool IsInferred => Declared is null;

    /// <summary>The unit of the offset.</summary>
    public string Unit => IsEnergy ? "kJ/mol" : "J/(mol·K)";
}
