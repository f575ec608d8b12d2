using PathFinder.Algebra;
using PathFinder.Chemistry;
using PathFinder.Solving;

namespace PathFinder.Analysis;

/// <summary>A reaction quantity (ΔrH°, ΔrS° or ΔrG° at T) written as a combination of the joint model's unknowns plus a heat-capacity shift.</summary>
/// <remarks>Value(T) = vectorᵀx + <see cref="Shift"/>; the shift is taken as exact (no uncertainty is given for heat capacities).</remarks>
/// <param name="Family">Which quantity.</param>
/// <param name="Temperature">T in K.</param>
/// <param name="Vector">The exact combination of unknowns (at 298.15 K for ΔrH° and ΔrS°; for ΔrG° the T-dependent one).</param>
/// <param name="Shift">∫ΔrCp dT /1000 (kJ/mol), ∫ΔrCp/T dT (J/(mol·K)) or their Gibbs combination; 0 at 298.15 K or when heat capacities are lacking.</param>
/// <param name="Missing">Species the quantity needs that no datum touches (then the quantity is not determined).</param>
/// <param name="LackingHeatCapacity">Species without heat-capacity data, when T is not 298.15 K (then the quantity is not moved).</param>
public sealed record ModelQuantity(PropertyFamily Family, double Temperature, SparseVector Vector, double Shift, IReadOnlyList<Species> Missing, IReadOnlyList<Species> LackingHeatCapacity)
{
    /// <summary>Whether the quantity can be evaluated: every species is in the model and, away from 298.15 K, has heat-capacity data.</summary>
    public bool CanEvaluate => Missing.Count == 0 && LackingHeatCapacity.Count == 0;

    /// <summary>The floating-point row for the least-squares solution.</summary>
    public SparseRow Row => PropertyModel.RowOf(Vector);

    /// <summary>The estimate from a solution of the model, or null when the data do not determine it.</summary>
    /// <remarks>A quantity of conventional zeros only (e.g. ΔrH° among elements in reference states) is exactly the shift.</remarks>
    public DerivedEstimate? Evaluate(LeastSquaresSolution solution)
    {
        ArgumentNullException.ThrowIfNull(solution);
        if (!CanEvaluate)
        {
            return null;
        }

        if (Vector.IsZero)
        {
            return new DerivedEstimate(true, Shift, 0.0);
        }

        DerivedEstimate estimate = solution.Estimate(Row);
        return estimate.IsEstimable ? estimate with { Value = estimate.Value + Shift } : null;
    }
}
