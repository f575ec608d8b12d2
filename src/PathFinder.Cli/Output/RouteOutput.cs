using System.Globalization;
using PathFinder.Analysis;
using PathFinder.Chemistry;
using PathFinder.Quantities;
using PathFinder.Thermodynamics;

namespace PathFinder.Cli.Output;

/// <summary>Writes a route report as text or JSON.</summary>
public static class RouteOutput
{
    /// <summary>Writes <paramref name="report"/>.</summary>
    public static void Write(TextWriter output, RouteReport report, PropertyModel model, ThermoProperty property, int explain, TargetConditions? conditions, bool json, IReadOnlySet<string>? suspects = null)
    {
        ArgumentNullException.ThrowIfNull(output);
        ArgumentNullException.ThrowIfNull(report);
        ArgumentNullException.ThrowIfNull(model);
        suspects ??= new HashSet<string>(StringComparer.Ordinal);
        string unit = model.Unit.Symbol;
        double gasTerm = property == ThermoProperty.InternalEnergy
            ? PropertyModel.EnthalpyMinusInternalEnergy(report.Target)
            : 0.0;
        if (json)
        {
            Json.Write(output, new
            {
                target = report.Target.ToString(),
                property = property.Code(),
                unit,
                temperature = model.ReferenceTemperature,
                complete = report.Complete,
                incompleteReason = report.IncompleteReason,
                searchCut = CheckOutput.CutNames(report.Cut),
                maxSteps = report.MaxSteps,
                completeUpToSteps = report.CompleteUpToSteps,
                routesFound = report.RoutesFound,
                independentRoutes = report.IndependentRoutes,
                networkEstimate = report.NetworkEstimate is { } estimate
                    ? new { value = estimate.Value - gasTerm, uncertainty = estimate.StandardUncertainty }
                    : null,
                unreachableSpecies = report.UnreachableSpecies.Select(species => species.Name),
                routes = report.Routes.Select(route => new
                {
                    number = route.Number,
                    value = route.Value - gasTerm,
                    uncertainty = route.Uncertainty,
                    independent = route.IsIndependent,
                    usesSuspects = route.Steps.Select(step => step.Measurement.Id).Where(suspects.Contains),
                    cancelled = route.Cancelled.Select(species => species.Name),
                    steps = route.Steps.Select(step => new
                    {
                        id = step.Measurement.Id,
                        factor = RationalText.Format(step.Factor),
                        operation = step.Operation,
                        equation = step.Equation.ToString(),
                        measured = step.Measurement.Value,
                        measuredUncertainty = step.Measurement.Uncertainty,
                        value = step.Value,
                        uncertainty = step.Uncertainty,
                        source = step.Measurement.Source,
                        adjustments = step.Measurement.Adjustments,
                    }),
                }),
                atTemperature = conditions is null ? null : ConditionsJson(conditions),
                caution = Text.Caution,
            });
            return;
        }

        string symbol = property.Symbol();
        output.WriteLine($"Target    {report.Target}");
        output.WriteLine($"Property  {symbol}{(property == ThermoProperty.InternalEnergy ? " (routes in ΔH, converted with Δn(gas)·R·T)" : "")}, {unit}, 298.15 K");
        if (report.NetworkEstimate is { } best)
        {
            output.WriteLine($"Network best estimate  {Text.WithUncertainty(best.Value - gasTerm, best.StandardUncertainty, unit)}  (joint weighted least squares over the whole network)");
        }
        else
        {
            output.WriteLine("Network best estimate  — (the data do not determine this target)");
        }

        string completeness = report.Complete ? $"complete up to {report.MaxSteps} steps" : $"INCOMPLETE: {report.IncompleteReason}";
        output.WriteLine($"Routes    {report.RoutesFound} found ({completeness}); {report.IndependentRoutes} linearly independent among those listed (marked *)");
        if (report.UnreachableSpecies.Count > 0)
        {
            output.WriteLine($"Unreachable: no measurement contains {string.Join(", ", report.UnreachableSpecies.Select(species => species.Name))}");
        }

        if (report.Routes.Count > 0)
        {
            output.WriteLine();
            output.WriteLine($"  #    {symbol,12}  {"±u",8}  steps  measurements (factor)");
            foreach (ExplainedRoute route in report.Routes)
            {
                string mark = route.IsIndependent ? "*" : " ";
                string members = string.Join(" ", route.Steps.Select(step => step.Factor == Fractions.Fraction.One ? step.Measurement.Id : $"{step.Measurement.Id}({RationalText.Format(step.Factor)})"));
                string[] usedSuspects = route.Steps.Select(step => step.Measurement.Id).Where(suspects.Contains).ToArray();
                string warning = usedSuspects.Length > 0 ? $"   ! uses suspect {string.Join(", ", usedSuspects)}" : "";
                output.WriteLine($"  {route.Number,-3}{mark} {Text.Number(route.Value - gasTerm),12}  {Text.Number(route.Uncertainty),8}  {route.Steps.Count,5}  {members}{warning}");
            }
        }

        foreach (ExplainedRoute route in report.Routes.Take(Math.Max(0, explain)))
        {
            output.WriteLine();
            output.WriteLine($"Route {route.Number}:");
            foreach (RouteStep step in route.Steps)
            {
                output.WriteLine($"  {Text.Fit(step.Measurement.Id, 6)} {Text.Fit(step.Operation, 18)} {Text.Fit(step.Equation.ToString(), 52)} {Text.Signed(step.Value),10} ± {Text.Number(step.Uncertainty)}");
                foreach (string adjustment in step.Measurement.Adjustments)
                {
                    output.WriteLine($"         ({adjustment})");
                }
            }

            if (route.Cancelled.Count > 0)
            {
                output.WriteLine($"  cancels: {string.Join(", ", route.Cancelled.Select(species => species.Name))}");
            }

            output.WriteLine($"  sum:    {route.Sum}   {symbol} = {Text.WithUncertainty(route.Value - gasTerm, route.Uncertainty, unit)}");
            if (property == ThermoProperty.InternalEnergy)
            {
                output.WriteLine($"          (ΔU = ΔH − Δn(gas)·R·T = {Text.Number(route.Value)} {Text.Signed(-gasTerm)} {unit})");
            }
        }

        if (conditions is not null)
        {
            output.WriteLine();
            WriteConditions(output, conditions);
        }

        output.WriteLine();
        output.WriteLine(Text.Caution);
    }

    private static void WriteConditions(TextWriter output, TargetConditions conditions)
    {
        output.WriteLine($"At {conditions.Temperature.ToString("0.##", CultureInfo.InvariantCulture)} K:");
        output.WriteLine($"  ΔrH° = {Format(conditions.Enthalpy, "kJ/mol")}");
        output.WriteLine($"  ΔrS° = {Format(conditions.Entropy, "J/(mol·K)")}");
        output.WriteLine($"  ΔrG° = {Format(conditions.Gibbs, "kJ/mol")}");
        if (conditions.EquilibriumConstant is { } k)
        {
            output.WriteLine(string.Create(CultureInfo.InvariantCulture, $"  K    = {k.K:G4}   (log10 K = {k.Log10K:F3} ± {k.Log10KUncertainty:F3})"));
        }
        else
        {
            output.WriteLine("  K    = —");
        }

        foreach (string note in conditions.Notes)
        {
            output.WriteLine($"  note: {note}");
        }
    }

    private static string Format(UncertainValue? value, string unit) =>
        value is { } v ? Text.WithUncertainty(v.Value, v.StandardUncertainty, unit) : "— (not determined)";

    /// <summary>The JSON form of target conditions.</summary>
    public static object ConditionsJson(TargetConditions conditions)
    {
        ArgumentNullException.ThrowIfNull(conditions);
        return new
        {
            temperature = conditions.Temperature,
            enthalpy = conditions.Enthalpy is { } h ? new { value = h.Value, uncertainty = h.StandardUncertainty, unit = "kJ/mol" } : null,
            entropy = conditions.Entropy is { } s ? new { value = s.Value, uncertainty = s.StandardUncertainty, unit = "J/(mol·K)" } : null,
            gibbs = conditions.Gibbs is { } g ? new { value = g.Value, uncertainty = g.StandardUncertainty, unit = "kJ/mol" } : null,
            equilibriumConstant = conditions.EquilibriumConstant is { } k ? new { k = Json.Number(k.K), log10K = k.Log10K, log10KUncertainty = k.Log10KUncertainty } : null,
            notes = conditions.Notes,
        };
    }
}
