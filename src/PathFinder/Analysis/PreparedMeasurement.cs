using PathFinder.Chemistry;
using PathFinder.Quantities;

namespace PathFinder.Analysis;

/// <summary>A measurement made ready for analysis: converted to its family's property at the reference temperature.</summary>
/// <remarks>
/// Energies (ΔH, ΔU, ΔG, and ln K or log₁₀ K read as ΔrG° = −RT·ln K) are in kJ/mol; entropies (ΔS, S°) in J/(mol·K).
/// <see cref="Correction"/> is the part of <see cref="Value"/> the analysis added itself, so Value − Correction is the
/// number as typed, in the row's unit.
/// </remarks>
/// <param name="Measurement">The measurement as read.</param>
/// <param name="Value">The value used: ΔU converted to ΔH, moved to the reference temperature when heat capacities allow (canonical unit).</param>
/// <param name="Uncertainty">The standard uncertainty used (canonical unit).</param>
/// <param name="Adjustments">Each conversion applied, in words with its size, e.g. "ΔU → ΔH: +1.239 kJ/mol (Δn(gas) = -1/2)".</param>
public sealed record PreparedMeasurement(Measurement Measurement, double Value, double Uncertainty, IReadOnlyList<string> Adjustments)
{
    /// <summary>The additive part of <see cref="Value"/> that preparation added (ΔU → ΔH term, Kirchhoff shift), in the row's unit.</summary>
    public double Correction { get; init; }

    /// <summary>Whether the row is an energy (kJ/mol: ΔH, ΔU, ΔG, K) rather than an entropy (J/(mol·K): ΔS, S°).</summary>
    public bool IsEnergy => Measurement.Property.Dimension() != UnitDimension.MolarEntropy;

    /// <summary>The unit of <see cref="Value"/>: kJ/mol or J/(mol·K).</summary>
    public EnergyUnit Unit => IsEnergy ? EnergyUnit.KilojoulePerMole : EnergyUnit.JoulePerMoleKelvin;

    /// <summary>The symbol of <see cref="Value"/>: ΔH (also for ΔU rows), ΔG (also for ln K and log₁₀ K rows), ΔS or S°.</summary>
    public string Symbol => Measurement.Property switch
    {
        ThermoProperty.Enthalpy or ThermoProperty.InternalEnergy => "ΔH",
        ThermoProperty.Entropy => "ΔS",
        ThermoProperty.AbsoluteEntropy => "S°",
        _ => "ΔG",
    };

    /// <summary>The measurement's id.</summary>
    public string Id => Measurement.Id;

    /// <summary>The equation.</summary>
    public ChemicalEquation Equation => Measurement.Equation;

    /// <summary>The source.</summary>
    public string Source => Measurement.Source;
}
