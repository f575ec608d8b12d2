using System.Globalization;
using PathFinder.Chemistry;
using PathFinder.Quantities;
using PathFinder.Solving;
using PathFinder.Thermodynamics;

namespace PathFinder.Analysis;

/// <summary>A target reaction's ΔrH, ΔrS, ΔrG and equilibrium constant at a chosen temperature, from the network solutions.</summary>
/// <remarks>
/// <para>ΔrH°(298.15 K) comes from the enthalpy solution and ΔrS°(298.15 K) from the entropy solution (ΔS and S° data),
/// or, when entropies do not determine it, from ΔS = (ΔH − ΔG)/T with the Gibbs-energy solution. Kirchhoff's law moves
/// both to T with the species' heat capacities; ΔrG(T) = ΔrH(T) − T·ΔrS(T) and K = exp(−ΔrG°/RT).</para>
/// <para>Uncertainties: the families are solved from disjoint measurements, so ΔH and ΔS are taken as uncorrelated;
/// heat-capacity integrals are taken as exact (no uncertainty is given for Cp data).</para>
/// </remarks>
/// <param name="Temperature">T in K.</param>
/// <param name="Enthalpy">ΔrH°(T) in kJ/mol, or null when the data do not determine it.</param>
/// <param name="Entropy">ΔrS°(T) in J/(mol·K), or null.</param>
/// <param name="Gibbs">ΔrG°(T) in kJ/mol, or null.</param>
/// <param name="EquilibriumConstant">K(T), or null.</param>
/// <param name="Notes">How each number was obtained, and what is missing.</param>
public sealed record TargetConditions(
    double Temperature,
    UncertainValue? Enthalpy,
    UncertainValue? Entropy,
    UncertainValue? Gibbs,
    EquilibriumConstant? EquilibriumConstant,
    IReadOnlyList<string> Notes)
{
    /// <summary>Evaluates <paramref name="target"/> at <paramref name="temperature"/> from the network solutions (made once and reused).</summary>
    public static TargetConditions Evaluate(NetworkSolutions solutions, ChemicalEquation target, double temperature)
    {
        ArgumentNullException.ThrowIfNull(solutions);
        ArgumentNullException.ThrowIfNull(target);
        if (!double.IsFinite(temperature) || temperature <= 0.0)
        {
            throw new ArgumentOutOfRangeException(nameof(temperature), temperature, "The temperature must be finite and positive, in K.");
        }

        IReadOnlyDictionary<Species, IHeatCapacity> heatCapacities = solutions.HeatCapacities;
        const double reference = PhysicalConstants.StandardTemperature;
        var notes = new List<string>();
        UncertainValue? enthalpy = solutions.Estimate(PropertyFamily.Enthalpy, target);
        UncertainValue? entropy = solutions.Estimate(PropertyFamily.Entropy, target);
        notes.Add(enthalpy is null ? "ΔrH°(298.15 K): not determined by the ΔH/ΔU data" : "ΔrH°(298.15 K): network least-squares estimate");
        if (entropy is null)
        {
            UncertainValue? gibbs = solutions.Estimate(PropertyFamily.GibbsEnergy, target);
            if (enthalpy is { } h && gibbs is { } g)
            {
                entropy = GibbsRelations.Entropy(new UncertainValue(h.Value * 1000, h.StandardUncertainty * 1000), new UncertainValue(g.Value * 1000, g.StandardUncertainty * 1000), reference);
                notes.Add("ΔrS°(298.15 K): from (ΔH − ΔG)/T with the ΔG data");
            }
            else
            {
                notes.Add("ΔrS°(298.15 K): not determined (no ΔS, S° or ΔG data reach the target)");
            }
        }
        else
        {
            notes.Add("ΔrS°(298.15 K): network least-squares estimate from ΔS and S° data");
        }

        var species = target.Terms
            .Where(term => !term.Species.Formula.IsElectron)
            .Select(term => new ReactionSpecies<Species>(term.Species, term.Coefficient.ToDouble(), heatCapacities.GetValueOrDefault(term.Species)))
            .ToArray();
        var heatCapacity = new ReactionHeatCapacity<Species>(species);
        bool moved = Math.Abs(temperature - reference) > PropertyModel.TemperatureTolerance;
        if (moved && !heatCapacity.IsComplete)
        {
            notes.Add($"not moved to {temperature.ToString("0.##", CultureInfo.InvariantCulture)} K: no heat capacities for {string.Join(", ", heatCapacity.SpeciesWithoutData.Select(item => item.Name))}");
            return new TargetConditions(temperature, null, null, null, null, notes);
        }

        if (moved)
        {
            foreach (SpeciesRangeWarning<Species> warning in heatCapacity.CheckInterval(reference, temperature))
            {
                notes.Add($"heat capacity of {warning.Species.Name} extrapolated: {warning.Warning.Message}");
            }
        }

        UncertainValue? enthalpyAtT = enthalpy is { } hh
            ? new UncertainValue(hh.Value + (heatCapacity.IntegrateHeatCapacity(reference, temperature) / 1000.0), hh.StandardUncertainty)
            : null;
        UncertainValue? entropyAtT = entropy is { } ss
            ? new UncertainValue(ss.Value + heatCapacity.IntegrateHeatCapacityOverTemperature(reference, temperature), ss.StandardUncertainty)
            : null;
        if (moved)
        {
            notes.Add("moved from 298.15 K with Kirchhoff's law (heat-capacity data)");
        }

        if (enthalpyAtT is not { } hT || entropyAtT is not { } sT)
        {
            return new TargetConditions(temperature, enthalpyAtT, entropyAtT, null, null, notes);
        }

        UncertainValue gibbsJoules = GibbsRelations.GibbsEnergy(new UncertainValue(hT.Value * 1000, hT.StandardUncertainty * 1000), sT, temperature);
        EquilibriumConstant k = GibbsRelations.EquilibriumConstant(gibbsJoules, temperature);
        var gibbsAtT = new UncertainValue(gibbsJoules.Value / 1000.0, gibbsJoules.StandardUncertainty / 1000.0);
        return new TargetConditions(temperature, enthalpyAtT, entropyAtT, gibbsAtT, k, notes);
    }
}
