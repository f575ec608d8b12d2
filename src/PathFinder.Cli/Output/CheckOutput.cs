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
        FamilyConsistency[] families = report.Families.ToArray();
        Json.Write(output, new
        {
            consistent = report.Consistent,
            threshold = report.Options.Threshold,
            suspects = families.SelectMany(family => family.Suspects.Select(suspect => new
            {
                id = suspect.Measurement.Id,
                property = suspect.Measurement.Measurement.Property.ToString(),
                normalizedResidual = suspect.NormalizedResidual,
                measured = suspect.Measured,
                predicted = suspect.Predicted,
                predictedUncertainty = suspect.PredictedUncertainty,
                uncertainty = suspect.Measurement.Uncertainty,
                inflation = suspect.Inflation,
                unit = family.Model.Unit.Symbol,
                source = suspect.Measurement.Source,
                equation = suspect.Measurement.Equation.ToString(),
            })),
            cycles = families.SelectMany(family => family.Cycles.Select(cycle => new
            {
                family = family.Family.ToString(),
                residual = cycle.Residual,
                uncertainty = cycle.Uncertainty,
                z = Json.Number(cycle.Z),
                flagged = cycle.Flagged,
                members = cycle.Members.Select(member => new { id = member.Measurement.Id, factor = RationalText.Format(member.Factor) }),
            })),
            sources = families.SelectMany(family => family.Sources.Select(source => new
            {
                family = family.Family.ToString(),
                name = source.Source,
                measurements = source.Measurements,
                checkable = source.Checkable,
                meanNormalizedResidual = Json.Number(source.MeanNormalizedResidual),
                spreadNormalizedResidual = Json.Number(source.SpreadNormalizedResidual),
                offsetZ = Json.Number(source.OffsetZ),
                suspects = source.Suspects,
                systematicOffset = source.SystematicOffset,
            })),
            families = families.Select(family => new
            {
                family = family.Family.ToString(),
                unit = family.Model.Unit.Symbol,
                measurements = family.Model.Measurements.Count,
                unknowns = family.Model.Unknowns.Count,
                rank = family.AsGiven.Rank,
                independentCycles = family.IndependentCycles,
                cyclesFound = family.CyclesFound,
                cyclesComplete = family.CyclesComplete,
                cycleSearchCut = CutNames(family.CycleCut),
                chiSquared = family.AsGiven.ChiSquared,
                degreesOfFreedom = family.AsGiven.DegreesOfFreedom,
                birgeRatio = Json.Number(family.AsGiven.BirgeRatio),
                birgeRatioAdjusted = Json.Number(family.Adjusted.BirgeRatio),
                adjustments = family.Adjustments.Select(adjustment => new
                {
                    id = family.Model.Measurements[adjustment.ObservationIndex].Id,
                    normalizedResidualBefore = adjustment.NormalizedResidualBefore,
                    oldUncertainty = adjustment.OldUncertainty,
                    newUncertainty = adjustment.NewUncertainty,
                }),
                measurementChecks = family.Measurements.Select(check => new
                {
                    id = check.Measurement.Id,
                    measured = check.Measurement.Value,
                    uncertainty = check.Measurement.Uncertainty,
                    fitted = check.Fitted,
                    residual = check.Residual,
                    normalizedResidual = check.NormalizedResidual,
                    predicted = check.Predicted,
                    predictedUncertainty = check.PredictedUncertainty,
                    status = check.Status,
                }),
            }),
            crossChecks = report.CrossChecks.Select(check => new
            {
                reaction = check.Reaction.ToString(),
                enthalpy = check.Enthalpy.Id,
                entropy = check.Entropy.Id,
                gibbs = check.Gibbs.Id,
                temperature = check.Temperature,
                residual = check.Residual,
                uncertainty = check.Uncertainty,
                z = Json.Number(check.Z),
                flagged = check.Flagged,
            }),
            caution = Text.Caution,
        });
    }

    /// <summary>Writes the report as text.</summary>
    public static void WriteText(TextWriter output, ConsistencyReport report, int showCycles)
    {
        ArgumentNullException.ThrowIfNull(output);
        ArgumentNullException.ThrowIfNull(report);
        foreach (FamilyConsistency family in report.Families)
        {
            string unit = family.Model.Unit.Symbol;
            string symbol = family.Family.ResultProperty().Symbol();
            output.WriteLine($"== {family.Family} ({symbol}, {unit}): {family.Model.Measurements.Count} measurements, {family.Model.Unknowns.Count} species, rank {family.AsGiven.Rank}, {family.IndependentCycles} independent cycles");
            output.WriteLine($"   χ² = {Text.Number(family.AsGiven.ChiSquared)} with {family.AsGiven.DegreesOfFreedom} degrees of freedom; Birge ratio {Text.Number(family.AsGiven.BirgeRatio)} as given, {Text.Number(family.Adjusted.BirgeRatio)} after adjustment");
            int flagged = family.FlaggedCycles.Count();
            string completeness = Completeness(family.CycleCut, report.Options);
            // Only the worst MaxCycles are kept, so on a large network the count of failures is of those.
            string failures = family.Cycles.Count < family.CyclesFound
                ? $"{flagged} of the {family.Cycles.Count} worst kept fail to close"
                : $"{flagged} fail to close";
            output.WriteLine($"   Cycles: {family.CyclesFound} minimal ({completeness}); {failures} (|z| > {Text.Number(report.Options.Threshold, 1)})");
            foreach (CycleCheck cycle in family.Cycles.Take(showCycles))
            {
                string members = string.Join(" ", cycle.Members.Select(member => member.Factor == Fractions.Fraction.One ? member.Measurement.Id : $"{member.Measurement.Id}({RationalText.Format(member.Factor)})"));
                string mark = cycle.Flagged ? "FAILS " : "closes";
                output.WriteLine($"     {mark} z = {Text.Signed(cycle.Z),7}  residual {Text.Signed(cycle.Residual)} ± {Text.Number(cycle.Uncertainty)}  {members}");
            }

            output.WriteLine();
            if (family.Suspects.Count == 0)
            {
                output.WriteLine("   Suspects: none. The measurements agree with each other within their uncertainties.");
            }
            else
            {
                output.WriteLine($"   Suspects ({family.Suspects.Count}, most serious first):");
                foreach (SuspectReport suspect in family.Suspects)
                {
                    string predicted = suspect.Predicted is { } p
                        ? $"the rest says {Text.Number(p)} ± {Text.Number(suspect.PredictedUncertainty ?? double.NaN)}"
                        : "nothing else checks it";
                    output.WriteLine($"     {suspect.Measurement.Id,-6} z = {Text.Signed(suspect.NormalizedResidual),7}  measured {Text.Number(suspect.Measured)} ± {Text.Number(suspect.Measurement.Uncertainty)}; {predicted} {unit}   [{suspect.Measurement.Source}]");
                    output.WriteLine($"            {suspect.Measurement.Equation}");
                }
            }

            if (family.Adjustments.Count > 0)
            {
                output.WriteLine($"   Adjustments made by the procedure: {family.Adjustments.Count} (each enlarges one uncertainty; see --json for all)");
            }

            output.WriteLine();
            output.WriteLine("   Sources              n  checked   mean z   spread   offset z  suspects   (z: measured vs the rest, suspects left out)");
            foreach (SourceCheck source in family.Sources)
            {
                string flag = source.SystematicOffset ? "  SYSTEMATIC OFFSET" : "";
                output.WriteLine($"     {Text.Fit(source.Source, 18)} {source.Measurements,3}  {source.Checkable,7}  {Text.Signed(source.MeanNormalizedResidual),7}  {Text.Number(source.SpreadNormalizedResidual),7}  {Text.Signed(source.OffsetZ),8}  {source.Suspects,8}{flag}");
            }

            output.WriteLine();
        }

        if (report.CrossChecks.Count > 0)
        {
            output.WriteLine("== ΔG = ΔH − T·ΔS checks");
            foreach (CrossPropertyCheck check in report.CrossChecks)
            {
                string mark = check.Flagged ? "FAILS " : "agrees";
                output.WriteLine($"   {mark} z = {Text.Signed(check.Z)}  ΔG − (ΔH − TΔS) = {Text.Signed(check.Residual)} ± {Text.Number(check.Uncertainty)} kJ/mol at {Text.Number(check.Temperature)} K  ({check.Enthalpy.Id}, {check.Entropy.Id}, {check.Gibbs.Id}) {check.Reaction}");
            }

            output.WriteLine();
        }

        output.WriteLine(report.Consistent
            ? "Result: consistent."
            : "Result: INCONSISTENT (exit code 1). Review the suspects before using derived values.");
        output.WriteLine(Text.Caution);
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
    private static string[] CutNames(SearchCut cut) =>
        [.. Enum.GetValues<SearchCut>().Where(flag => flag != SearchCut.None && cut.HasFlag(flag)).Select(flag => JsonNamingPolicy.CamelCase.ConvertName(flag.ToString()))];
}
