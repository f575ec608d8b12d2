namespace PathFinder.Analysis;

/// <summary>How one source's measurements agree with the network as a whole.</summary>
/// <param name="Source">The source name.</param>
/// <param name="Measurements">How many measurements it gave.</param>
/// <param name="Checkable">How many of them are checked by other data.</param>
/// <param name="MeanNormalizedResidual">Mean of (measured − predicted)/√(u² + u_pred²) over its checkable measurements that are not suspects.</param>
/// <param name="SpreadNormalizedResidual">Their standard deviation (about 1 for a sound source).</param>
/// <param name="OffsetZ">Mean × √n: the significance of a systematic offset (about N(0,1) for a sound source).</param>
/// <param name="Suspects">How many of its measurements are suspects.</param>
/// <param name="SystematicOffset">Whether |OffsetZ| exceeds the threshold, or an offset was inferred for the source.</param>
/// <param name="Offsets">The source's offsets in the model: declared ones (fitted, with prior 0 ± systematic) and inferred ones.</param>
public sealed record SourceCheck(string Source, int Measurements, int Checkable, double MeanNormalizedResidual, double SpreadNormalizedResidual, double OffsetZ, int Suspects, bool SystematicOffset, IReadOnlyList<SourceOffset> Offsets)
{
    /// <summary>Whether the check inferred an offset for this source (it explains the rows better than any single suspect).</summary>
    public bool HasInferredOffset => Offsets.Any(offset => offset.IsInferred);
}
