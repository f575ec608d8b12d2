namespace PathFinder.Solving;

/// <summary>How much one observation contributes to a derived quantity's estimate and variance.</summary>
/// <param name="ObservationIndex">The observation's index in the system.</param>
/// <param name="Sensitivity">sᵢ = ∂(aᵀx̂)/∂vᵢ = wᵢ·aᵢᵀ·Cov·a (dimensionless).</param>
/// <param name="VarianceContribution">sᵢ²uᵢ², this observation's part of Var(aᵀx̂).</param>
/// <param name="Share">VarianceContribution divided by the total variance (0..1).</param>
public readonly record struct ProvenanceEntry(int ObservationIndex, double Sensitivity, double VarianceContribution, double Share);
