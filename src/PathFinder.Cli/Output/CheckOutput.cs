using PathFinder.Analysis;
using PathFinder.Chemistry;
using PathFinder.Quantities;
using PathFinder.Routes;
using System.Text.Json;

namespace PathFinder.Cli.Output;

/// <summary>Writes a consistency report as text or JSON.</summary>
public static class CheckOutput
{
    /// <summary>Writes the report as JSON.</summary>
    public static void WriteJson(TextWriter output, ConsistencyReport report)
    {
        ArgumentNullException.ThrowIfNull(report);
        ModelConsistency? analysis = report.Analysis;
        Json.Write(output, new
        {
            consistent = report.Consistent,
            checkable = analysis is { IndependentCycles: > 0 },
            threshold = report.Options.Threshold,
            offsetSources = analysis?.OffsetSources.Select(source => source.Source) ?? [],
            suspects = analysis?.Suspects.Select(Suspect) ?? [],
            cycles = analysis?.Cycles.Select(cycle => new
            {
                number = cycle.Number,
                residual = cycle.Residual,
                uncertainty = cycle.Uncertainty,
                unit = cycle.Unit,
                z = Json.Number(cycle.Z),
                flagged = cycle.Flagged,
                mixed = cycle.IsMixed,
                members = cycle.Members.Select(member => new { id = member.Measurement.Id, property = member.Measurement.Measurement.Property.Code(), factor = RationalText.Format(member.Factor) }),
            }) ?? [],
            sources = analysis?.Sources.Select(Source) ?? [],
            model = analysis is null ? null : new
            {
                measurements = analysis.Model.Measurements.Count,
                byProperty = analysis.Model.Measurements.GroupBy(item => item.Measurement.Property).OrderBy(group => group.Key).ToDictionary(group => group.Key.Code(), group => group.Count()),
                formationEnthalpies = analysis.Model.Unknowns.Count(unknown => unknown.Kind == UnknownKind.FormationEnthalpy),
                entropies = analysis.Model.Unknowns.Count(unknown => unknown.Kind == UnknownKind.Entropy),
                sourceOffsets = analysis.Model.Unknowns.Count(unknown => unknown.Kind == UnknownKind.SourceOffset),
                rank = analysis.AsGiven.Rank,
                independentCycles = analysis.IndependentCycles,
                cyclesFound = analysis.CyclesFound,
                cyclesComplete = analysis.CyclesComplete,
                cycleSearchCut = CutNames(analysis.CycleCut),
                chiSquared = analysis.AsGiven.ChiSquared,
                degreesOfFreedom = analysis.AsGiven.DegreesOfFreedom,
                birgeRatio = Json.Number(analysis.AsGiven.BirgeRatio),
                birgeRatioAdjusted = Json.Number(analysis.Adjusted.BirgeRatio),
                adjustments = analysis.Adjustments.Select(adjustment => new
                {
                    id = analysis.Model.IsPrior(adjustment.ObservationIndex) ? "offset(" + analysis.Model.Systematics[adjustment.ObservationIndex - analysis.Model.Measurements.Count].Source + ")" : analysis.Model.Measurements[adjustment.ObservationIndex].Id,
                    normalizedResidualBefore = adjustment.NormalizedResidualBefore,
                    oldUncertainty = adjustment.OldUncertainty,
                    newUncertainty = adjustment.NewUncertainty,
                }),
                measurementChecks = analysis.Measurements.Select(check => new
                {
                    id = check.Measurement.Id,
                    property = check.Measurement.Measurement.Property.Code(),
                    unit = check.Measurement.Unit.Symbol,
                    measured = check.Measurement.Value,
                    uncertainty = check.Measurement.Uncertainty,
                    fitted = check.Fitted,
                    residual = check.Residual,
                    normalizedResidual = check.NormalizedResidual,
                    predicted = check.Predicted,
                    predictedUncertainty = check.PredictedUncertainty,
                    status = check.Status,
                }),
            },
            caution = Text.Caution,
        });
    }

    /// <summary>A suspect as JSON; <c>likelyCause</c> only when a slip explains it.</summary>
    private static Dictionary<string, object?> Suspect(SuspectReport suspect)
    {
        var json = new Dictionary<string, object?>
        {
            ["id"] = suspect.Measurement.Id,
            ["property"] = suspect.Measurement.Measurement.Property.Code(),
            ["normalizedResidual"] = suspect.NormalizedResidual,
            ["measured"] = suspect.Measured,
            ["predicted"] = suspect.Predicted,
            ["predictedUncertainty"] = suspect.PredictedUncertainty,
            ["uncertainty"] = suspect.Measurement.Uncertainty,
            ["inflation"] = suspect.Inflation,
            ["unit"] = suspect.Measurement.Unit.Symbol,
            ["source"] = suspect.Measurement.Source,
            ["equation"] = suspect.Measurement.Equation.ToString(),
        };
        if (suspect.LikelyCause is { } cause)
        {
            json["likelyCause"] = new { kind = cause.Kind.Code(), explainedValue = cause.ExplainedValue, detail = cause.Detail };
        }

        return json;
    }

    /// <summary>A source as JSON; <c>offset</c> and <c>offsetUncertainty</c> (kJ/mol, positive when it reads high) where an energy systematic is declared.</summary>
    private static Dictionary<string, object?> Source(SourceCheck source)
    {
        var json = new Dictionary<string, object?>
        {
            ["name"] = source.Source,
            ["measurements"] = source.Measurements,
            ["checkable"] = source.Checkable,
            ["meanNormalizedResidual"] = Json.Number(source.MeanNormalizedResidual),
            ["spreadNormalizedResidual"] = Json.Number(source.SpreadNormalizedResidual),
            ["offsetZ"] = Json.Number(source.OffsetZ),
            ["suspects"] = source.Suspects,
            ["systematicOffset"] = source.SystematicOffset,
            ["inferredOffset"] = source.HasInferredOffset,
        };
        if (source.Offsets.FirstOrDefault(offset => !offset.IsInferred && offset.IsEnergy) is { } declared)
        {
            json["offset"] = declared.Value;
            json["offsetUncertainty"] = declared.Uncertainty;
        }

        if (source.Offsets.Count > 0)
        {
            json["offsets"] = source.Offsets.Select(offset => new
            {
                unit = offset.Unit,
                value = offset.Value,
                uncertainty = offset.Uncertainty,
                z = Json.Number(offset.Z),
                declared = offset.Declared,
                inferred = offset.IsInferred,
                chiSquaredDrop = offset.IsInferred ? offset.ChiSquaredDrop : (double?)null,
                displacedSuspect = offset.DisplacedSuspect,
                displacedChiSquared = offset.IsInferred ? offset.DisplacedChiSquared : (double?)null,
                rows = offset.Rows,
            }).ToArray();
        }

        return json;
    }

    /// <summary>Writes the report as text.</summary>
    public static void WriteText(TextWriter output, ConsistencyReport report, int showCycles)
    {
        ArgumentNullException.ThrowIfNull(output);
        ArgumentNullException.ThrowIfNull(report);
        if (report.Analysis is { } analysis)
        {
            WriteAnalysis(output, analysis, report.Options, showCycles);
        }
        else
        {
            output.WriteLine("No usable measurement: nothing to check.");
        }

        bool checkable = report.Analysis is { IndependentCycles: > 0 };
        output.WriteLine(!checkable
            ? "Result: nothing could be checked: no measurement is tied to the others by a cycle."
            : report.Consistent
            ? "Result: consistent."
            : "Result: INCONSISTENT (exit code 1). Review the sources and suspects before using derived values.");
        output.WriteLine(Text.Caution);
    }

    private static void WriteAnalysis(TextWriter output, ModelConsistency analysis, ConsistencyOptions options, int showCycles)
    {
        ThermoModel model = analysis.Model;
        string data = string.Join(", ", model.Measurements.GroupBy(item => item.Measurement.Property).OrderBy(group => group.Key).Select(group => $"{group.Count()} {group.Key.Code()}"));
        int enthalpies = model.Unknowns.Count(unknown => unknown.Kind == UnknownKind.FormationEnthalpy);
        int entropies = model.Unknowns.Count(unknown => unknown.Kind == UnknownKind.Entropy);
        int offsets = model.Unknowns.Count(unknown => unknown.Kind == UnknownKind.SourceOffset);
        string unknowns = $"{enthalpies} ΔfH°, {entropies} S°" + (offsets > 0 ? $", {offsets} source offset{(offsets == 1 ? "" : "s")}" : "");
        output.WriteLine($"== Joint model: {model.Measurements.Count} measurements ({data}); unknowns {unknowns}; rank {analysis.AsGiven.Rank}, {analysis.IndependentCycles} independent cycles");
        output.WriteLine($"   χ² = {Text.Number(analysis.AsGiven.ChiSquared)} with {analysis.AsGiven.DegreesOfFreedom} degrees of freedom; Birge ratio {Text.Number(analysis.AsGiven.BirgeRatio)} as given, {Text.Number(analysis.Adjusted.BirgeRatio)} after adjustment");
        int flagged = analysis.FlaggedCycles.Count();
        string completeness = Completeness(analysis.CycleCut, options);
        // Only the worst MaxCycles are kept, so on a large network the count of failures is of those.
        string failures = analysis.Cycles.Count < analysis.CyclesFound
            ? $"{flagged} of the {analysis.Cycles.Count} worst kept fail to close"
            : $"{flagged} fail to close";
        output.WriteLine($"   Cycles: {analysis.CyclesFound} minimal ({completeness}); {failures} (|z| > {Text.Number(options.Threshold, 1)})");
        foreach (CycleCheck cycle in analysis.Cycles.Take(showCycles))
        {
            string members = string.Join(" ", cycle.Members.Select(member => member.Factor == Fractions.Fraction.One ? member.Measurement.Id : $"{member.Measurement.Id}({RationalText.Format(member.Factor)})"));
            string mark = cycle.Flagged ? "FAILS " : "closes";
            string kinds = cycle.IsMixed ? $"  [{string.Join(" ", cycle.Members.Select(member => member.Measurement.Measurement.Property.Code()).Distinct())}: G = H − TS]" : "";
            output.WriteLine($"     {mark} z = {Text.Signed(cycle.Z),7}  residual {Text.Signed(cycle.Residual)} ± {Text.Number(cycle.Uncertainty)} {cycle.Unit}  {members}{kinds}");
        }

        output.WriteLine();
        foreach (SourceCheck source in analysis.OffsetSources)
        {
            foreach (SourceOffset offset in source.Offsets.Where(offset => offset.IsInferred))
            {
                string direction = offset.Value >= 0 ? "high" : "low";
                output.WriteLine($"   Source {source.Source} reads {direction}: common offset {Text.Signed(offset.Value)} ± {Text.Number(offset.Uncertainty)} {offset.Unit} on all {offset.Rows.Count} of its {(offset.IsEnergy ? "energy" : "entropy")} rows");
                output.WriteLine(offset.DisplacedSuspect is { } displaced
                    ? $"            the offset explains the data at least as well (χ² falls by {Text.Number(offset.ChiSquaredDrop, 1)}) as blaming {displaced} did ({Text.Number(offset.DisplacedChiSquared, 1)}); {displaced} is cleared and the offset fitted as an unknown"
                    : $"            the offset stays significant after the suspect procedure (χ² falls by {Text.Number(offset.ChiSquaredDrop, 1)}); fitted as an unknown");
                output.WriteLine($"            rows: {string.Join(" ", offset.Rows)}");
            }
        }

        foreach ((SourceCheck source, SourceOffset offset) in analysis.DeclaredOffsets)
        {
            string beyond = Math.Abs(offset.Z) > options.Threshold ? "  BEYOND ITS DECLARED SYSTEMATIC" : "";
            output.WriteLine($"   Source {source.Source} (declared systematic ± {Text.Number(offset.Declared ?? double.NaN)} {offset.Unit}): fitted offset {Text.Signed(offset.Value)} ± {Text.Number(offset.Uncertainty)} {offset.Unit}, z = {Text.Signed(offset.Z)}{beyond}");
        }

        if (analysis.IndependentCycles == 0)
        {
            // Agreement needs redundancy: without a cycle every value is the only one for what it fixes.
            output.WriteLine("   Nothing can be checked: the data form no cycle, so each measurement is the only source of what it determines. Add measurements that reach the same species by another route.");
        }
        else if (analysis.Suspects.Count == 0)
        {
            output.WriteLine("   Suspects: none. The measurements agree with each other within their uncertainties.");
        }
        else
        {
            output.WriteLine($"   Suspects ({analysis.Suspects.Count}, most serious first):");
            foreach (SuspectReport suspect in analysis.Suspects)
            {
                string unit = suspect.Measurement.Unit.Symbol;
                string predicted = suspect.Predicted is { } p
                    ? $"the rest says {Text.Number(p)} ± {Text.Number(suspect.PredictedUncertainty ?? double.NaN)}"
                    : "nothing else checks it";
                output.WriteLine($"     {suspect.Measurement.Id,-6} z = {Text.Signed(suspect.NormalizedResidual),7}  {suspect.Measurement.Symbol} measured {Text.Number(suspect.Measured)} ± {Text.Number(suspect.Measurement.Uncertainty)}; {predicted} {unit}   [{suspect.Measurement.Source}]");
                output.WriteLine($"            {suspect.Measurement.Equation}");
                if (suspect.LikelyCause is { } cause)
                {
                    output.WriteLine($"            {cause.Detail}");
                }
            }
        }

        if (analysis.Adjustments.Count > 0)
        {
            output.WriteLine($"   Adjustments made by the procedure: {analysis.Adjustments.Count} (each enlarges one uncertainty; see --json for all)");
        }

        output.WriteLine();
        output.WriteLine("   Sources              n  checked   mean z   spread   offset z  suspects   (z: measured vs the rest, suspects left out)");
        foreach (SourceCheck source in analysis.Sources)
        {
            string flag = source.HasInferredOffset ? "  COMMON OFFSET (above)" : source.SystematicOffset ? "  SYSTEMATIC OFFSET" : "";
            output.WriteLine($"     {Text.Fit(source.Source, 18)} {source.Measurements,3}  {source.Checkable,7}  {Text.Signed(source.MeanNormalizedResidual),7}  {Text.Number(source.SpreadNormalizedResidual),7}  {Text.Signed(source.OffsetZ),8}  {source.Suspects,8}{flag}");
        }

        output.WriteLine();
    }

    /// <summary>How complete the cycle list is, in words.</summary>
    private static string Completeness(SearchCut cut, ConsistencyOptions options)
    {
        if (cut == SearchCut.None)
        {
            return $"all minimal cycles up to {options.MaxCycleSize} measurements";
        }

        if (cut == SearchCut.StepBound)
        {
            return $"all up to {options.MaxCycleSize} measurements; longer ones may exist (--max-cycle)";
        }

        var reasons = new List<string>();
        if (cut.HasFlag(SearchCut.WorkBudget))
        {
            reasons.Add($"a sample: the enumeration stopped after its {options.CycleWorkBudget:N0} search steps, at the same point on every run");
        }

        if (cut.HasFlag(SearchCut.TimeBudget))
        {
            reasons.Add($"a sample: the enumeration stopped after {options.CycleTimeBudget.TotalSeconds:0.#} s, so the list may differ between runs");
        }

        if (cut.HasFlag(SearchCut.Cancelled))
        {
            reasons.Add("cancelled");
        }

        return string.Join("; ", reasons);
    }

    /// <summary>The reasons that cut a search, as JSON names ("stepBound", "workBudget", ...).</summary>
    internal static string[] CutNames(SearchCut cut) =>
        [.. Enum.GetValues<SearchCut>().Where(flag => flag != SearchCut.None && cut.HasFlag(flag)).Select(flag => JsonNamingPolicy.CamelCase.ConvertName(flag.ToString()))];
}
