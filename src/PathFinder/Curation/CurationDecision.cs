using System.Globalization;
using PathFinder.Diagnostics;

namespace PathFinder.Curation;

/// <summary>One decision about one measurement: exclude it or take it back, why, and when.</summary>
/// <param name="MeasurementId">The id of the measurement concerned.</param>
/// <param name="Action">Exclude or include.</param>
/// <param name="Reason">Why, in the curator's words; required for an exclusion.</param>
/// <param name="Date">The day the decision was made; null when the file gives no certain date (see <see cref="DateAsWritten"/>).</param>
public sealed record CurationDecision(string MeasurementId, CurationAction Action, string Reason, DateOnly? Date)
{
    /// <summary>Where the decision was read from (default when it was made in this session).</summary>
    public SourceLocation Location { get; init; }

    /// <summary>The date field as written in the file when it was not a certain date (such as <c>05/06/2024</c>), else null.</summary>
    /// <remarks>Kept so that a date PathFinder cannot read is shown and never lost.</remarks>
    public string? DateAsWritten { get; init; }

    /// <summary>The action as written in the file: <c>exclude</c> or <c>include</c>.</summary>
    public string ActionText => Action == CurationAction.Exclude ? CurationFile.ExcludeWord : CurationFile.IncludeWord;

    /// <summary>The date in ISO 8601 form (<c>yyyy-MM-dd</c>), or the text as written when it is not a certain date.</summary>
    public string DateText => Date is { } date ? date.ToString("yyyy-MM-dd", CultureInfo.InvariantCulture) : DateAsWritten ?? "";

    /// <summary>Whether <paramref name="other"/> says the same thing (id, action, reason and date), wherever it was read.</summary>
    public bool SaysTheSameAs(CurationDecision? other) =>
        other is not null &&
        string.Equals(MeasurementId, other.MeasurementId, StringComparison.Ordinal) &&
        Action == other.Action &&
        string.Equals(Reason, other.Reason, StringComparison.Ordinal) &&
        string.Equals(DateText, other.DateText, StringComparison.Ordinal);

    /// <inheritdoc/>
    public override string ToString() => $"{DateText} {ActionText} {MeasurementId}: {Reason}";
}
