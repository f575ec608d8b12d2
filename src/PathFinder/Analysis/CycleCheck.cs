using Fractions;

namespace PathFinder.Analysis;

/// <summary>A cycle of measurements that should close to zero (an empty route), and how far it misses.</summary>
/// <param name="Number">1-based position in the report (worst first).</param>
/// <param name="Members">The measurements with their exact integer factors (Σ cᵢ·reactionᵢ = 0).</param>
/// <param name="Residual">Closure residual Σ cᵢ·vᵢ.</param>
/// <param name="Uncertainty">√(Σ cᵢ²·uᵢ²).</param>
/// <param name="Z">Residual / uncertainty.</param>
/// <param name="Flagged">Whether |z| exceeds the threshold.</param>
/// <remarks>
/// A cycle may mix properties: ΔG − ΔH + (T/1000)·ΔS = 0 closes a reaction measured three ways. Its residual is then in
/// kJ/mol (the entropy rows' factors carry T/1000); a cycle of entropy rows alone is in J/(mol·K).
/// </remarks>
public sealed record CycleCheck(int Number, IReadOnlyList<(PreparedMeasurement Measurement, Fraction Factor)> Members, double Residual, double Uncertainty, double Z, bool Flagged)
{
    /// <summary>Whether the members are of more than one kind of value (ΔH, ΔG, ΔS/S°): a G = H − TS closure rather than a chemical cycle.</summary>
    public bool IsMixed => Members.Select(member => member.Measurement.IsEnergy ? member.Measurement.Symbol : "S").Distinct().Count() > 1;

    /// <summary>The unit of <see cref="Residual"/>: kJ/mol when any member is an energy, else J/(mol·K).</summary>
    public string Unit => Members.Any(member => member.Measurement.IsEnergy) ? "kJ/mol" : "J/(mol·K)";

    /// <summary>The symbol of the closure: the members' common symbol, or "ΔG − ΔH + TΔS" style "Σ" for a mixed cycle.</summary>
    public string Symbol => IsMixed ? "Σ" : Members[0].Measurement.Symbol;
}
