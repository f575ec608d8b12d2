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
/// fixed: the sensitivities are those of the final weighted solve).</para>
/// </remarks>
public sealed class ValueProvenance
{
    private ValueProvenance(
        PropertyModel model,
        ChemicalEquation target,
        double value,
        double variance,
        IReadOnlyList<MeasurementContribution> contributions,
        IReadOnlyList<SourceContribution> sources,
        IReadOnlyList<Species> missingSpecies,
        string? reason)
    {
        Model = model;
        Target = target;
        Value = value;
        Variance = variance;
        Contributions = contributions;
        Sources = sources;
        MissingSpecies = missingSpecies;
        Reason = reason;
    }

    /// <summary>The model solved.</summary>
    public PropertyModel Model { get; }

    /// <summary>The target equation.</summary>
    public ChemicalEquation Target { get; }

    /// <summary>Whether the data determine the target.</summary>
    public bool IsDetermined => double.IsFinite(Value);

    /// <summary>The network estimate in the family's unit (NaN when not determined).</summary>
    public double Value { get; }

    /// <summary>Its variance (unit squared; NaN when not determined).</summary>
    public double Variance { get; }

    /// <summary>Its standard uncertainty √Variance.</summary>
    public double StandardUncertainty => Math.Sqrt(Variance);

    /// <summary>Measurements with a non-zero sensitivity, largest variance contribution first.</summary>
    public IReadOnlyList<MeasurementContribution> Contributions { get; }

    /// <summary>Variance by source, largest first.</summary>
    public IReadOnlyList<SourceContribution> Sources { get; }

    /// <summary>Target species that no measurement of the family contains.</summary>
    public IReadOnlyList<Species> MissingSpecies { get; }

    /// <summary>Why the target is not determined, or a note for special cases (null otherwise).</summary>
    public string? Reason { get; }

    /// <summary>Traces <paramref name="target"/> through a solved family.</summary>
    /// <param name="report">The solved family.</param>
    /// <param name="target">The target equation (element-balanced).</param>
    /// <param name="sensitivityTolerance">Sensitivities with |s| at or below this are left out (default 1e-12; they are round-off).</param>
    public static ValueProvenance Trace(SolveReport report, ChemicalEquation target, double sensitivityTolerance = 1e-12)
    {
        ArgumentNullException.ThrowIfNull(report);
        ArgumentNullException.ThrowIfNull(target);
        PropertyModel model = report.Model;
        Algebra.SparseVector vector = model.VectorOf(target, out IReadOnlyList<Species> missing);
        if (missing.Count > 0)
        {
            string which = string.Join(", ", missing.Select(species => species.Name));
            return new ValueProvenance(model, target, double.NaN, double.NaN, [], [], missing, $"no {model.Family.ResultProperty().Symbol()} measurement contains {which}");
        }

        if (vector.IsZero)
        {
            return new ValueProvenance(model, target, 0.0, 0.0, [], [], [], $"every species of the target has {model.Family.SpeciesQuantity()} = 0 by convention, so the value is exactly 0");
        }

        QuantityProvenance provenance = report.Solution.Provenance(PropertyModel.RowOf(vector));
        if (!provenance.Estimate.IsEstimable)
        {
            return new ValueProvenance(model, target, double.NaN, double.NaN, [], [], [], "the measurements do not determine this combination (the species involved are known only relative to others)");
        }

        double variance = provenance.Estimate.Variance;
        var contributions = provenance.Contributions
            .Where(entry => Math.Abs(entry.Sensitivity) > sensitivityTolerance)
            .Select(entry => new MeasurementContribution(
                entry.ObservationIndex,
                model.Measurements[entry.ObservationIndex],
                entry.Sensitivity,
                report.Solution.System.Observations[entry.ObservationIndex].Uncertainty,
                entry.VarianceContribution,
                entry.Share))
            .ToArray();
        var sources = contributions
            .GroupBy(item => item.Measurement.Source, StringComparer.Ordinal)
            .Select(group =>
            {
                double sum = group.Sum(item => item.VarianceContribution);
                return new SourceContribution(group.Key, group.Count(), sum, variance > 0.0 ? sum / variance : 0.0);
            })
            .OrderByDescending(source => source.VarianceContribution)
            .ThenBy(source => source.Source, StringComparer.Ordinal)
            .ToArray();
        return new ValueProvenance(model, target, provenance.Estimate.Value, variance, contributions, sources, [], null);
    }

    /// <summary>Traces <paramref name="target"/> in one family of a network (solved after the suspect procedure).</summary>
    /// <returns>The provenance, or null when the network has no data of that family.</returns>
    public static ValueProvenance? Trace(NetworkSolutions solutions, PropertyFamily family, ChemicalEquation target)
    {
        ArgumentNullException.ThrowIfNull(solutions);
        SolveReport? report = solutions.Report(family);
        return report is null ? null : Trace(report, target);
    }
}
