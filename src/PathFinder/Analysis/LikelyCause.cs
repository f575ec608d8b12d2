namespace PathFinder.Analysis;

/// <summary>The slip that most probably made a measurement a suspect, with the value it would have without the slip.</summary>
/// <param name="Kind">The kind of slip.</param>
/// <param name="ExplainedValue">The measurement's value with the slip undone, in the unit the analysis uses for that row (kJ/mol or J/(mol·K)).</param>
/// <param name="Detail">One sentence for people, e.g. "looks like a sign slip: +57.30 would agree with the rest (+57.12 ± 0.50)".</param>
public sealed record LikelyCause(SlipKind Kind, double ExplainedValue, string Detail);
