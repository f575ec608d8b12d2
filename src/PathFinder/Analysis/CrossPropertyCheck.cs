using PathFinder.Chemistry;

namespace PathFinder.Analysis;

/// <summary>A reaction with ΔH, ΔS and ΔG measured at the same temperature, checked against ΔG = ΔH − T·ΔS.</summary>
/// <param name="Reaction">The reaction.</param>
/// <param name="Enthalpy">The ΔH measurement.</param>
/// <param name="Entropy">The ΔS measurement.</param>
/// <param name="Gibbs">The ΔG measurement.</param>
/// <param name="Temperature">The common temperature in K.</param>
/// <param name="Residual">ΔG − (ΔH − T·ΔS) in kJ/mol.</param>
/// <param name="Uncertainty">Combined standard uncertainty of the residual (independent measurements).</param>
/// <param name="Z">Residual / uncertainty.</param>
/// <param name="Flagged">Whether |z| exceeds the threshold.</param>
public sealed record CrossPropertyCheck(ChemicalEquation Reaction, Measurement Enthalpy, Measurement Entropy, Measurement Gibbs, double Temperature, double Residual, double Uncertainty, double Z, bool Flagged);
