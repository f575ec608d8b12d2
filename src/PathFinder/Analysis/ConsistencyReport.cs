namespace PathFinder.Analysis;

/// <summary>The consistency analysis of a whole network: one joint analysis of every datum.</summary>
/// <param name="Analysis">The joint analysis, or null when the network has no usable measurement.</param>
/// <param name="Options">The settings used.</param>
public sealed record ConsistencyReport(ModelConsistency? Analysis, ConsistencyOptions Options)
{
    /// <summary>Consistent when the joint analysis found no suspect and no source offset.</summary>
    public bool Consistent => Analysis?.Consistent ?? true;
}
