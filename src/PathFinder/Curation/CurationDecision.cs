using System.Globalization;
using PathFinder.Diagnostics;

namespace PathFinder.Curation;

/// <summary>One decision about one measurement: exclude it or take it back, why, and when.</summary>
/// <param name="MeasurementId">The id of the measurement concerned.</param>
/// <param name="Action">Exclude or include.</param>
/// <param name="Reason">Why, in the curator's words; required for an exclusion.</param>
/// <param name="Date">The day the decision was made.</param>
public sealed record CurationDecision(string MeasurementId, CurationAction Action, string Reason, DateOnly Date)
{
    /// <summary>Where the decision was read from (default when it was made in this session).</summary>
    public SourceLocation Location { get; init; }

    /// <summary>The action as written in the file: <c>exclude</c> or <c>include</c>.</summary>
    public string ActionText => Action == CurationAction.Exclude ? CurationFile.ExcludeWord : CurationFile.IncludeWord;

    /// <summary>The date in ISO 8601 form (<c>yyyy-MM-dd</c>).</summary>
    public string DateText => Date.ToString("yyyy-MM-dd", CultureInfo.InvariantCulture);

    /// <inheritdoc/>
    public override string ToString() => $"{DateText} {ActionText} {MeasurementId}: {Reason}";
}
