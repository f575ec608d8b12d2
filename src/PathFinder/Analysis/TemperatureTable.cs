using System.Globalization;
using PathFinder.Chemistry;
using PathFinder.Quantities;
using PathFinder.Solving;
using PathFinder.Thermodynamics;

namespace PathFinder.Analysis;

/// <summary>Every species' ΔfH°, S° or ΔfG° moved from 298.15 K to another temperature with heat-capacity data.</summary>
/// <remarks>
/// <para>ΔfH°(T) = ΔfH°(298.15 K) + ∫ΔfCp dT, where ΔfCp is the heat capacity of the formation reaction: the species'
/// Cp minus its elements' (in their 298.15 K reference states: graphite, H2(g), O2(g), …). So ΔfH°(T) needs Cp of the
/// species and of every element in it; species lacking any are listed with what is missing.</para>
/// <para>S°(T) = S°(298.15 K) + ∫Cp/T dT needs only the species' own Cp.</para>
/// <para>ΔfG°(T) = ΔfH°(298.15) − T·ΔfS°(298.15) + (∫ΔfCp dT − T·∫ΔfCp/T dT), one combination of the joint solution's
/// unknowns, so its uncertainty includes the correlation of ΔfH° and S°.</para>
/// <para>Uncertainties are those at 298.15 K: heat-capacity integrals are taken as exact. Phase changes of the
/// elements between 298.15 K and T are not modelled (the formation reaction keeps the 298.15 K reference states).</para>
/// </remarks>
/// <param name="Family">The family tabulated.</param>
/// <param name="Temperature">T in K.</param>
/// <param name="Species">One row per species the view concerns (determined or not), in model order.</param>
public sealed record TemperatureTable(PropertyFamily Family, double Temperature, IReadOnlyList<SpeciesAtTemperature> Species)
{
    /// <summary>The species whose value could not be moved for lack of heat capacities.</summary>
    public IEnumerable<SpeciesAtTemperature> LackingHeatCapacities => Species.Where(row => row.AtReference is not null && row.MissingHeatCapacities.Count > 0);

    /// <summary>Moves every species of <paramref name="family"/> to <paramref name="temperature"/>.</summary>
    /// <returns>The table, or null when the network holds nothing of that quantity.</returns>
    public static TemperatureTable? Evaluate(NetworkSolutions solutions, PropertyFamily family, double temperature)
    {
        ArgumentNullException.ThrowIfNull(solutions);
        if (!double.IsFinite(temperature) || temperature <= 0.0)
        {
            throw new ArgumentOutOfRangeException(nameof(temperature), temperature, "The temperature must be finite and positive, in K.");
        }

        SolveReport? report = solutions.Report(family);
        if (report is null)
        {
            return null;
        }

        var rows = new List<SpeciesAtTemperature>();
        foreach (SpeciesEstimate estimate in report.Species)
        {
            Species species = estimate.Species;
            ChemicalEquation moved = family == PropertyFamily.Entropy
                ? ChemicalEquation.FromTerms([new EquationTerm(species, Fractions.Fraction.One)])
                : ChemicalEquation.Formation(species);
            UncertainValue? atReference = estimate.IsDetermined ? new UncertainValue(estimate.Value, estimate.Uncertainty) : null;
            ModelQuantity quantity = report.Model.Quantity(family, moved, temperature);
            if (atReference is null || quantity.LackingHeatCapacity.Count > 0)
            {
                rows.Add(new SpeciesAtTemperature(species, atReference, null, quantity.LackingHeatCapacity, []));
                continue;
            }

            DerivedEstimate? atT = quantity.Evaluate(report.Solution);
            rows.Add(new SpeciesAtTemperature(species, atReference, atT is { } value ? new UncertainValue(value.Value, value.StandardUncertainty) : null, [], RangeNotes(report.Model.HeatCapacityOf(moved), temperature)));
        }

        return new TemperatureTable(family, temperature, rows);
    }

    private static IReadOnlyList<string> RangeNotes(ReactionHeatCapacity<Species> reaction, double temperature) =>
        reaction.CheckInterval(PhysicalConstants.StandardTemperature, temperature)
            .Select(warning => string.Create(CultureInfo.InvariantCulture, $"heat capacity of {warning.Species.Name} extrapolated: {warning.Warning.Message}"))
            .ToArray();
}
