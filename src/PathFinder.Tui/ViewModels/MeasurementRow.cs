using PathFinder.Tui.Analysis;

namespace PathFinder.Tui.ViewModels;

/// <summary>One row of the measurements table; its cells and search key are formatted once, on first use.</summary>
/// <remarks>
/// Rows are rebuilt only when the analysis or the curation changes, so a keystroke (filter, sort, move) never
/// formats a number again: on a 30 000-row network that formatting is what made typing in the filter slow.
/// </remarks>
public sealed class MeasurementRow
{
    /// <summary>Separates cells in <see cref="SearchKey"/>, so a filter never matches across two cells.</summary>
    public const char KeySeparator = '\u001f';

    private string[]? _cells;
    private string? _searchKey;

    /// <summary>Creates a row.</summary>
    /// <param name="measurement">The measurement.</param>
    /// <param name="assessment">The analysis of it; null when it is excluded or not analysed yet.</param>
    /// <param name="exclusionReason">Why it is excluded, or null when it is used.</param>
    public MeasurementRow(Measurement measurement, MeasurementAssessment? assessment, string? exclusionReason)
    {
        Measurement = measurement ?? throw new ArgumentNullException(nameof(measurement));
        Assessment = assessment;
        ExclusionReason = exclusionReason;
    }

    /// <summary>The measurement.</summary>
    public Measurement Measurement { get; }

    /// <summary>The analysis of it; null when it is excluded or not analysed yet.</summary>
    public MeasurementAssessment? Assessment { get; }

    /// <summary>Why it is excluded, or null when it is used.</summary>
    public string? ExclusionReason { get; }

    /// <summary>Whether curation leaves this measurement out.</summary>
    public bool IsExcluded => ExclusionReason is not null;

    /// <summary>The status word: "excluded", "SUSPECT", "ok", "unchecked" or "—".</summary>
    public string StatusText => IsExcluded ? "excluded" : StatusWord(Assessment?.Status ?? MeasurementStatus.NotAnalysed);

    /// <summary>The cells shown, in <see cref="MeasurementsViewModel.Headers"/> order.</summary>
    public IReadOnlyList<string> Cells => _cells ??=
    [
        Measurement.Id,
        StatusText,
        IsExcluded ? Display.NotAvailable : Display.Z(Assessment?.NormalizedResidual),
        Quantities.ThermoProperties.Code(Measurement.Property),
        Display.ValueWithUncertainty(Measurement.Value, Measurement.Uncertainty),
        Measurement.Source,
        Measurement.Equation.ToString(),
    ];

    /// <summary>The cells and the equation as written, lower-cased (invariant) and joined by <see cref="KeySeparator"/>: what the filter searches.</summary>
    public string SearchKey => _searchKey ??= string.Join(KeySeparator, Cells.Append(Measurement.EquationText)).ToLowerInvariant();

    /// <summary>Whether the row contains <paramref name="lowerCaseText"/> (already lower-cased invariantly) in one of its cells.</summary>
    public bool Matches(string lowerCaseText) => SearchKey.Contains(lowerCaseText, StringComparison.Ordinal);

    /// <summary>The word for a status (never a colour alone).</summary>
    public static string StatusWord(MeasurementStatus status) => status switch
    {
        MeasurementStatus.Consistent => "ok",
        MeasurementStatus.Suspect => "SUSPECT",
        MeasurementStatus.Unchecked => "unchecked",
        _ => Display.NotAvailable,
    };
}
