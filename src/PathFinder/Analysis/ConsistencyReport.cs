namespace PathFinder.Analysis;

/// <summary>The consistency analysis of a whole network: one part per property family, plus ΔG = ΔH − TΔS checks.</summary>
/// <param name="Families">One analysis per family with data.</param>
/// <param name="CrossChecks">Reactions with ΔH, ΔS and ΔG at one temperature.</param>
/// <param name="Options">The settings used.</param>
public sealed record ConsistencyReport(IReadOnlyList<FamilyConsistency> Families, IReadOnlyList<CrossPropertyCheck> CrossChecks, ConsistencyOptions Options)
{
    /// <summary>Consistent when no family has a suspect and no cross-property check is flagged.</summary>
    public bool Consistent => Families.All(family => family.Consistent) && !CrossChecks.Any(check => check.Flagged);
}
