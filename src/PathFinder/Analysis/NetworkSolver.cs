using System.Globalization;
using PathFinder.Chemistry;
using PathFinder.Solving;

namespace PathFinder.Analysis;

/// <summary>Solves the joint model by weighted least squares and reads species quantities off the one solution.</summary>
/// <remarks>
/// Unknowns are ΔfH° and S° of the species (and declared source offsets); each datum is one equation with weight 1/u²
/// (see <see cref="ThermoModel"/>). ΔfG° is derived: ΔfG° = ΔfH° − T·(S° − Σν·S° of the elements), with its
/// uncertainty from the full covariance, including the correlation of ΔfH° and S°. Species the data do not
/// determine get no number.
/// </remarks>
public static class NetworkSolver
{
    /// <summary>Solves <paramref name="model"/>; with <paramref name="adjust"/>, after the suspect procedure.</summary>
    public static JointSolution Solve(ThermoModel model, bool adjust = true, ConsistencyOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(model);
        options ??= new ConsistencyOptions();
        ObservationSystem system = model.ToObservationSystem();
        if (!adjust)
        {
            return new JointSolution(model, WeightedLeastSquares.Solve(system), false, [], []);
        }

        OutlierResult result = OutlierProcedure.Run(system, new OutlierOptions { Threshold = options.Threshold, InflationFactor = options.InflationFactor });
        return new JointSolution(model, result.Solution, true, result.Adjustments, result.Suspects);
    }

    /// <summary>The view of a joint solution for one species quantity, or null when the model has no unknowns of that kind.</summary>
    /// <param name="joint">The solution.</param>
    /// <param name="family">ΔfH° (enthalpy), S° (entropy) or ΔfG°(298.15 K) (Gibbs energy).</param>
    public static SolveReport? Report(JointSolution joint, PropertyFamily family)
    {
        ArgumentNullException.ThrowIfNull(joint);
        ThermoModel model = joint.Model;
        LeastSquaresSolution solution = joint.Solution;
        bool hasEnthalpy = model.Unknowns.Any(unknown => unknown.Kind == UnknownKind.FormationEnthalpy);
        bool hasEntropy = model.Unknowns.Any(unknown => unknown.Kind == UnknownKind.Entropy);
        bool present = family switch
        {
            PropertyFamily.Enthalpy => hasEnthalpy,
            PropertyFamily.Entropy => hasEntropy,
            _ => hasEnthalpy && hasEntropy,
        };
        if (!present)
        {
            return null;
        }

        int[] uses = new int[model.Unknowns.Count];
        foreach (Algebra.SparseVector vector in model.Vectors)
        {
            foreach (int index in vector.Indices)
            {
                uses[index]++;
            }
        }

        var estimates = new List<SpeciesEstimate>();
        foreach (Species species in model.Species)
        {
            int enthalpy = model.IndexOf(species, UnknownKind.FormationEnthalpy);
            int entropy = model.IndexOf(species, UnknownKind.Entropy);
            int enthalpyUses = enthalpy >= 0 ? uses[enthalpy] : 0;
            int entropyUses = entropy >= 0 ? uses[entropy] : 0;
            int measurements = family switch
            {
                PropertyFamily.Enthalpy => enthalpyUses,
                PropertyFamily.Entropy => entropyUses,
                _ => Math.Max(enthalpyUses, entropyUses),
            };
            switch (family)
            {
                case PropertyFamily.Enthalpy when enthalpy >= 0:
                    estimates.Add(Direct(solution, species, enthalpy, measurements));
                    break;
                case PropertyFamily.Entropy when entropy >= 0:
                    estimates.Add(Direct(solution, species, entropy, measurements));
                    break;
                case PropertyFamily.GibbsEnergy when !ReferenceStates.HasZeroFormationProperties(species):
                    DerivedEstimate? gibbs = model.Quantity(PropertyFamily.GibbsEnergy, ChemicalEquation.Formation(species)).Evaluate(solution);
                    estimates.Add(new SpeciesEstimate(species, gibbs?.Value ?? double.NaN, gibbs?.StandardUncertainty ?? double.NaN, measurements));
                    break;
            }
        }

        UnknownKind kind = family == PropertyFamily.Entropy ? UnknownKind.Entropy : UnknownKind.FormationEnthalpy;
        var groups = new List<string>();
        foreach (RelativeGroup group in family == PropertyFamily.GibbsEnergy ? [] : solution.RelativeGroups)
        {
            if (group.Members.Count < 2 || group.Members.Any(member => model.Unknowns[member].Kind != kind))
            {
                continue;
            }

            Species anchor = model.Unknowns[group.Members[0]].Species!;
            var parts = new List<string>();
            for (int k = 1; k < group.Members.Count; k++)
            {
                DerivedEstimate relative = solution.Estimate(group.RelativeCombination(k));
                string ratio = Math.Abs(group.Ratios[k] - 1.0) < 1e-12 ? "" : group.Ratios[k].ToString("0.###", CultureInfo.InvariantCulture) + "·";
                string member = model.Unknowns[group.Members[k]].Species!.Name;
                parts.Add(relative.IsEstimable
                    ? string.Create(CultureInfo.InvariantCulture, $"{member} − {ratio}{anchor.Name} = {relative.Value:0.###} ± {relative.StandardUncertainty:0.###}")
                    : $"{member} (not even relative)");
            }

            groups.Add(string.Join("; ", parts));
        }

        return new SolveReport(model, solution, family, estimates, estimates.Where(estimate => !estimate.IsDetermined).ToArray(), groups, joint.Adjusted, joint.Adjustments, joint.Suspects);
    }

    private static SpeciesEstimate Direct(LeastSquaresSolution solution, Species species, int unknown, int measurements)
    {
        bool determined = solution.IsDetermined(unknown);
        return new SpeciesEstimate(species, determined ? solution.Values[unknown] : double.NaN, determined ? solution.StandardUncertainties[unknown] : double.NaN, measurements);
    }
}
