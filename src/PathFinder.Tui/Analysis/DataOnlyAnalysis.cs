using Fractions;
using PathFinder.Chemistry;
using PathFinder.Diagnostics;
using PathFinder.Quantities;

namespace PathFinder.Tui.Analysis;

/// <summary>An analysis from the data alone: counts, per-source diagnostics and direct (one-step) routes; no solver.</summary>
/// <remarks>
/// It invents no number: residuals, estimates and leave-one-out predictions are null (shown "—"). The only values
/// it reports are single measurements scaled by an exact factor when their equation is a multiple of the target.
/// Stands in until the solver-backed analysis is plugged in through <see cref="NetworkAnalyzer"/>.
/// </remarks>
public sealed class DataOnlyAnalysis : INetworkAnalysis
{
    private DataOnlyAnalysis(ReactionNetwork network, IReadOnlyList<Diagnostic> dataDiagnostics)
    {
        Network = network;
        Measurements = network.Measurements.ToDictionary(
            measurement => measurement.Id,
            measurement => new MeasurementAssessment(measurement.Id, MeasurementStatus.NotAnalysed),
            StringComparer.Ordinal);
        Species = network.Species
            .Select(species => new SpeciesEstimate(species, ThermoProperty.Enthalpy, null, null, network.Measurements.Count(m => !m.Equation.CoefficientOf(species).IsZero)))
            .ToArray();
        Sources = network.Sources
            .Select(source =>
            {
                Measurement[] rows = network.Measurements.Where(m => m.Source == source).ToArray();
                HashSet<(string, int)> lines = rows.Select(m => (m.Location.File, m.Location.Line)).ToHashSet();
                Diagnostic[] diagnostics = dataDiagnostics.Where(d => lines.Contains((d.Location.File, d.Location.Line))).ToArray();
                return new SourceReport(source, rows.Length, null, null, diagnostics);
            })
            .ToArray();
    }

    /// <inheritdoc/>
    public ReactionNetwork Network { get; }

    /// <inheritdoc/>
    public string Description => "data only, no solver connected";

    /// <inheritdoc/>
    public IReadOnlyDictionary<string, MeasurementAssessment> Measurements { get; }

    /// <inheritdoc/>
    public IReadOnlyList<CycleReport> Cycles { get; } = [];

    /// <inheritdoc/>
    public IReadOnlyList<SuspectReport> Suspects { get; } = [];

    /// <inheritdoc/>
    public IReadOnlyList<SpeciesEstimate> Species { get; }

    /// <inheritdoc/>
    public IReadOnlyList<SourceReport> Sources { get; }

    /// <inheritdoc/>
    public bool CanExportDiagram => false;

    /// <summary>The analyzer delegate for this analysis.</summary>
    public static NetworkAnalyzer Analyzer { get; } = (network, diagnostics, _) => Create(network, diagnostics);

    /// <summary>Builds the analysis of <paramref name="network"/>.</summary>
    public static DataOnlyAnalysis Create(ReactionNetwork network, IReadOnlyList<Diagnostic> dataDiagnostics)
    {
        ArgumentNullException.ThrowIfNull(network);
        ArgumentNullException.ThrowIfNull(dataDiagnostics);
        return new DataOnlyAnalysis(network, dataDiagnostics);
    }

    /// <inheritdoc/>
    public TargetReport FindRoutes(ChemicalEquation target, ThermoProperty property, int maxRoutes, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(target);
        var routes = new List<RouteReport>();
        foreach (Measurement measurement in Network.Measurements.Where(m => m.Property == property))
        {
            cancellationToken.ThrowIfCancellationRequested();
            Fraction? factor = MultipleOf(target, measurement.Equation);
            if (factor is { } f)
            {
                double scale = f.ToDouble();
                var step = new RouteStep(measurement.Id, RationalText.Format(f), measurement.Equation.Scale(f).ToString(), scale * measurement.Value);
                routes.Add(new RouteReport([step], scale * measurement.Value, Math.Abs(scale) * measurement.Uncertainty));
            }
        }

        RouteReport[] best = routes.OrderBy(route => route.Uncertainty).Take(maxRoutes).ToArray();
        string message = best.Length == 0
            ? "no direct measurement of this reaction; multi-step route search is not connected yet"
            : "direct measurements only; multi-step route search is not connected yet";
        return new TargetReport(target, property, best, null, null, message);
    }

    /// <inheritdoc/>
    public string ExportDiagram(string path, string? focusMeasurementId) => "diagram export is not available in the data-only analysis";

    /// <summary>The factor f with target = f × equation, or null when the equations are not proportional.</summary>
    private static Fraction? MultipleOf(ChemicalEquation target, ChemicalEquation equation)
    {
        if (target.Terms.Count != equation.Terms.Count || target.Terms.Count == 0)
        {
            return null;
        }

        EquationTerm first = target.Terms[0];
        Fraction other = equation.CoefficientOf(first.Species);
        if (other.IsZero)
        {
            return null;
        }

        Fraction factor = (first.Coefficient / other).Reduce();
        return target.Terms.All(term => term.Coefficient == equation.CoefficientOf(term.Species) * factor) ? factor : null;
    }
}
