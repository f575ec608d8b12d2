namespace PathFinder.Solving;

/// <summary>Where a derived quantity aᵀx̂ comes from: each observation's sensitivity and variance contribution.</summary>
/// <remarks>
/// aᵀx̂ = Σ sᵢvᵢ with sᵢ = wᵢ·aᵢᵀ·Cov·a, so Var(aᵀx̂) = Σ sᵢ²uᵢ² = aᵀ·Cov·AᵀWA·Cov·a = aᵀ·Cov·a for estimable a
/// (the contributions add up exactly to the variance). Entries are sorted by decreasing variance
/// contribution; observations outside the components that a touches have sᵢ = 0 and are omitted.
/// </remarks>
public sealed class QuantityProvenance
{
    internal QuantityProvenance(SparseRow quantity, DerivedEstimate estimate, ProvenanceEntry[] contributions)
    {
        Quantity = quantity;
        Estimate = estimate;
        Contributions = contributions;
    }

    /// <summary>The combination a.</summary>
    public SparseRow Quantity { get; }

    /// <summary>aᵀx̂ and its variance (NaN and no contributions when not estimable).</summary>
    public DerivedEstimate Estimate { get; }

    /// <summary>Contributions, largest variance contribution first.</summary>
    public IReadOnlyList<ProvenanceEntry> Contributions { get; }
}
