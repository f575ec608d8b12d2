namespace PathFinder.Tui.Analysis;

/// <summary>One thermochemical cycle: measurements whose signed, scaled sum should be zero.</summary>
/// <param name="MeasurementIds">The measurements in the cycle.</param>
/// <param name="Factors">The exact factor applied to each measurement (e.g. "-1", "1/2"), same order.</param>
/// <param name="Residual">The closure Σ fᵢ·xᵢ in the canonical unit; null when not computed.</param>
/// <param name="Uncertainty">Its standard uncertainty √(Σ fᵢ²·uᵢ²); null when not computed.</param>
/// <param name="Z">Residual / uncertainty; null when not computed.</param>
/// <param name="Flagged">Whether |z| exceeds the analysis' threshold.</param>
public sealed record CycleReport(
    IReadOnlyList<string> MeasurementIds,
    IReadOnlyList<string> Factors,
    double? Residual,
    double? Uncertainty,
    double? Z,
    bool Flagged);
