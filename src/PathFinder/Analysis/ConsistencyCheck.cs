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
            Sources(model, checks, asGiven, adjusted, inferred, options.Threshold),
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

    /// <summary>The source whose common offset (not yet in the model) is significant and not explained away by one measurement with a larger z²; otherwise null.</summary>
    /// <remarks>
    /// With W the weights, C the covariance and r the residuals, a direction d (a source's rows g, or one row eⱼ) lowers χ²
    /// by (dᵀWr)²/(dᵀPd), P = W − WACAᵀW. The source is taken when its fall passes the Šidák critical value over the
    /// sources tested, and no single row j with a larger fall zⱼ² makes it insignificant once j is freed, i.e. the
    /// conditional fall (t_s − p·tⱼ/Pⱼⱼ)²/(gᵀPg − p²/Pⱼⱼ), p = gᵀPeⱼ, stays above the critical value. So an unrelated gross
    /// error elsewhere does not hide a source's offset, while a key value that alone explains the pattern as well is not
    /// overruled.
    /// </remarks>
    private static (string Source, bool Energy, double Drop, double BestSingle)? BestOffsetTest(ThermoModel model, LeastSquaresSolution solution)
    {
        var tests = new List<(string Source, bool Energy, int[] Rows, double Weighted, double Denominator, double[] Spread)>();
        foreach (var group in Enumerable.Range(0, model.Measurements.Count)
            .Where(i => model.OffsetOf(i) < 0)
            .GroupBy(i => (model.Measurements[i].Source, model.Measurements[i].IsEnergy)))
        {
            int[] rows = group.ToArray();
            if (rows.Length < MinimumRowsForOffsetTest)
            {
                continue;
            }

            // h = Σ wᵢaᵢ and Σ wᵢrᵢ over the source's rows; gᵀPg = Σwᵢ − hᵀCh.
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
            double[] spread = solution.CovarianceTimes(hRow);
            double denominator = weights - hRow.Dot(spread);
            if (!(denominator > 1e-9 * weights))
            {
                continue; // the source's rows alone fix what they touch: an offset is not identifiable
            }

            tests.Add((group.Key.Source, group.Key.IsEnergy, rows, weightedResiduals, denominator, spread));
        }

        if (tests.Count == 0)
        {
            return null;
        }

        double critical = OutlierProcedure.SidakCriticalValue(tests.Count, new OutlierOptions().SignificanceLevel);
        double threshold = critical * critical;
        foreach (var test in tests.OrderByDescending(test => test.Weighted * test.Weighted / test.Denominator))
        {
            double drop = test.Weighted * test.Weighted / test.Denominator;
            if (drop <= threshold)
            {
                return null;
            }

            var own = new HashSet<int>(test.Rows);
            double bestSingle = 0.0;
            bool explainedAway = false;
            for (int j = 0; j < model.Measurements.Count && !explainedAway; j++)
            {
                ObservationDiagnostics diagnostics = solution.Observations[j];
                if (diagnostics.NormalizedResidual is not { } z)
                {
                    continue;
                }

                Observation observation = solution.System.Observations[j];
                double w = observation.Weight;
                double pjj = w * (1.0 - diagnostics.Leverage);
                double cross = (own.Contains(j) ? w : 0.0) - (w * observation.Row.Dot(test.Spread));
                double conditional = Math.Pow(test.Weighted - (cross * w * diagnostics.Residual / pjj), 2) / (test.Denominator - (cross * cross / pjj));
                if (conditional < threshold || own.Contains(j))
                {
                    bestSingle = Math.Max(bestSingle, z * z);
                }

                explainedAway = z * z > drop && conditional < threshold;
            }

            if (!explainedAway)
            {
                return (test.Source, test.Energy, drop, bestSingle);
            }
        }

        return null;
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
