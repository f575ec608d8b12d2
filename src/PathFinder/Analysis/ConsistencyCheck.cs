using PathFinder.Chemistry;
using PathFinder.Routes;
using PathFinder.Solving;
using PathFinder.Thermodynamics;

namespace PathFinder.Analysis;

/// <summary>Tests every cycle that should close, ranks the measurements and sources that break closure, and solves the network.</summary>
/// <remarks>
/// <para>One joint analysis of every datum (<see cref="ThermoModel"/>): the least-squares solution of the data as given
/// (normalized residuals for every measurement), the minimal cycles up to a size bound with their closure z (cycles may
/// mix ΔH, S°, ΔS, ΔG and K data, which G = H − TS ties), the worst-offender suspect procedure (enlarging the worst
/// measurement's uncertainty until the rest agree) with leave-one-out predictions from the adjusted network, the likely
/// slip behind each suspect, and per-source statistics.</para>
/// <para>Sources: a declared systematic (<c>sources.csv</c>) is an offset unknown with its prior, reported fitted. For the
/// other sources, the fall in χ² from fitting one common offset to a source's rows is Δχ² = (Σwᵢrᵢ)²/(Σwᵢ − hᵀCh),
/// h = Σwᵢaᵢ over its rows (a rank-one test on the solution as given). When the best source's Δχ² passes the
/// multiple-testing critical value and beats every single measurement's z², the offset is fitted as an unknown
/// before the suspect procedure runs, so a source that reads high on every row is named instead of a key value all its
/// reactions share. Up to <see cref="MaxInferredOffsets"/> sources are taken this way, one at a time.</para>
/// </remarks>
public static class ConsistencyCheck
{
    /// <summary>The most source offsets the check infers (one at a time, the best first).</summary>
    public const int MaxInferredOffsets = 3;

    /// <summary>Fewest rows of a source for its common offset to be tested.</summary>
    public const int MinimumRowsForOffsetTest = 3;

    /// <summary>Analyses every datum of <paramref name="network"/> jointly.</summary>
    public static ConsistencyReport Run(ReactionNetwork network, IReadOnlyDictionary<Species, IHeatCapacity>? heatCapacities = null, ConsistencyOptions? options = null, IReadOnlyList<SourceSystematic>? systematics = null)
    {
        ArgumentNullException.ThrowIfNull(network);
        options ??= new ConsistencyOptions();
        ThermoModel model = ThermoModel.Build(network, heatCapacities, systematics);
        return new ConsistencyReport(model.Measurements.Count == 0 ? null : Analyse(model, options), options);
    }

    /// <summary>Analyses a joint model.</summary>
    public static ModelConsistency Analyse(ThermoModel model, ConsistencyOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(model);
        options ??= new ConsistencyOptions();
        // The solve first, with every core for its dense algebra (a search beside it would slow its threaded
        // factorization by more than it gains); then the cycle search, which needs only the measurements, runs
        // on another core beside the suspect procedure.
        LeastSquaresSolution asGiven = WeightedLeastSquares.Solve(model.ToObservationSystem());
        ThermoModel searched = model;
        Task<CycleSearchResult> cycleSearch = Task.Run(() => FindCycles.In(searched.ToRouteNetwork(), new CycleSearchOptions
        {
            MaxSize = options.MaxCycleSize,
            MaxCycles = options.MaxCycles,
            TimeBudget = options.CycleTimeBudget,
            WorkBudget = options.CycleWorkBudget,
            CancellationToken = options.CancellationToken,
        }));

        var inferred = new List<(string Source, bool Energy, double Drop, double BestSingle)>();
        if (options.RunSuspectProcedure)
        {
            while (inferred.Count < MaxInferredOffsets && BestOffsetTest(model, asGiven) is { } best)
            {
                model = model.WithInferredOffset(best.Source, best.Energy);
                asGiven = WeightedLeastSquares.Solve(model.ToObservationSystem());
                inferred.Add(best);
            }
        }

        // The per-measurement diagnostics of the data as given are needed only after the procedure: that core works
        // them out once the cycle search is done (the procedure works on a copy of the factorization).
        LeastSquaresSolution given = asGiven;
        Task givenDiagnostics = cycleSearch.ContinueWith(_ => given.Observations.Count, TaskScheduler.Default);

        // Start from the solution just computed: the procedure copies its factorization instead of redoing it.
        OutlierResult? outliers = options.RunSuspectProcedure
            ? OutlierProcedure.Run(asGiven, new OutlierOptions { Threshold = options.Threshold, InflationFactor = options.InflationFactor })
            : null;
        LeastSquaresSolution adjusted = outliers?.Solution ?? asGiven;
        IReadOnlyList<OutlierSuspect> outlierSuspects = outliers?.Suspects.Where(suspect => !model.IsPrior(suspect.ObservationIndex)).ToArray() ?? [];
        IReadOnlyList<UncertaintyAdjustment> adjustments = outliers?.Adjustments ?? [];

        givenDiagnostics.GetAwaiter().GetResult();
        var suspectIndices = new HashSet<int>(outlierSuspects.Select(suspect => suspect.ObservationIndex));
        var checks = new MeasurementCheck[model.Measurements.Count];
        for (int i = 0; i < checks.Length; i++)
        {
            ObservationDiagnostics givenRow = asGiven.Observations[i];
            ObservationDiagnostics after = adjusted.Observations[i];
            checks[i] = new MeasurementCheck(
                model.Measurements[i],
                givenRow.Fitted,
                givenRow.Residual,
                givenRow.NormalizedResidual,
                after.LeaveOneOutPrediction,
                after.LeaveOneOutUncertainty,
                suspectIndices.Contains(i),
                adjusted.System.Observations[i].Uncertainty);
        }

        SuspectReport[] suspects = outlierSuspects
            .Select(suspect =>
            {
                MeasurementCheck check = checks[suspect.ObservationIndex];
                return new SuspectReport(
                    model.Measurements[suspect.ObservationIndex],
                    suspect.FirstNormalizedResidual,
                    check.Predicted,
                    check.PredictedUncertainty,
                    suspect.TotalInflation,
                    SuspectCauses.Diagnose(model, adjusted, suspect.ObservationIndex, check.Predicted, check.PredictedUncertainty));
            })
            .ToArray();

        CycleSearchResult cycles = cycleSearch.GetAwaiter().GetResult();
        CycleCheck[] cycleChecks = cycles.Cycles
            .Select((cycle, position) => new CycleCheck(
                position + 1,
                cycle.Measurements.Select((index, k) => (model.Measurements[index], cycle.Factors[k])).ToArray(),
                cycle.Residual,
                cycle.Uncertainty,
                cycle.Z,
                Math.Abs(cycle.Z) > options.Threshold))
            .ToArray();

        return new ModelConsistency(
            model,
            checks,
            cycleChecks,
            cycles.CyclesFound,
            cycles.Cut,
            cycles.IndependentCycleCount,
            suspects,
            adjustments,
            Sources(model, checks, asGiven, adjusted, inferred, options.Threshold),
            asGiven,
            adjusted);
    }

    /// <summary>The source whose common offset (not yet in the model) lowers χ² most, when that beats the critical value and every single measurement; otherwise null.</summary>
    private static (string Source, bool Energy, double Drop, double BestSingle)? BestOffsetTest(ThermoModel model, LeastSquaresSolution solution)
    {
        var tests = new List<(string Source, bool Energy, double Drop)>();
        foreach (var group in Enumerable.Range(0, model.Measurements.Count)
            .Where(i => model.OffsetOf(i) < 0)
            .GroupBy(i => (model.Measurements[i].Source, model.Measurements[i].IsEnergy)))
        {
            int[] rows = group.ToArray();
            if (rows.Length < MinimumRowsForOffsetTest)
            {
                continue;
            }

            // h = Σ wᵢaᵢ and Σ wᵢrᵢ over the source's rows; Δχ² = (Σwᵢrᵢ)² / (Σwᵢ − hᵀCh).
            var h = new Dictionary<int, double>();
            double weights = 0.0;
            double weightedResiduals = 0.0;
            foreach (int i in rows)
            {
                Observation observation = solution.System.Observations[i];
                double w = observation.Weight;
                weights += w;
                weightedResiduals += w * (observation.Value - solution.FittedValue(i));
                for (int k = 0; k < observation.Row.Count; k++)
                {
                    h[observation.Row.Indices[k]] = h.GetValueOrDefault(observation.Row.Indices[k]) + (w * observation.Row.Coefficients[k]);
                }
            }

            DerivedEstimate spread = solution.Estimate(SparseRow.Of(h.Select(entry => (entry.Key, entry.Value)).ToArray()));
            double denominator = weights - (spread.IsEstimable ? spread.Variance : weights);
            if (!(denominator > 1e-9 * weights))
            {
                continue; // the source's rows alone fix what they touch: an offset is not identifiable
            }

            tests.Add((group.Key.Source, group.Key.IsEnergy, weightedResiduals * weightedResiduals / denominator));
        }

        if (tests.Count == 0)
        {
            return null;
        }

        (string source, bool energy, double drop) = tests.MaxBy(test => test.Drop);
        double critical = OutlierProcedure.SidakCriticalValue(tests.Count, new OutlierOptions().SignificanceLevel);
        double bestSingle = solution.Observations.Take(model.Measurements.Count)
            .Where(diagnostics => diagnostics.NormalizedResidual.HasValue)
            .Select(diagnostics => diagnostics.NormalizedResidual!.Value * diagnostics.NormalizedResidual.Value)
            .DefaultIfEmpty(0.0)
            .Max();
        return drop > critical * critical && drop > bestSingle ? (source, energy, drop, bestSingle) : null;
    }

    private static SourceCheck[] Sources(ThermoModel model, MeasurementCheck[] checks, LeastSquaresSolution asGiven, LeastSquaresSolution adjusted, List<(string Source, bool Energy, double Drop, double BestSingle)> inferred, double threshold) =>
        checks
            .GroupBy(check => check.Measurement.Source, StringComparer.Ordinal)
            .Select(group =>
            {
                // Each measurement's distance from what the rest of the (adjusted) network predicts is about
                // N(0, 1) for sound data, so the mean over n sound measurements is about N(0, 1/n). Suspects are
                // counted apart and left out of the mean, so one gross error does not pass for a source-wide offset.
                double[] z = group.Where(check => !check.IsSuspect && check.PredictionZ.HasValue).Select(check => check.PredictionZ!.Value).ToArray();
                double mean = z.Length > 0 ? z.Average() : 0.0;
                double spread = z.Length > 1 ? Math.Sqrt(z.Sum(value => (value - mean) * (value - mean)) / (z.Length - 1)) : double.NaN;
                double offsetZ = mean * Math.Sqrt(z.Length);
                int checkable = group.Count(check => check.IsCheckable);
                var offsets = new List<SourceOffset>();
                foreach (bool energy in new[] { true, false })
                {
                    int unknown = model.IndexOfOffset(group.Key, energy);
                    if (unknown < 0 || !adjusted.IsDetermined(unknown))
                    {
                        continue;
                    }

                    string[] rows = group.Where(check => check.Measurement.IsEnergy == energy).Select(check => check.Measurement.Id).ToArray();
                    double value = adjusted.Values[unknown];
                    double uncertainty = adjusted.StandardUncertainties[unknown];
                    SourceSystematic? declared = model.Unknowns[unknown].Systematic;
                    if (declared is not null)
                    {
                        int prior = model.Measurements.Count + model.Systematics.ToList().IndexOf(declared);
                        double? priorZ = asGiven.Observations[prior].NormalizedResidual;
                        offsets.Add(new SourceOffset(energy, value, uncertainty, priorZ is { } pz ? -pz : 0.0, declared.Systematic, 0.0, 0.0, rows));
                    }
                    else
                    {
                        (string _, bool _, double drop, double bestSingle) = inferred.First(item => item.Source == group.Key && item.Energy == energy);
                        offsets.Add(new SourceOffset(energy, value, uncertainty, value / uncertainty, null, drop, bestSingle, rows));
                    }
                }

                bool flagged = (z.Length >= 2 && Math.Abs(offsetZ) > threshold) || offsets.Any(offset => offset.IsInferred);
                return new SourceCheck(group.Key, group.Count(), checkable, mean, spread, offsetZ, group.Count(check => check.IsSuspect), flagged, offsets);
            })
            .OrderByDescending(source => source.HasInferredOffset)
            .ThenByDescending(source => Math.Abs(source.OffsetZ))
            .ToArray();
}
