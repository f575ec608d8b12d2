namespace PathFinder.Analysis;

/// <summary>How one source's measurements agree with the network as a whole.</summary>
/// <param name="Source">The source name.</param>
/// <param name="Measurements">How many measurements it gave (in this family).</param>
/// <param name="Checkable">How many of them are checked by other data.</param>
/// <param name="MeanNormalizedResidual">Mean of (measured − predicted)/√(u² + u_pred²) over its checkable measurements that are not suspects.</param>
/// <param name="SpreadNormalizedResidual">Their standard deviation (about 1 for a sound source).</param>
/// <param name="OffsetZ">Mean × √n: the significance of a systematic offset (about N(0,1) for a sound source).</param>
/// <param name="Suspects">How many of its measurements are suspects.</param>
/// <param name="SystematicOffset">Whether |OffsetZ| exceeds the threshold.</param>
public sealed record SourceCheck(string Source, int Measurements, int Checkable, double MeanNormalizedResidual, double SpreadNormalizedResidual, double OffsetZ, int Suspects, bool SystematicOffset);
