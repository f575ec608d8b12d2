namespace PathFinder.Analysis;

/// <summary>One entry of the covariance of solved species quantities, in long format.</summary>
/// <param name="Row">The first quantity, e.g. <c>ΔfH°(CO2(g))</c>.</param>
/// <param name="Column">The second quantity.</param>
/// <param name="Covariance">Cov(row, column) in the product of their units ((kJ/mol)², kJ/mol·J/(mol·K), …).</param>
public readonly record struct CovarianceEntry(string Row, string Column, double Covariance);
