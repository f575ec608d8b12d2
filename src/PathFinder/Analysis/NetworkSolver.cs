using System.Globalization;
using PathFinder.Chemistry;
using PathFinder.Solving;

namespace PathFinder.Analysis;

/// <summary>Solves a property family by weighted least squares: one self-consistent set of species values with covariance.</summary>
/// <remarks>
/// Unknowns are the species' ΔfH° (or ΔfG°, S°); elements in reference states are fixed at zero; each measurement is
/// one equation Σνₛ·Xₛ = v with weight 1/u². Species the data do not determine get no number.
/// </remarks>
public static class NetworkSolver
{
    /// <summary>Solves <paramref name="model"/>; with <paramref name="adjust"/>, after the suspect procedure.</summary>
    public static SolveReport Solve(PropertyModel model, bool adjust = true, ConsistencyOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(model);
        options ??= new ConsistencyOptions();
        ObservationSystem system = model.ToObservationSystem();
        LeastSquaresSolution solution;
        IReadOnlyList<UncertaintyAdjustment> adjustments = [];
        IReadOnlyList<OutlierSuspect> suspects = [];
        if (adjust)
        {
            OutlierResult result = OutlierProcedure.Run(system, new OutlierOptions { Threshold = options.Threshold, InflationFactor = options.InflationFactor });
            solution = result.Solution;
            adjustments = result.Adjustments;
            suspects = result.Suspects;
        }
        else
        {
            solution = WeightedLeastSquares.Solve(system);
        }

        return Report(model, solution, adjust, adjustments, suspects);
    }

    /// <summary>Builds the report for an existing solution of <paramref name="model"/>.</summary>
    public static SolveReport Report(PropertyModel model, LeastSquaresSolution solution, bool adjusted, IReadOnlyList<UncertaintyAdjustment> adjustments, IReadOnlyList<OutlierSuspect> suspects)
    {
        ArgumentNullException.ThrowIfNull(model);
        ArgumentNullException.ThrowIfNull(solution);
        int[] uses = new int[model.Unknowns.Count];
        foreach (Algebra.SparseVector vector in model.Vectors)
        {
            foreach (int index in vector.Indices)
            {
                uses[index]++;
            }
        }

        var estimates = new SpeciesEstimate[model.Unknowns.Count];
        for (int i = 0; i < estimates.Length; i++)
        {
            bool determined = solution.IsDetermined(i);
            estimates[i] = new SpeciesEstimate(
                model.Unknowns[i],
                determined ? solution.Values[i] : double.NaN,
                determined ? solution.StandardUncertainties[i] : double.NaN,
                uses[i]);
        }

        var groups = new List<string>();
        foreach (RelativeGroup group in solution.RelativeGroups)
        {
            if (group.Members.Count < 2)
            {
                continue;
            }

            Species anchor = model.Unknowns[group.Members[0]];
            var parts = new List<string>();
            for (int k = 1; k < group.Members.Count; k++)
            {
                Algebra.SparseVector combination = Algebra.SparseVector.Create(
                    [(group.Members[k], Fractions.Fraction.One), (group.Members[0], Fractions.Fraction.FromDouble(-group.Ratios[k]))]);
                DerivedEstimate relative = solution.Estimate(PropertyModel.RowOf(combination));
                string ratio = Math.Abs(group.Ratios[k] - 1.0) < 1e-12 ? "" : group.Ratios[k].ToString("0.###", CultureInfo.InvariantCulture) + "·";
                parts.Add(relative.IsEstimable
                    ? string.Create(CultureInfo.InvariantCulture, $"{model.Unknowns[group.Members[k]].Name} − {ratio}{anchor.Name} = {relative.Value:0.###} ± {relative.StandardUncertainty:0.###}")
                    : $"{model.Unknowns[group.Members[k]].Name} (not even relative)");
            }

            groups.Add(string.Join("; ", parts));
        }

        return new SolveReport(model, solution, estimates, estimates.Where(estimate => !estimate.IsDetermined).ToArray(), groups, adjusted, adjustments, suspects);
    }
}
