using System.Globalization;

namespace PathFinder.Thermodynamics;

/// <summary>A temperature or temperature interval that a heat-capacity model was asked to cover but lies (partly) outside its valid range.</summary>
/// <remarks>
/// The model still returns a value (its polynomial extrapolated from the nearest range); this warning is for the caller
/// to pass on. <see cref="Low"/> equals <see cref="High"/> for a single temperature. Temperatures in K.
/// </remarks>
/// <param name="Low">The lower end of the requested interval in K.</param>
/// <param name="High">The upper end of the requested interval in K.</param>
/// <param name="ValidRange">The range the model is valid over.</param>
public sealed record TemperatureRangeWarning(double Low, double High, TemperatureRange ValidRange)
{
    /// <summary>A sentence describing the extrapolation, with invariant number formatting.</summary>
    public string Message => Low < High
        ? string.Create(CultureInfo.InvariantCulture, $"the interval {Low:G}–{High:G} K extends outside the heat-capacity data's valid range {ValidRange}; values are extrapolated")
        : string.Create(CultureInfo.InvariantCulture, $"{Low:G} K lies outside the heat-capacity data's valid range {ValidRange}; values are extrapolated");
}
