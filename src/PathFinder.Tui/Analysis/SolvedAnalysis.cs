using System.Globalization;
using System.Runtime.CompilerServices;
using PathFinder.Analysis;
using PathFinder.Chemistry;
using PathFinder.Data;
using PathFinder.Diagnostics;
using PathFinder.Diagrams;
using PathFinder.Figures;
using PathFinder.Graph;
using PathFinder.Quantities;
using PathFinder.Routes;

namespace PathFinder.Tui.Analysis;

/// <summary>The explorer's analysis: the consistency check, the network solution and route search of the core library.</summary>
/// <remarks>Built once per curation state, off the UI thread; afterwards only read (route searches build nothing shared).</remarks>
public sealed class SolvedAnalysis : INetworkAnalysis
{
    private readonly NetworkReadResult _data;
    private readonly ConsistencyReport _report;
    private readonly Dictionary<CycleReport, CycleCheck> _cycleSources = new(ReferenceEqualityComparer.Instance);
    private readonly ConditionalWeakTable<RouteReport, RouteSource> _routeSources = [];

    private SolvedAnalysis(ReactionNetwork network, NetworkReadResult data, ConsistencyReport report)
    {
        Network = network;
        _data = data;
        _report = report;
        var measurements = new Dictionary<string, MeasurementAssessment>(StringComparer.Ordinal);
        var species = new List<SpeciesEstimate>();
        var suspects = new List<SuspectReport>();
        var cycles = new List<CycleReport>();
        if (report.Analysis is { } analysis)
        {
            foreach (MeasurementCheck check in analysis.Measurements)
            {
                MeasurementStatus status = check.IsSuspect ? MeasurementStatus.Suspect
                    : check.IsCheckable ? MeasurementStatus.Consistent
                    : MeasurementStatus.Unchecked;
                // The explorer shows how far each value is from what the rest predicts (after down-weighting suspects),
                // which is what its status rests on; the as-given normalized residuals smear one gross error over its cycles.
                measurements[check.Measurement.Id] = new MeasurementAssessment(check.Measurement.Id, status, check.PredictionZ, check.Predicted, check.PredictedUncertainty);
            }

            foreach (SourceCheck source in analysis.OffsetSources)
            {
                foreach (SourceOffset offset in source.Offsets.Where(offset => offset.IsInferred))
                {
                    string reason = string.Create(CultureInfo.InvariantCulture, $"source {source.Source} reads {offset.Value:+0.00;-0.00} ± {offset.Uncertainty:0.00} {offset.Unit} off on all {offset.Rows.Count} rows: a common offset explains the data at least as well (χ² falls by {offset.ChiSquaredDrop:0.0}){(offset.DisplacedSuspect is { } displaced ? $" as blaming {displaced} ({offset.DisplacedChiSquared:0.0})" : "")}");
                    suspects.Add(new SuspectReport(offset.Rows[0], offset.Z, null, null, reason));
                }
            }

            foreach (PathFinder.Analysis.SuspectReport suspect in analysis.Suspects)
            {
                // The likely slip leads: it is what a curator acts on; the statistics follow.
                string statistics = string.Create(CultureInfo.InvariantCulture, $"z = {suspect.NormalizedResidual:+0.0;-0.0} when first picked; its uncertainty had to grow ×{suspect.Inflation:0.#} to agree with the rest");
                string reason = suspect.LikelyCause is { } cause ? $"{cause.Detail}; {statistics}" : statistics;

                suspects.Add(new SuspectReport(suspect.Measurement.Id, suspect.NormalizedResidual, suspect.Predicted, suspect.PredictedUncertainty, reason));
            }

            foreach (CycleCheck cycle in analysis.Cycles)
            {
                var shown = new CycleReport(
                    cycle.Members.Select(member => member.Measurement.Id).ToArray(),
                    cycle.Members.Select(member => RationalText.Format(member.Factor)).ToArray(),
                    cycle.Residual,
                    cycle.Uncertainty,
                    double.IsFinite(cycle.Z) ? cycle.Z : null,
                    cycle.Flagged);
                cycles.Add(shown);
                _cycleSources[shown] = cycle;
            }

            var joint = new JointSolution(analysis.Model, analysis.Adjusted, true, analysis.Adjustments, []);
            foreach (PropertyFamily family in new[] { PropertyFamily.Enthalpy, PropertyFamily.Entropy, PropertyFamily.GibbsEnergy })
            {
                if (NetworkSolver.Report(joint, family) is not { } solved)
                {
                    continue;
                }

                ThermoProperty property = family == PropertyFamily.Entropy ? ThermoProperty.AbsoluteEntropy : family.ResultProperty();
                species.AddRange(solved.Species.Select(estimate => new SpeciesEstimate(
                    estimate.Species,
                    property,
                    estimate.IsDetermined ? estimate.Value : null,
                    estimate.IsDetermined ? estimate.Uncertainty : null,
                    estimate.Measurements)));
            }
        }

        Measurements = measurements;
        Species = species;
        Suspects = suspects.OrderByDescending(suspect => Math.Abs(suspect.NormalizedResidual ?? 0)).ToArray();
        Cycles = cycles.OrderByDescending(cycle => cycle.Flagged).ThenByDescending(cycle => Math.Abs(cycle.Z ?? 0)).ToArray();
        Sources = network.Sources.Select(source => SourceOf(network, data.Diagnostics, report, source)).ToArray();
        int flagged = cycles.Count(cycle => cycle.Flagged);
        Description = string.Create(CultureInfo.InvariantCulture, $"{network.Measurements.Count} measurements solved; {suspects.Count} suspect(s); {flagged} cycle(s) fail to close");
    }

    /// <inheritdoc/>
    public ReactionNetwork Network { get; }

    /// <inheritdoc/>
    public string Description { get; }

    /// <inheritdoc/>
    public IReadOnlyDictionary<string, MeasurementAssessment> Measurements { get; }

    /// <inheritdoc/>
    public IReadOnlyList<CycleReport> Cycles { get; }

    /// <inheritdoc/>
    public IReadOnlyList<SuspectReport> Suspects { get; }

    /// <inheritdoc/>
    public IReadOnlyList<SpeciesEstimate> Species { get; }

    /// <inheritdoc/>
    public IReadOnlyList<SourceReport> Sources { get; }

    /// <inheritdoc/>
    public bool CanExportDiagram => true;

    /// <summary>The analyzer delegate that builds this analysis.</summary>
    public static NetworkAnalyzer Analyzer { get; } = Create;

    /// <summary>Analyses <paramref name="network"/> (already curated).</summary>
    public static SolvedAnalysis Create(ReactionNetwork network, NetworkReadResult data, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(network);
        ArgumentNullException.ThrowIfNull(data);
        ConsistencyReport report = ConsistencyCheck.Run(network, data.HeatCapacities, new ConsistencyOptions { CancellationToken = cancellationToken }, data.SourceSystematics);
        cancellationToken.ThrowIfCancellationRequested();
        return new SolvedAnalysis(network, data, report);
    }

    /// <inheritdoc/>
    public TargetReport FindRoutes(ChemicalEquation target, ThermoProperty property, int maxRoutes, CancellationToken cancellationToken)
    {
        ArgumentNullException.ThrowIfNull(target);
        PropertyFamily family = PropertyFamilies.FamilyOf(property);
        PropertyModel model = PropertyModel.Build(Network, family, _data.HeatCapacities);
        if (model.Measurements.Count == 0)
        {
            return new TargetReport(target, property, [], null, null, $"the network has no {family.ResultProperty().Code()} data");
        }

        Solving.DerivedEstimate? estimate = null;
        if (_report.Analysis is { } analysis)
        {
            estimate = analysis.Model.Quantity(family, target).Evaluate(analysis.Adjusted);
        }

        PathFinder.Analysis.RouteReport report = RouteAnalysis.Find(
            model,
            target,
            new RouteSearchOptions { MaxRoutes = maxRoutes, TimeBudget = TimeSpan.FromSeconds(10), CancellationToken = cancellationToken },
            estimate);
        var routes = report.Routes.Select(route =>
        {
            var shown = new RouteReport(
                route.Steps.Select(step => new RouteStep(step.Measurement.Id, RationalText.Format(step.Factor), step.Equation.ToString(), step.Value)).ToArray(),
                route.Value,
                route.Uncertainty,
                route.Cancelled.Select(species => species.Name).ToArray(),
                route.Sum.ToString());
            // Kept so a diagram of exactly this route can be drawn later (the table lives as long as the route shown).
            _routeSources.AddOrUpdate(shown, new RouteSource(report, route));
            return shown;
        }).ToArray();
        string message = report.UnreachableSpecies.Count > 0
            ? $"no {family.ResultProperty().Code()} measurement contains {string.Join(", ", report.UnreachableSpecies.Select(species => species.Name))}"
            : string.Create(CultureInfo.InvariantCulture, $"{report.RoutesFound} route(s); {(report.Complete ? $"complete up to {report.MaxSteps} steps" : "incomplete: " + report.IncompleteReason)}; {report.IndependentRoutes} independent");
        return new TargetReport(target, property, routes, report.NetworkEstimate?.Value, report.NetworkEstimate?.StandardUncertainty, message);
    }

    /// <inheritdoc/>
    public string ExportDiagram(string path, DiagramFocus focus)
    {
        ArgumentNullException.ThrowIfNull(path);
        ArgumentNullException.ThrowIfNull(focus);
        var marks = new FigureMarks(
            Suspects.Select(suspect => suspect.MeasurementId).ToHashSet(StringComparer.Ordinal),
            new HashSet<string>(StringComparer.Ordinal));
        if (focus.Route is not null)
        {
            if (!_routeSources.TryGetValue(focus.Route, out RouteSource? source))
            {
                return "that route is from an older analysis: search again, then export";
            }

            string unit = source.Report.Family.Unit().Symbol;
            return Write(
                path,
                FigureBuilder.RouteNetwork(source.Report, source.Route, unit, marks),
                LevelDiagramRenderer.RenderRoute(FigureBuilder.RouteLevels(source.Report, source.Route)).Diagram,
                "levels");
        }

        if (focus.Cycle is not null)
        {
            if (!_cycleSources.TryGetValue(focus.Cycle, out CycleCheck? cycle))
            {
                return "that cycle is from an older analysis";
            }

            return Write(
                path,
                FigureBuilder.CycleNetwork(cycle, marks),
                LevelDiagramRenderer.RenderCycle(FigureBuilder.CycleLevels(cycle)).Diagram,
                "closure");
        }

        NetworkGraph graph = NetworkGraph.Build(Network);
        Species[] centres;
        PropertyFamily family = PropertyFamily.Enthalpy;
        if (focus.MeasurementId is not null && Network.TryGetMeasurement(focus.MeasurementId, out Measurement measurement))
        {
            centres = measurement.Equation.Terms.Select(term => term.Species).Where(species => !ReferenceStates.HasZeroFormationProperties(species)).ToArray();
            family = PropertyFamilies.FamilyOf(measurement.Property);
        }
        else
        {
            centres = Network.Species.Where(species => !ReferenceStates.HasZeroFormationProperties(species)).ToArray();
        }

        return Write(path, FigureBuilder.Neighbourhood(graph, centres, 1, family, marks), null, "");
    }

    /// <summary>Renders <paramref name="network"/> to <paramref name="path"/> and <paramref name="levels"/> beside it as <c>name-suffix.svg</c>.</summary>
    private static string Write(string path, NetworkDiagram network, SvgDiagram? levels, string suffix)
    {
        var written = new List<string>();
        string? refusal = null;
        NetworkDiagramResult result = NetworkDiagramRenderer.Render(network);
        if (result.IsRendered)
        {
            result.Diagram!.Save(path);
            written.Add($"{path} (network)");
        }
        else
        {
            refusal = result.RefusalMessage ?? "the network diagram could not be drawn";
        }

        if (levels is not null)
        {
            string levelsPath = Path.Combine(Path.GetDirectoryName(path) ?? "", $"{Path.GetFileNameWithoutExtension(path)}-{suffix}.svg");
            levels.Save(levelsPath);
            written.Add($"{levelsPath} ({suffix})");
        }

        string wrote = written.Count > 0 ? "wrote " + string.Join(" and ", written) : "";
        return refusal is null ? wrote : written.Count > 0 ? $"{wrote}; network diagram refused: {refusal}" : refusal;
    }

    /// <summary>The core report and route behind a route shown.</summary>
    private sealed record RouteSource(PathFinder.Analysis.RouteReport Report, ExplainedRoute Route);

    private static SourceReport SourceOf(ReactionNetwork network, IReadOnlyList<Diagnostic> diagnostics, ConsistencyReport report, string source)
    {
        Measurement[] rows = network.Measurements.Where(measurement => measurement.Source == source).ToArray();
        var lines = rows.Select(measurement => (measurement.Location.File, measurement.Location.Line)).ToHashSet();
        Diagnostic[] own = diagnostics.Where(diagnostic => lines.Contains((diagnostic.Location.File, diagnostic.Location.Line))).ToArray();
        MeasurementCheck[] checks = (report.Analysis?.Measurements ?? []).Where(check => check.Measurement.Source == source).ToArray();
        double[] z = checks.Where(check => check.NormalizedResidual.HasValue).Select(check => check.NormalizedResidual!.Value).ToArray();
        double? rms = z.Length > 0 ? Math.Sqrt(z.Average(value => value * value)) : null;
        return new SourceReport(source, rows.Length, checks.Count(check => check.IsSuspect), rms, own);
    }
}
