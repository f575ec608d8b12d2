using Fractions;
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

    /// <summary>How many of the most serious suspects are tried against a source offset.</summary>
    public const int MaxSuspectsRestored = 20;

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

        // The per-measurement diagnostics of the data as given are needed only after the procedure: that core works
        // them out once the cycle search is done (the procedure works on a copy of the factorization).
        LeastSquaresSolution given = asGiven;
        Task givenDiagnostics = cycleSearch.ContinueWith(_ => given.Observations.Count, TaskScheduler.Default);

        // Start from the solution just computed: the procedure copies its factorization instead of redoing it. When a
        // source's common offset explains a suspect better than the suspect's own error, the offset becomes an unknown
        // and the procedure runs again on the model with it.
        var outlierOptions = new OutlierOptions { Threshold = options.Threshold, InflationFactor = options.InflationFactor };
        OutlierResult? outliers = options.RunSuspectProcedure ? OutlierProcedure.Run(asGiven, outlierOptions) : null;
        var inferred = new List<InferredOffset>();
        while (outliers is not null && inferred.Count < MaxInferredOffsets && BestInferredOffset(model, outliers) is { } offset)
        {
            inferred.Add(offset);
            model = model.WithInferredOffset(offset.Source, offset.Energy);
            asGiven = WeightedLeastSquares.Solve(model.ToObservationSystem());
            outliers = OutlierProcedure.Run(asGiven, outlierOptions);
            LeastSquaresSolution again = asGiven;
            givenDiagnostics = givenDiagnostics.ContinueWith(_ => again.Observations.Count, TaskScheduler.Default);
        }

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
            .Select((cycle, position) => Check(model, cycle, position + 1, options.Threshold))
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
            Sources(model, checks, adjusted, inferred, options.Threshold),
            asGiven,
            adjusted);
    }

    /// <summary>A found cycle as reported; a cycle that mixes properties is scaled so its smallest energy factor is ±1.</summary>
    /// <remarks>
    /// The search returns the smallest integer factors, which for ΔG − ΔH + (T/1000)·ΔS closures carry the temperature's
    /// digits (ΔG×40000 …); scaled, the energy rows read 1 and −1, entropy rows T/1000-like factors, and the residual is
    /// the closure in kJ/mol per mole of reaction. z does not depend on the scale.
    /// </remarks>
    private static CycleCheck Check(ThermoModel model, Cycle cycle, int number, double threshold)
    {
        var members = cycle.Measurements.Select((index, k) => (Measurement: model.Measurements[index], Factor: cycle.Factors[k])).ToArray();
        var check = new CycleCheck(number, members, cycle.Residual, cycle.Uncertainty, cycle.Z, Math.Abs(cycle.Z) > threshold);
        if (!check.IsMixed)
        {
            return check;
        }

        Fraction scale = members.Where(member => member.Measurement.IsEnergy).Select(member => member.Factor.Abs()).DefaultIfEmpty(Fraction.One).Min();
        double size = scale.ToDouble();
        return check with
        {
            Members = members.Select(member => (member.Measurement, member.Factor / scale)).ToArray(),
            Residual = cycle.Residual / size,
            Uncertainty = cycle.Uncertainty / size,
        };
    }

    /// <summary>The source offset that best explains the procedure's findings, or null when none does.</summary>
    /// <remarks>
    /// <para>Tested on the solution after the procedure (gross errors down-weighted, so one of them does not pass for an
    /// offset elsewhere). With W the weights, C the covariance and r the residuals there, fitting one common offset to a
    /// source's rows lowers χ² by t²/D, t = Σwᵢrᵢ and D = Σwᵢ − hᵀCh, h = Σwᵢaᵢ over the rows.</para>
    /// <para>A suspect k outside the source is then given back its own uncertainty (weight change Δw): by rank-one
    /// updates, with c = C·aₖ and β = Δw/(1 + Δw·aₖᵀc), χ² rises by β·rₖ² (about zₖ², the evidence against k), while
    /// the source's offset now lowers it by t′²/D′ with t′ = t − β·rₖ·hᵀc and D′ = D + β·(hᵀc)². When that fall passes
    /// the Šidák critical value over the sources tested and is at least the rise, the offset explains the data at least
    /// as well as k's error does: the source is named, not k (a key value that every reaction of a source shares is the
    /// usual case). A significant offset left after the procedure is taken as it is.</para>
    /// <para>Only the <see cref="MaxSuspectsRestored"/> most serious suspects are tried (each costs one product with C).</para>
    /// </remarks>
    private static InferredOffset? BestInferredOffset(ThermoModel model, OutlierResult outliers)
    {
        LeastSquaresSolution solution = outliers.Solution;
        var tests = new List<(string Source, bool Energy, HashSet<int> Rows, SparseRow H, double T, double D)>();
        foreach (var group in Enumerable.Range(0, model.Measurements.Count)
            .Where(i => model.OffsetOf(i) < 0)
            .GroupBy(i => (model.Measurements[i].Source, model.Measurements[i].IsEnergy)))
        {
            int[] rows = group.ToArray();
            if (rows.Length < MinimumRowsForOffsetTest)
            {
                continue;
            }

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

            SparseRow hRow = SparseRow.Of(h.Select(entry => (entry.Key, entry.Value)).ToArray());
            double denominator = weights - hRow.Dot(solution.CovarianceTimes(hRow));
            if (denominator > 1e-9 * weights)
            {
                tests.Add((group.Key.Source, group.Key.IsEnergy, rows.ToHashSet(), hRow, weightedResiduals, denominator));
            }
        }

        if (tests.Count == 0)
        {
            return null;
        }

        double critical = OutlierProcedure.SidakCriticalValue(tests.Count, new OutlierOptions().SignificanceLevel);
        double threshold = critical * critical;
        InferredOffset? best = null;
        void Consider(InferredOffset candidate)
        {
            if (candidate.Drop > threshold && candidate.Drop >= candidate.Displaced && (best is null || candidate.Drop - candidate.Displaced > best.Drop - best.Displaced))
            {
                best = candidate;
            }
        }

        foreach (var test in tests)
        {
            Consider(new InferredOffset(test.Source, test.Energy, test.T * test.T / test.D, null, 0.0));
        }

        foreach (OutlierSuspect suspect in outliers.Suspects.Where(item => !model.IsPrior(item.ObservationIndex)).Take(MaxSuspectsRestored))
        {
            int k = suspect.ObservationIndex;
            Observation observation = solution.System.Observations[k];
            double deltaWeight = (1.0 / (suspect.OriginalUncertainty * suspect.OriginalUncertainty)) - observation.Weight;
            double[] c = solution.CovarianceTimes(observation.Row);
            double beta = deltaWeight / (1.0 + (deltaWeight * observation.Row.Dot(c)));
            double residual = observation.Value - solution.FittedValue(k);
            double rise = beta * residual * residual;
            foreach (var test in tests.Where(test => !test.Rows.Contains(k) && test.Energy == model.Measurements[k].IsEnergy))
            {
                double hc = test.H.Dot(c);
                double t = test.T - (beta * residual * hc);
                double d = test.D + (beta * hc * hc);
                Consider(new InferredOffset(test.Source, test.Energy, t * t / d, model.Measurements[k].Id, rise));
            }
        }

        return best;
    }

    /// <summary>A source offset the check takes on: the fall in χ² it gives and the suspect it displaces (with the χ² that suspect's error accounted for).</summary>
    private sealed record InferredOffset(string Source, bool Energy, double Drop, string? DisplacedId, double Displaced);

    private static SourceCheck[] Sources(ThermoModel model, MeasurementCheck[] checks, LeastSquaresSolution adjusted, List<InferredOffset> inferred, double threshold) =>
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
                        double? priorZ = adjusted.Observations[prior].NormalizedResidual;
                        offsets.Add(new SourceOffset(energy, value, uncertainty, priorZ is { } pz ? -pz : 0.0, declared.Systematic, 0.0, null, 0.0, rows));
                    }
                    else
                    {
                        InferredOffset found = inferred.First(item => item.Source == group.Key && item.Energy == energy);
                        offsets.Add(new SourceOffset(energy, value, uncertainty, value / uncertainty, null, found.Drop, found.DisplacedId, found.Displaced, rows));
                    }
                }

                bool flagged = (z.Length >= 2 && Math.Abs(offsetZ) > threshold) || offsets.Any(offset => offset.IsInferred);
                return new SourceCheck(group.Key, group.Count(), checkable, mean, spread, offsetZ, group.Count(check => check.IsSuspect), flagged, offsets);
            })
            .OrderByDescending(source => source.HasInferredOffset)
            .ThenByDescending(source => Math.Abs(source.OffsetZ))
            .ToArray();
}
