using PathFinder.Tui.Analysis;

namespace PathFinder.Tui.ViewModels;

/// <summary>One row of the measurements table.</summary>
/// <param name="Measurement">The measurement.</param>
/// <param name="Assessment">The analysis of it; null when it is excluded or not analysed yet.</param>
/// <param name="ExclusionReason">Why it is excluded, or null when it is used.</param>
public sealed record MeasurementRow(Measurement Measurement, MeasurementAssessment? Assessment, string? ExclusionReason)
{
    /// <summary>Whether curation leaves this measurement out.</summary>
    public bool IsExcluded => ExclusionReason is not null;

    /// <summary>The status word: "excluded", "SUSPECT", "ok", "unchecked" or "—".</summary>
    public string StatusText => IsExcluded ? "excluded" : StatusWord(Assessment?.Status ?? MeasurementStatus.NotAnalysed);

    /// <summary>The cells shown, in <see cref="MeasurementsViewModel.Headers"/> order.</summary>
    public IReadOnlyList<string> Cells =>
    [
        Measurement.Id,
        StatusText,
        IsExcluded ? Display.NotAvailable : Display.Z(Assessment?.NormalizedResidual),
        Quantities.ThermoProperties.Code(Measurement.Property),
        Display.ValueWithUncertainty(Measurement.Value, Measurement.Uncertainty),
        Measurement.Source,
        Measurement.Equation.ToString(),
    ];

    /// <summary>The word for a status (never a colour alone).</summary>
    public static string StatusWord(MeasurementStatus status) => status switch
    {
        MeasurementStatus.Consistent => "ok",
        MeasurementStatus.Suspect => "SUSPECT",
        MeasurementStatus.Unchecked => "unchecked",
        _ => Display.NotAvailable,
    };
}
