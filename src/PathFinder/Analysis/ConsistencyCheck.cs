using PathFinder.Chemistry;
using PathFinder.Quantities;
using PathFinder.Routes;
using PathFinder.Solving;
using PathFinder.Thermodynamics;

namespace PathFinder.Analysis;

/// <summary>Tests every cycle that should close, ranks the measurements and sources that break closure, and solves the network.</summary>
/// <remarks>
/// Per property family: the least-squares solution of the data as given (normalized residuals for every
/// measurement), the minimal cycles up to a size bound with their closure z, the worst-offender suspect
/// procedure (enlarging the worst measurement's uncertainty until the rest agree) with leave-one-out predictions
/// from the adjusted network, and per-source statistics. Across families: ΔG = ΔH − T·ΔS for reactions with all
/// three measured at one temperature.
/// </remarks>
public static class ConsistencyCheck
{
    /// <summary>Analyses every property family present in <paramref name="network"/>.</summary>
    public static ConsistencyReport Run(ReactionNetwork network, IReadOnlyDictionary<Species, IHeatCapacity>? heatCapacities = null, ConsistencyOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(network);
        options ??= new ConsistencyOptions();
        var families = network.Measurements
            .Select(measurement => PropertyFamilies.FamilyOf(measurement.Property))
            .Distinct()
            .Order()
            .Select(family => Analyse(PropertyModel.Build(network, family, heatCapacities), options))
            .ToArray();
        return new ConsistencyReport(families, CrossCheck(network, options.Threshold), options);
    }

    /// <summary>Analyses one property model.</summary>
    public static FamilyConsistency Analyse(PropertyModel model, ConsistencyOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(model);
        options ??= new ConsistencyOptions();
        // The solve first, with every core for its dense algebra (a search beside it would slow its threaded
        // factorization by more than it gains); then the cycle search, which needs only the measurements, runs
        // on another core beside the suspect procedure (its short work budget leaves that core to the
        // procedure's dense folds soon after).
        LeastSquaresSolution asGiven = WeightedLeastSquares.Solve(model.ToObservationSystem());
        Task<CycleSearchResult> cycleSearch = Task.Run(() => FindCycles.In(model.ToRouteNetwork(), new CycleSearchOptions
        {
            MaxSize = options.MaxCycleSize,
            MaxCycles = options.MaxCycles,
            TimeBudget = options.CycleTimeBudget,
            WorkBudget = options.CycleWorkBudget,
            CancellationToken = options.CancellationToken,
        }));

        // The per-measurement diagnostics of the data as given are needed only after the procedure: that core works
        // them out once the cycle search is done (the procedure works on a copy of the factorization).
        Task givenDiagnostics = cycleSearch.ContinueWith(_ => asGiven.Observations.Count, TaskScheduler.Default);

        // Start from the solution just computed: the procedure copies its factorization instead of redoing it.
        OutlierResult? outliers = options.RunSuspectProcedure
            ? OutlierProcedure.Run(asGiven, new OutlierOptions { Threshold = options.Threshold, InflationFactor = options.InflationFactor })
            : null;
        LeastSquaresSolution adjusted = outliers?.Solution ?? asGiven;
        IReadOnlyList<OutlierSuspect> outlierSuspects = outliers?.Suspects ?? [];
        IReadOnlyList<UncertaintyAdjustment> adjustments = outliers?.Adjustments ?? [];

        givenDiagnostics.GetAwaiter().GetResult();
        var suspectIndices = new HashSet<int>(outlierSuspects.Select(suspect => suspect.ObservationIndex));
        var checks = new MeasurementCheck[model.Measurements.Count];
        for (int i = 0; i < checks.Length; i++)
        {
            ObservationDiagnostics given = asGiven.Observations[i];
            ObservationDiagnostics after = adjusted.Observations[i];
            checks[i] = new MeasurementCheck(
                model.Measurements[i],
                given.Fitted,
                given.Residual,
                given.NormalizedResidual,
                after.LeaveOneOutPrediction,
                after.LeaveOneOutUncertainty,
                suspectIndices.Contains(i),
                adjusted.System.Observations[i].Uncertainty);
        }

        SuspectReport[] suspects = outlierSuspects
            .Select(suspect => new SuspectReport(
                model.Measurements[suspect.ObservationIndex],
                suspect.FirstNormalizedResidual,
                checks[suspect.ObservationIndex].Predicted,
                checks[suspect.ObservationIndex].PredictedUncertainty,
                suspect.TotalInflation))
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

        return new FamilyConsistency(
            model,
            checks,
            cycleChecks,
            cycles.CyclesFound,
            cycles.Cut,
            cycles.IndependentCycleCount,
            suspects,
            adjustments,
            Sources(checks, options.Threshold),
            asGiven,
            adjusted);
    }

    private static SourceCheck[] Sources(MeasurementCheck[] checks, double threshold) =>
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
                return new SourceCheck(group.Key, group.Count(), checkable, mean, spread, offsetZ, group.Count(check => check.IsSuspect), z.Length >= 2 && Math.Abs(offsetZ) > threshold);
            })
            .OrderByDescending(source => Math.Abs(source.OffsetZ))
            .ToArray();

    private static CrossPropertyCheck[] CrossCheck(ReactionNetwork network, double threshold)
    {
        var checks = new List<CrossPropertyCheck>();

        // Only temperatures at which both ΔS and ΔG were measured can hold a triple; the reaction signature (exact
        // rational arithmetic per measurement) is computed for those measurements alone, not for a whole ΔH network.
        var entropyTemperatures = network.Measurements.Where(m => m.Property == ThermoProperty.Entropy).Select(m => Math.Round(m.Temperature, 2)).ToHashSet();
        var tripleTemperatures = network.Measurements
            .Where(m => m.Property == ThermoProperty.GibbsEnergy && entropyTemperatures.Contains(Math.Round(m.Temperature, 2)))
            .Select(m => Math.Round(m.Temperature, 2))
            .ToHashSet();
        if (tripleTemperatures.Count == 0)
        {
            return [];
        }

        var byReaction = network.Measurements
            .Where(measurement => tripleTemperatures.Contains(Math.Round(measurement.Temperature, 2)))
            .GroupBy(measurement => (Signature(measurement.Equation), Math.Round(measurement.Temperature, 2)));
        foreach (var group in byReaction)
        {
            Measurement? enthalpy = group.FirstOrDefault(m => m.Property == ThermoProperty.Enthalpy);
            Measurement? entropy = group.FirstOrDefault(m => m.Property == ThermoProperty.Entropy);
            Measurement? gibbs = group.FirstOrDefault(m => m.Property == ThermoProperty.GibbsEnergy);
            if (enthalpy is null || entropy is null || gibbs is null)
            {
                continue;
            }

            // All three must describe the reaction with the same coefficients; rescale ΔS and ΔG to ΔH's equation.
            double entropyScale = Scale(enthalpy.Equation, entropy.Equation);
            double gibbsScale = Scale(enthalpy.Equation, gibbs.Equation);
            double temperature = enthalpy.Temperature;
            GibbsConsistency consistency = GibbsRelations.CheckConsistency(
                new UncertainValue(enthalpy.Value * 1000.0, enthalpy.Uncertainty * 1000.0),
                new UncertainValue(entropy.Value * entropyScale, entropy.Uncertainty * Math.Abs(entropyScale)),
                new UncertainValue(gibbs.Value * 1000.0 * gibbsScale, gibbs.Uncertainty * 1000.0 * Math.Abs(gibbsScale)),
                temperature);
            double z = consistency.ZScore;
            checks.Add(new CrossPropertyCheck(enthalpy.Equation, enthalpy, entropy, gibbs, temperature, consistency.Residual / 1000.0, consistency.CombinedUncertainty / 1000.0, z, Math.Abs(z) > threshold));
        }

        return checks.ToArray();
    }

    private static string Signature(ChemicalEquation equation)
    {
        EquationTerm pivot = equation.Terms.OrderBy(term => term.Species.Key, StringComparer.Ordinal).First();
        Fractions.Fraction scale = pivot.Coefficient;
        return string.Join(";", equation.Terms.OrderBy(term => term.Species.Key, StringComparer.Ordinal).Select(term => $"{term.Species.Key}:{RationalText.Format(term.Coefficient / scale)}"));
    }

    /// <summary>The factor s with <paramref name="reference"/> = s·<paramref name="other"/> (same reaction up to scale).</summary>
    private static double Scale(ChemicalEquation reference, ChemicalEquation other)
    {
        EquationTerm term = reference.Terms[0];
        return (term.Coefficient / other.CoefficientOf(term.Species)).ToDouble();
    }
}
