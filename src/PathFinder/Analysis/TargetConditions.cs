using System.Globalization;
using PathFinder.Chemistry;
using PathFinder.Quantities;
using PathFinder.Thermodynamics;

namespace PathFinder.Analysis;

/// <summary>A target reaction's ΔrH, ΔrS, ΔrG and equilibrium constant at a chosen temperature, from the network's joint solution.</summary>
/// <remarks>
/// <para>All three come from the one joint solution (<see cref="ThermoModel"/>): ΔrH°(298.15 K) = Σν·ΔfH°,
/// ΔrS°(298.15 K) = Σν·S°, and ΔrG°(T) = ΔrH°(298.15) − T·ΔrS°(298.15) + (∫ΔrCp dT − T·∫ΔrCp/T dT), evaluated as one
/// combination of the unknowns, so its uncertainty includes the correlation of ΔfH° and S° that ΔG and K data create.
/// Kirchhoff's law moves ΔrH° and ΔrS° to T with the species' heat capacities; K = exp(−ΔrG°/RT).</para>
/// <para>Heat-capacity integrals are taken as exact (no uncertainty is given for Cp data).</para>
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
    /// <summary>Evaluates <paramref name="target"/> at <paramref name="temperature"/> from the network's joint solution (made once and reused).</summary>
    public static TargetConditions Evaluate(NetworkSolutions solutions, ChemicalEquation target, double temperature)
    {
        ArgumentNullException.ThrowIfNull(solutions);
        ArgumentNullException.ThrowIfNull(target);
        if (!double.IsFinite(temperature) || temperature <= 0.0)
        {
            throw new ArgumentOutOfRangeException(nameof(temperature), temperature, "The temperature must be finite and positive, in K.");
        }

        const double reference = PhysicalConstants.StandardTemperature;
        var notes = new List<string>();
        UncertainValue? enthalpy = solutions.Estimate(PropertyFamily.Enthalpy, target);
        UncertainValue? entropy = solutions.Estimate(PropertyFamily.Entropy, target);
        notes.Add(enthalpy is null ? "ΔrH°(298.15 K): not determined by the data" : "ΔrH°(298.15 K): joint least-squares estimate");
        notes.Add(entropy is null ? "ΔrS°(298.15 K): not determined (no S°, ΔS, ΔG or K data fix it)" : "ΔrS°(298.15 K): joint least-squares estimate");
        bool moved = Math.Abs(temperature - reference) > PropertyModel.TemperatureTolerance;
        string at = temperature.ToString("0.##", CultureInfo.InvariantCulture);
        if (moved)
        {
            ReactionHeatCapacity<Species> heatCapacity = solutions.Model.HeatCapacityOf(target);
            if (!heatCapacity.IsComplete)
            {
                notes.Add($"not moved to {at} K: no heat capacities for {string.Join(", ", heatCapacity.SpeciesWithoutData.Select(item => item.Name))}");
                return new TargetConditions(temperature, null, null, null, null, notes);
            }

            foreach (SpeciesRangeWarning<Species> warning in heatCapacity.CheckInterval(reference, temperature))
            {
                notes.Add($"heat capacity of {warning.Species.Name} extrapolated: {warning.Warning.Message}");
            }

            notes.Add("moved from 298.15 K with Kirchhoff's law (heat-capacity data)");
        }

        UncertainValue? enthalpyAtT = moved ? solutions.Estimate(PropertyFamily.Enthalpy, target, temperature) : enthalpy;
        UncertainValue? entropyAtT = moved ? solutions.Estimate(PropertyFamily.Entropy, target, temperature) : entropy;
        UncertainValue? gibbsAtT = solutions.Estimate(PropertyFamily.GibbsEnergy, target, temperature);
        if (gibbsAtT is not { } gibbs)
        {
            return new TargetConditions(temperature, enthalpyAtT, entropyAtT, null, null, notes);
        }

        if (enthalpyAtT is null || entropyAtT is null)
        {
            notes.Add($"ΔrG°({at} K): determined as a whole by ΔG or K data although ΔrH° and ΔrS° are not each");
        }

        EquilibriumConstant k = GibbsRelations.EquilibriumConstant(new UncertainValue(gibbs.Value * 1000.0, gibbs.StandardUncertainty * 1000.0), temperature);
        return new TargetConditions(temperature, enthalpyAtT, entropyAtT, gibbs, k, notes);
    }
}
