using PathFinder.Diagnostics;
using PathFinder.Quantities;

namespace PathFinder;

/// <summary>A standard uncertainty shared by every measurement of one source (a calibration, an auxiliary value used throughout).</summary>
/// <remarks>
/// Declared in <c>sources.csv</c> beside the data (<c>source,systematic,unit[,note]</c>). The analysis models it as
/// one unknown offset per source with the prior 0 ± <see cref="Systematic"/>, added to every measurement of that
/// source whose dimension matches <see cref="Unit"/> (energy offsets act on ΔH, ΔU, ΔG and equilibrium-constant
/// rows read as ΔG; entropy offsets on ΔS and S° rows). This equals generalized least squares with a block
/// covariance u²(systematic) shared by the source's measurements.
/// </remarks>
/// <param name="Source">The source name, exactly as in the data's <c>source</c> column (or the file name that stands for it).</param>
/// <param name="Systematic">The shared standard uncertainty in the canonical unit of <paramref name="Unit"/>'s dimension (kJ/mol or J/(mol·K)); positive.</param>
/// <param name="Unit">The unit it was written in (energy or entropy).</param>
/// <param name="Note">Free text from the optional <c>note</c> column.</param>
/// <param name="Location">Where the declaration is.</param>
public sealed record SourceSystematic(string Source, double Systematic, EnergyUnit Unit, string Note, SourceLocation Location)
{
    /// <summary>Whether the offset applies to energies (kJ/mol) rather than entropies (J/(mol·K)).</summary>
    public bool IsEnergy => Unit.Dimension == UnitDimension.MolarEnergy;
}
