using PathFinder.Analysis;
using PathFinder.Cli.Commands;
using PathFinder.Quantities;

namespace PathFinder.Cli.Output;

/// <summary>Writes an experiment plan as text or JSON.</summary>
public static class PlanOutput
{
    /// <summary>Writes <paramref name="plan"/>, listing at most <see cref="PlanSettings.Top"/> options of each kind.</summary>
    public static void Write(TextWriter output, ExperimentPlan plan, ThermoProperty property, PlanSettings settings, bool adjusted)
    {
        ArgumentNullException.ThrowIfNull(output);
        ArgumentNullException.ThrowIfNull(plan);
        ArgumentNullException.ThrowIfNull(settings);
        ValueProvenance current = plan.Current;
        string unit = current.Family.Unit().Symbol;
        double gasTerm = property == ThermoProperty.InternalEnergy
            ? PropertyModel.EnthalpyMinusInternalEnergy(current.Target)
            : 0.0;
        string remeasureRule = settings.Uncertainty is { } absolute
            ? $"re-measured with u = {Text.Number(absolute)} {unit}"
            : $"re-measured with u × {Text.Number(settings.Factor, 2)}";
        if (settings.Json)
        {
            Json.Write(output, new
            {
                target = current.Target.ToString(),
                property = property.Code(),
                unit,
                adjusted,
                determined = current.IsDetermined,
                reason = current.Reason,
                value = Json.Number(current.Value - gasTerm),
                uncertainty = Json.Number(current.StandardUncertainty),
                remeasurementRule = remeasureRule,
                candidateUncertainty = Json.Number(plan.CandidateUncertainty),
                remeasurements = plan.Remeasurements.Take(settings.Top).Select(item => new
                {
                    id = item.Measurement.Id,
                    source = item.Measurement.Source,
                    equation = item.Measurement.Equation.ToString(),
                    currentUncertainty = item.CurrentUncertainty,
                    newUncertainty = item.NewUncertainty,
                    targetUncertainty = item.TargetUncertainty,
                    varianceReduction = item.VarianceReduction,
                }),
                candidates = plan.Candidates.Take(settings.Top).Select(item => new
                {
                    equation = item.Equation.ToString(),
                    origin = item.Origin.ToString().ToLowerInvariant(),
                    uncertainty = item.Uncertainty,
                    targetUncertainty = item.TargetUncertainty,
                    varianceReduction = item.VarianceReduction,
                    newSpecies = item.NewSpecies.Select(species => species.Name),
                }),
                caution = Text.Caution,
            });
            return;
        }

        output.WriteLine($"Target    {current.Target}");
        output.WriteLine($"Property  {property.Symbol()}, {unit}, 298.15 K{(adjusted ? ", after the suspect procedure" : ", data as given")}");
        if (!current.IsDetermined)
        {
            output.WriteLine($"Now       — not determined: {current.Reason}");
            output.WriteLine("Nothing to rank: first add data that determine the target (see 'pathfinder routes').");
            return;
        }

        output.WriteLine($"Now       {Text.WithUncertainty(current.Value - gasTerm, current.StandardUncertainty, unit)}");
        if (current.Variance <= 0.0)
        {
            output.WriteLine($"  ({current.Reason ?? "exact"}: no experiment can improve it)");
            return;
        }

        output.WriteLine();
        output.WriteLine($"Re-measure an existing measurement ({remeasureRule}); the target's uncertainty afterwards:");
        if (plan.Remeasurements.Count == 0)
        {
            output.WriteLine("  (none bears on the target)");
        }
        else
        {
            int idWidth = Math.Max(4, plan.Remeasurements.Take(settings.Top).Max(item => item.Measurement.Id.Length));
            output.WriteLine($"  {"#",-3} {"id".PadRight(idWidth)}  {"u now",8}  {"u new",8}  {"target ±u",10}  {"variance cut",12}  equation");
            int rank = 0;
            foreach (RemeasurementSuggestion item in plan.Remeasurements.Take(settings.Top))
            {
                rank++;
                output.WriteLine($"  {rank,-3} {item.Measurement.Id.PadRight(idWidth)}  {Text.Number(item.CurrentUncertainty),8}  {Text.Number(item.NewUncertainty),8}  {Text.Number(item.TargetUncertainty),10}  {TraceOutput.Percent(item.VarianceReduction),12}  {item.Measurement.Equation}");
            }
        }

        output.WriteLine();
        output.WriteLine($"Measure a new reaction (assumed u = {Text.Number(plan.CandidateUncertainty)} {unit}{(settings.CandidateUncertainty is null ? ", the median of the data's" : "")}); the target's uncertainty afterwards:");
        if (plan.Candidates.Count == 0)
        {
            output.WriteLine("  (no candidates)");
        }
        else
        {
            output.WriteLine($"  {"#",-3} {"origin",-10}  {"target ±u",10}  {"variance cut",12}  equation");
            int rank = 0;
            foreach (CandidateSuggestion item in plan.Candidates.Take(settings.Top))
            {
                rank++;
                string note = item.NewSpecies.Count > 0 ? $"   (no data yet for {string.Join(", ", item.NewSpecies.Select(species => species.Name))}: cannot help)" : "";
                output.WriteLine($"  {rank,-3} {item.Origin.ToString().ToLowerInvariant(),-10}  {Text.Number(item.TargetUncertainty),10}  {TraceOutput.Percent(item.VarianceReduction),12}  {item.Equation}{note}");
            }

            if (plan.Candidates.Count > settings.Top)
            {
                output.WriteLine($"  … {plan.Candidates.Count - settings.Top} more (raise --top)");
            }
        }

        output.WriteLine();
        output.WriteLine("Rank-one updates of the current solution (no re-solve); an assumed uncertainty is a plan, not a result.");
        output.WriteLine(Text.Caution);
    }
}
