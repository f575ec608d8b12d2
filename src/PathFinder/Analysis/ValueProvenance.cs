using PathFinder.Chemistry;
using PathFinder.Quantities;
using PathFinder.Solving;

namespace PathFinder.Analysis;

/// <summary>Where a network estimate comes from: every measurement's sensitivity and share of the variance, and the sources that dominate.</summary>
/// <remarks>
/// <para>For a target with vector a over the unknowns, the least-squares estimate is linear in the measured values,
/// aᵀx̂ = Σ sᵢ·vᵢ with sᵢ = wᵢ·aᵢᵀ·C·a (C the covariance of x̂, wᵢ = 1/uᵢ²). Its variance is
/// Var = Σ sᵢ²·uᵢ² = aᵀ·C·a, so the contributions sᵢ²uᵢ² add up exactly to the variance and each share is a
/// fraction of the whole.</para>
/// <para>When the solve ran the suspect procedure, the enlarged uncertainties are the ones used (they are held
/// fixed: the sensitivities are those of the final weighted solve). The prior of a declared source systematic is an
/// observation too: its part of the variance is counted under its source, not as a measurement.</para>
/// </remarks>
public sealed class ValueProvenance
{
    private ValueProvenance(
        ThermoModel model,
        PropertyFamily family,
        ChemicalEquation target,
        double value,
        double variance,
        IReadOnlyList<MeasurementContribution> contributions,
        IReadOnlyList<SourceContribution> sources,
        IReadOnlyList<Species> missingSpecies,
        string? reason,
        IReadOnlyList<SourceContribution>? systematics = null)
    {
        Systematics = systematics ?? [];
        Model = model;
        Family = family;
        Target = target;
        Value = value;
        Variance = variance;
        Contributions = contributions;
        Sources = sources;
        MissingSpecies = missingSpecies;
        Reason = reason;
    }

    /// <summary>The model solved.</summary>
    public ThermoModel Model { get; }

    /// <summary>Which quantity of the target is traced: ΔrH°, ΔrS° or ΔrG° at 298.15 K.</summary>
    public PropertyFamily Family { get; }

    /// <summary>The target equation.</summary>
    public ChemicalEquation Target { get; }

    /// <summary>Whether the data determine the target.</summary>
    public bool IsDetermined => double.IsFinite(Value);

    /// <summary>The network estimate in the quantity's unit, kJ/mol or J/(mol·K) (NaN when not determined).</summary>
    public double Value { get; }

    /// <summary>Its variance (unit squared; NaN when not determined).</summary>
    public double Variance { get; }

    /// <summary>Its standard uncertainty √Variance.</summary>
    public double StandardUncertainty => Math.Sqrt(Variance);

    /// <summary>Measurements with a non-zero sensitivity, largest variance contribution first.</summary>
    public IReadOnlyList<MeasurementContribution> Contributions { get; }

    /// <summary>The part of the variance from declared source systematics (their priors), one entry per source, largest first; with <see cref="Contributions"/> the shares add up to 1.</summary>
    public IReadOnlyList<SourceContribution> Systematics { get; }

    /// <summary>Variance by source (its measurements and its declared systematic), largest first.</summary>
    public IReadOnlyList<SourceContribution> Sources { get; }

    /// <summary>Target species that no datum bearing on the quantity contains.</summary>
    public IReadOnlyList<Species> MissingSpecies { get; }

    /// <summary>Why the target is not determined, or a note for special cases (null otherwise).</summary>
    public string? Reason { get; }

    /// <summary>Traces <paramref name="target"/> through a view of the joint solution.</summary>
    /// <param name="report">The view: its family says which quantity of the target is traced.</param>
    /// <param name="target">The target equation (element-balanced).</param>
    /// <param name="sensitivityTolerance">Sensitivities with |s| at or below this are left out (default 1e-12; they are round-off).</param>
    public static ValueProvenance Trace(SolveReport report, ChemicalEquation target, double sensitivityTolerance = 1e-12)
    {
        ArgumentNullException.ThrowIfNull(report);
        ArgumentNullException.ThrowIfNull(target);
        ThermoModel model = report.Model;
        PropertyFamily family = report.Family;
        ModelQuantity quantity = model.Quantity(family, target);
        IReadOnlyList<Species> missing = quantity.Missing;
        if (missing.Count > 0)
        {
            string which = string.Join(", ", missing.Select(species => species.Name));
            return new ValueProvenance(model, family, target, double.NaN, double.NaN, [], [], missing, $"no datum that bears on {family.ResultProperty().Symbol()} contains {which}");
        }

        if (quantity.Vector.IsZero)
        {
            return new ValueProvenance(model, family, target, 0.0, 0.0, [], [], [], $"every species of the target has {family.SpeciesQuantity()} = 0 by convention, so the value is exactly 0");
        }

        QuantityProvenance provenance = report.Solution.Provenance(quantity.Row);
        if (!provenance.Estimate.IsEstimable)
        {
            return new ValueProvenance(model, family, target, double.NaN, double.NaN, [], [], [], "the data do not determine this combination (the species involved are known only relative to others)");
        }

        double variance = provenance.Estimate.Variance;
        ProvenanceEntry[] entries = provenance.Contributions.Where(entry => Math.Abs(entry.Sensitivity) > sensitivityTolerance).ToArray();
        var contributions = entries
            .Where(entry => !model.IsPrior(entry.ObservationIndex))
            .Select(entry => new MeasurementContribution(
                entry.ObservationIndex,
                model.Measurements[entry.ObservationIndex],
                entry.Sensitivity,
                report.Solution.System.Observations[entry.ObservationIndex].Uncertainty,
                entry.VarianceContribution,
                entry.Share))
            .ToArray();
        var priors = entries
            .Where(entry => model.IsPrior(entry.ObservationIndex))
            .Select(entry => (Source: model.Systematics[entry.ObservationIndex - model.Measurements.Count].Source, entry.VarianceContribution))
            .ToArray();
        SourceContribution[] systematics = priors
            .GroupBy(prior => prior.Source, StringComparer.Ordinal)
            .Select(group => new SourceContribution(group.Key, 0, group.Sum(item => item.VarianceContribution), variance > 0.0 ? group.Sum(item => item.VarianceContribution) / variance : 0.0))
            .OrderByDescending(item => item.VarianceContribution)
            .ToArray();
        var sources = contributions
            .Select(item => (item.Measurement.Source, Counted: 1, item.VarianceContribution))
            .Concat(priors.Select(prior => (prior.Source, Counted: 0, prior.VarianceContribution)))
            .GroupBy(item => item.Source, StringComparer.Ordinal)
            .Select(group =>
            {
                double sum = group.Sum(item => item.VarianceContribution);
                return new SourceContribution(group.Key, group.Sum(item => item.Counted), sum, variance > 0.0 ? sum / variance : 0.0);
            })
            .OrderByDescending(source => source.VarianceContribution)
            .ThenBy(source => source.Source, StringComparer.Ordinal)
            .ToArray();
        return new ValueProvenance(model, family, target, provenance.Estimate.Value, variance, contributions, sources, [], null, systematics);
    }

    /// <summary>Traces ΔrH°, ΔrS° or ΔrG° of <paramref name="target"/> through the network's joint solution.</summary>
    /// <returns>The provenance, or null when the network has no data that bear on that quantity.</returns>
    public static ValueProvenance? Trace(NetworkSolutions solutions, PropertyFamily family, ChemicalEquation target)
    {
        ArgumentNullException.ThrowIfNull(solutions);
        SolveReport? report = solutions.Report(family);
        return report is null ? null : Trace(report, target);
    }
}
