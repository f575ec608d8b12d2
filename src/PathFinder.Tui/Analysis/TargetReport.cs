using PathFinder.Chemistry;
using PathFinder.Quantities;

namespace PathFinder.Tui.Analysis;

/// <summary>Routes to a target reaction and the network's estimate of it.</summary>
/// <param name="Target">The target reaction.</param>
/// <param name="Property">The property wanted.</param>
/// <param name="Routes">Routes, best first (smallest uncertainty first).</param>
/// <param name="NetworkValue">The least-squares estimate for the target, canonical unit; null when not computed.</param>
/// <param name="NetworkUncertainty">Its standard uncertainty; null when not computed.</param>
/// <param name="Message">A note for the user (e.g. "no route: CH4(g) is not connected"), may be empty.</param>
public sealed record TargetReport(
    ChemicalEquation Target,
    ThermoProperty Property,
    IReadOnlyList<RouteReport> Routes,
    double? NetworkValue,
    double? NetworkUncertainty,
    string Message);
