using PathFinder.Solving;

namespace PathFinder.Analysis;

/// <summary>The one least-squares solution of a network's joint model, with what the suspect procedure did to get it.</summary>
/// <param name="Model">The joint model.</param>
/// <param name="Solution">The solution (after the procedure when <paramref name="Adjusted"/>).</param>
/// <param name="Adjusted">Whether the suspect procedure ran.</param>
/// <param name="Adjustments">Its uncertainty enlargements, in order.</param>
/// <param name="Suspects">Observations it found inconsistent (indices into the model's observations).</param>
public sealed record JointSolution(ThermoModel Model, LeastSquaresSolution Solution, bool Adjusted, IReadOnlyList<UncertaintyAdjustment> Adjustments, IReadOnlyList<OutlierSuspect> Suspects);
