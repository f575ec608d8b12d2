using PathFinder.Chemistry;

namespace PathFinder.Analysis;

/// <summary>A measurement made ready for analysis: converted to its family's property at the reference temperature.</summary>
/// <param name="Measurement">The measurement as read.</param>
/// <param name="Value">The value used: ΔU converted to ΔH, moved to the reference temperature when heat capacities allow (canonical unit).</param>
/// <param name="Uncertainty">The standard uncertainty used (canonical unit).</param>
/// <param name="Adjustments">Each conversion applied, in words with its size, e.g. "ΔU → ΔH: +1.239 kJ/mol (Δn(gas) = -1/2)".</param>
public sealed record PreparedMeasurement(Measurement Measurement, double Value, double Uncertainty, IReadOnlyList<string> Adjustments)
{
    /// <summary>The measurement's id.</summary>
    public string Id => Measurement.Id;

    /// <summary>The equation.</summary>
    public ChemicalEquation Equation => Measurement.Equation;

    /// <summary>The source.</summary>
    public string Source => Measurement.Source;
}
