using System.CommandLine;
using PathFinder.Analysis;
using PathFinder.Chemistry;
using PathFinder.Cli.Output;
using PathFinder.Quantities;
using PathFinder.Routes;

namespace PathFinder.Cli.Commands;

/// <summary><c>pathfinder routes &lt;network&gt; --target "…"</c>: every minimal Hess's-law route to a target, best first.</summary>
public sealed class RoutesCommand
{
    /// <summary>Largest <c>--max-steps</c> accepted (1,000).</summary>
    /// <remarks>The search's memory follows the depth it reaches, not the bound, but its walk is recursive, one frame per
    /// step: a bound of a thousand keeps the stack far inside its limit on any network (a test walks a 999-step chain),
    /// and no Hess's-law route of interest is that long.</remarks>
    public const int MaxStepsLimit = OptionRanges.MaxSteps;

    private readonly Argument<string> _network = CommonOptions.Network();
    private readonly Option<string> _target = CommonOptions.Target();
    private readonly Option<string> _property = CommonOptions.Property();
    private readonly Option<int> _maxSteps = new("--max-steps") { Description = "Longest route searched, 1 to 64 measurements (default 6).", DefaultValueFactory = _ => 6 };
    private readonly Option<int> _top = new("--top") { Description = "How many routes to list, best first, 1 to 100000 (default 10).", DefaultValueFactory = _ => 10 };
    private readonly Option<int> _explain = new("--explain") { Description = "How many of the listed routes to spell out step by step, 0 to 1000 (default 3).", DefaultValueFactory = _ => 3 };
    private readonly Option<double> _timeBudget = new("--time-budget") { Description = "Seconds the search may take before it reports what it found as incomplete, above 0 and at most 86400 (default 20).", DefaultValueFactory = _ => 20.0 };
    private readonly Option<double?> _temperature = new("--temperature") { Description = "Also report ΔrH, ΔrS, ΔrG and K of the target at this temperature, 1 to 10000 K (needs ΔS or S° data, and heat capacities)." };
    private readonly Option<bool> _json = CommonOptions.Json();
    private readonly Option<bool> _skipInvalid = CommonOptions.SkipInvalid();
    private readonly Option<bool> _noAdjust = new("--no-adjust") { Description = "Take the network estimate from the data as given, without the suspect procedure (faster on large networks; no suspect marks)." };

    /// <summary>Builds the command bound to <paramref name="context"/>.</summary>
    public Command Build(CommandContext context)
    {
        var command = new Command("routes", "Find every minimal route from the measurements to a target reaction, with exact factors, values and propagated uncertainties.")
        {
            _network, _target, _property, _maxSteps, _top, _explain, _timeBudget, _temperature, _json, _skipInvalid, _noAdjust,
        };
        command.SetAction(parse => Run(
            parse.GetValue(_network)!,
            parse.GetValue(_target)!,
            parse.GetValue(_property)!,
            parse.GetValue(_maxSteps),
            parse.GetValue(_top),
            parse.GetValue(_explain),
            parse.GetValue(_timeBudget),
            parse.GetValue(_temperature),
            parse.GetValue(_json),
            parse.GetValue(_skipInvalid),
            context,
            parse.GetValue(_noAdjust)));
        return command;
    }

    /// <summary>Runs the search; exit 0 when a route exists, 1 when none does, 2 for bad input.</summary>
    public static int Run(string path, string targetText, string propertyCode, int maxSteps, int top, int explain, double timeBudget, double? temperature, bool json, bool skipInvalid, CommandContext context, bool noAdjust = false)
    {
        ArgumentNullException.ThrowIfNull(context);
        ThermoProperty property = OptionParsing.Property(propertyCode);
        OptionParsing.InRange(maxSteps, 1, OptionRanges.MaxSteps, "--max-steps", "measurements per route");
        OptionParsing.InRange(top, 1, OptionRanges.MaxListed, "--top", "routes listed");
        OptionParsing.InRange(explain, 0, OptionRanges.MaxExplained, "--explain", "routes spelled out");
        OptionParsing.AboveAndAtMost(timeBudget, 0, OptionRanges.MaxTimeBudgetSeconds, "--time-budget", "seconds; at most one day");
        if (temperature is { } t)
        {
            OptionParsing.Temperature(t);
        }

        AnalysisSession? session = AnalysisSession.Open(path, context, skipInvalid, out int exitCode);
        if (session is null)
        {
            return exitCode;
        }

        ChemicalEquation target = OptionParsing.Target(targetText, session.Network);
        PropertyFamily family = PropertyFamilies.FamilyOf(property);

        // One joint solution serves the estimate beside the routes and the values at another temperature.
        NetworkSolutions solutions = session.Solutions(adjust: !noAdjust);
        PropertyModel model = session.Model(family);
        RouteReport report = RouteAnalysis.Find(model, target, new RouteSearchOptions { MaxSteps = maxSteps, MaxRoutes = top, TimeBudget = TimeSpan.FromSeconds(timeBudget) }, solutions.DerivedEstimate(family, target));
        TargetConditions? atTemperature = temperature is { } kelvin ? TargetConditions.Evaluate(solutions, target, kelvin) : null;
        var suspects = (solutions.Report(family)?.SuspectIds ?? []).ToHashSet(StringComparer.Ordinal);
        RouteOutput.Write(context.Out, report, model, property, explain, atTemperature, json, suspects);
        if (report.Routes.Count == 0)
        {
            string why = report.UnreachableSpecies.Count > 0
                ? $"no route: no {family.ResultProperty().Code()} measurement contains {string.Join(", ", report.UnreachableSpecies.Select(species => species.Name))}"
                : report.Complete ? "no route: the measurements cannot be combined into the target" : $"no route found ({report.IncompleteReason})";
            context.Error.WriteLine(why);
            return ExitCodes.AnalysisProblem;
        }

        return ExitCodes.Success;
    }
}
