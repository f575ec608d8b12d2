using System.Globalization;
using PathFinder.Chemistry;
using PathFinder.Quantities;
using PathFinder.Thermodynamics;

namespace PathFinder.Analysis;

/// <summary>Every species' ΔfH°, S° or ΔfG° moved from 298.15 K to another temperature with heat-capacity data.</summary>
/// <remarks>
/// <para>ΔfH°(T) = ΔfH°(298.15 K) + ∫ΔfCp dT, where ΔfCp is the heat capacity of the formation reaction: the species'
/// Cp minus its elements' (in their 298.15 K reference states: graphite, H2(g), O2(g), …). So ΔfH°(T) needs Cp of the
/// species and of every element in it; species lacking any are listed with what is missing.</para>
/// <para>S°(T) = S°(298.15 K) + ∫Cp/T dT needs only the species' own Cp.</para>
/// <para>ΔfG°(T) = ΔfH°(T) − T·ΔfS°(T) comes from the ΔH and S° solutions (ΔG data alone cannot be moved in
/// temperature; they stand in for ΔfS° through (ΔH − ΔG)/T only when entropies are missing), see
/// <see cref="TargetConditions"/>. Its value at 298.15 K is computed the same way, so both columns agree in origin.</para>
/// <para>Uncertainties are those at 298.15 K: heat-capacity integrals are taken as exact. Phase changes of the
/// elements between 298.15 K and T are not modelled (the formation reaction keeps the 298.15 K reference states).</para>
/// </remarks>
/// <param name="Family">The family tabulated.</param>
/// <param name="Temperature">T in K.</param>
/// <param name="Species">One row per species the family's data involve (determined or not), in model order.</param>
public sealed record TemperatureTable(PropertyFamily Family, double Temperature, IReadOnlyList<SpeciesAtTemperature> Species)
{
    /// <summary>The species whose value could not be moved for lack of heat capacities.</summary>
    public IEnumerable<SpeciesAtTemperature> LackingHeatCapacities => Species.Where(row => row.AtReference is not null && row.MissingHeatCapacities.Count > 0);

    /// <summary>Moves every species of <paramref name="family"/> to <paramref name="temperature"/>.</summary>
    /// <returns>The table, or null when the network has no data of the family (for ΔfG°: no ΔH data).</returns>
    public static TemperatureTable? Evaluate(NetworkSolutions solutions, PropertyFamily family, double temperature)
    {
        ArgumentNullException.ThrowIfNull(solutions);
        if (!double.IsFinite(temperature) || temperature <= 0.0)
        {
            throw new ArgumentOutOfRangeException(nameof(temperature), temperature, "The temperature must be finite and positive, in K.");
        }

        SolveReport? report = solutions.Report(family == PropertyFamily.GibbsEnergy ? PropertyFamily.Enthalpy : family);
        if (report is null)
        {
            return null;
        }

        IReadOnlyDictionary<Species, IHeatCapacity> heatCapacities = solutions.HeatCapacities;
        var rows = new List<SpeciesAtTemperature>();
        foreach (SpeciesEstimate estimate in report.Species)
        {
            Species species = estimate.Species;
            ChemicalEquation moved = family == PropertyFamily.Entropy
                ? ChemicalEquation.FromTerms([new EquationTerm(species, Fractions.Fraction.One)])
                : ChemicalEquation.Formation(species);
            var reaction = new ReactionHeatCapacity<Species>(moved.Terms
                .Where(term => !term.Species.Formula.IsElectron)
                .Select(term => new ReactionSpecies<Species>(term.Species, term.Coefficient.ToDouble(), heatCapacities.GetValueOrDefault(term.Species))));
            if (family == PropertyFamily.GibbsEnergy)
            {
                rows.Add(Gibbs(solutions, species, moved, reaction, temperature));
                continue;
            }

            UncertainValue? atReference = estimate.IsDetermined ? new UncertainValue(estimate.Value, estimate.Uncertainty) : null;
            if (atReference is not { } value || !reaction.IsComplete)
            {
                rows.Add(new SpeciesAtTemperature(species, atReference, null, reaction.SpeciesWithoutData, []));
                continue;
            }

            double reference = PhysicalConstants.StandardTemperature;
            double shift = family == PropertyFamily.Enthalpy
                ? reaction.IntegrateHeatCapacity(reference, temperature) / 1000.0
                : reaction.IntegrateHeatCapacityOverTemperature(reference, temperature);
            rows.Add(new SpeciesAtTemperature(species, atReference, new UncertainValue(value.Value + shift, value.StandardUncertainty), [], RangeNotes(reaction, temperature)));
        }

        return new TemperatureTable(family, temperature, rows);
    }

    private static SpeciesAtTemperature Gibbs(NetworkSolutions solutions, Species species, ChemicalEquation formation, ReactionHeatCapacity<Species> reaction, double temperature)
    {
        TargetConditions atReference = TargetConditions.Evaluate(solutions, formation, PhysicalConstants.StandardTemperature);
        UncertainValue? reference = atReference.Gibbs;
        if (reference is null || !reaction.IsComplete)
        {
            return new SpeciesAtTemperature(species, reference, null, reaction.SpeciesWithoutData, reference is null ? atReference.Notes : []);
        }

        TargetConditions atT = TargetConditions.Evaluate(solutions, formation, temperature);
        return new SpeciesAtTemperature(species, reference, atT.Gibbs, [], RangeNotes(reaction, temperature));
    }

    private static IReadOnlyList<string> RangeNotes(ReactionHeatCapacity<Species> reaction, double temperature) =>
        reaction.CheckInterval(PhysicalConstants.StandardTemperature, temperature)
            .Select(warning => string.Create(CultureInfo.InvariantCulture, $"heat capacity of {warning.Species.Name} extrapolated: {warning.Warning.Message}"))
            .ToArray();
}
