using System.CommandLine;
using PathFinder.Analysis;
using PathFinder.Chemistry;
using PathFinder.Cli.Output;
using PathFinder.Quantities;

namespace PathFinder.Cli.Commands;

/// <summary><c>pathfinder plan &lt;network&gt; --target "…"</c>: which measurement would most reduce a target's uncertainty.</summary>
public sealed class PlanCommand
{
    private readonly Argument<string> _network = CommonOptions.Network();
    private readonly Option<string> _target = CommonOptions.Target();
    private readonly Option<string> _property = CommonOptions.Property();
    private readonly Option<double> _factor = new("--factor") { Description = "A re-measurement's uncertainty as a multiple of the current one, 0.001 to 1 (default 0.5).", DefaultValueFactory = _ => 0.5 };
    private readonly Option<double?> _uncertainty = new("--uncertainty") { Description = "An absolute uncertainty for every re-measurement, in the property's unit, 1e-6 to 1e5 (instead of --factor)." };
    private readonly Option<string[]> _candidate = new("--candidate", "-c") { Description = "A new reaction you could measure (repeatable); ranked with the generated ones.", AllowMultipleArgumentsPerToken = false };
    private readonly Option<double?> _candidateUncertainty = new("--candidate-uncertainty") { Description = "The uncertainty assumed for a new measurement, in the property's unit, 1e-6 to 1e5 (default: the median of the data's)." };
    private readonly Option<bool> _noGenerate = new("--no-generate") { Description = "Rank only the --candidate reactions; generate none near the target." };
    private readonly Option<int> _depth = new("--depth") { Description = "How many measurement steps from the target's species count as near, for generated candidates, 0 to 100 (default 2).", DefaultValueFactory = _ => 2 };
    private readonly Option<int> _top = new("--top") { Description = "How many options of each kind to list, 1 to 100000 (default 10).", DefaultValueFactory = _ => 10 };
    private readonly Option<bool> _noAdjust = new("--no-adjust") { Description = "Plan on the solve of the data as given, without the suspect procedure." };
    private readonly Option<bool> _json = CommonOptions.Json();
    private readonly Option<bool> _skipInvalid = CommonOptions.SkipInvalid();

    /// <summary>Builds the command bound to <paramref name="context"/>.</summary>
    public Command Build(CommandContext context)
    {
        var command = new Command("plan", "Rank experiments by how much they would cut a target's uncertainty: re-measuring existing data more precisely, or measuring new reactions near the target.")
        {
            _network, _target, _property, _factor, _uncertainty, _candidate, _candidateUncertainty, _noGenerate, _depth, _top, _noAdjust, _json, _skipInvalid,
        };
        command.SetAction(parse => Run(
            parse.GetValue(_network)!,
            parse.GetValue(_target)!,
            new PlanSettings(
                parse.GetValue(_property)!,
                parse.GetValue(_factor),
                parse.GetValue(_uncertainty),
                parse.GetValue(_candidate) ?? [],
                parse.GetValue(_candidateUncertainty),
                !parse.GetValue(_noGenerate),
                parse.GetValue(_depth),
                parse.GetValue(_top),
                !parse.GetValue(_noAdjust),
                parse.GetValue(_json),
                parse.GetValue(_skipInvalid)),
            context));
        return command;
    }

    /// <summary>Runs the planning; exit 0 when the data determine the target, 1 when they do not, 2 for bad input.</summary>
    public static int Run(string path, string targetText, PlanSettings settings, CommandContext context)
    {
        ArgumentNullException.ThrowIfNull(settings);
        ArgumentNullException.ThrowIfNull(context);
        ThermoProperty property = OptionParsing.Property(settings.Property);
        OptionParsing.InRange(settings.Factor, OptionRanges.MinFactor, 1, "--factor", "a multiple of the current uncertainty; a re-measurement is no worse");
        OptionParsing.InRange(settings.Top, 1, OptionRanges.MaxListed, "--top", "options listed");
        if (settings.Uncertainty is { } absolute)
        {
            OptionParsing.InRange(absolute, OptionRanges.MinUncertainty, OptionRanges.MaxUncertainty, "--uncertainty", "the range accepted for data");
        }

        if (settings.CandidateUncertainty is { } candidateUncertainty)
        {
            OptionParsing.InRange(candidateUncertainty, OptionRanges.MinUncertainty, OptionRanges.MaxUncertainty, "--candidate-uncertainty", "the range accepted for data");
        }

        OptionParsing.InRange(settings.Depth, 0, OptionRanges.MaxDepth, "--depth", "measurement steps");

        AnalysisSession? session = AnalysisSession.Open(path, context, settings.SkipInvalid, out int exitCode);
        if (session is null)
        {
            return exitCode;
        }

        ChemicalEquation target = OptionParsing.Target(targetText, session.Network);
        ChemicalEquation[] candidates = settings.Candidates.Select(text => Candidate(text, session.Network)).ToArray();
        PropertyFamily family = PropertyFamilies.FamilyOf(property);
        SolveReport? report = session.Solutions(settings.Adjust).Report(family);
        if (report is null)
        {
            context.Error.WriteLine($"not determined: the network has no data that bear on {family.ResultProperty().Code()}");
            return ExitCodes.AnalysisProblem;
        }

        ExperimentPlan plan = ExperimentPlan.Build(report, target, new ExperimentPlanOptions
        {
            UncertaintyFactor = settings.Factor,
            RemeasurementUncertainty = settings.Uncertainty,
            Candidates = candidates,
            CandidateUncertainty = settings.CandidateUncertainty,
            GenerateCandidates = settings.Generate,
            NeighbourhoodDepth = settings.Depth,
        });
        PlanOutput.Write(context.Out, plan, property, settings, report.Adjusted);
        if (!plan.IsDetermined)
        {
            context.Error.WriteLine($"not determined: {plan.Current.Reason}");
            return ExitCodes.AnalysisProblem;
        }

        return ExitCodes.Success;
    }

    private static ChemicalEquation Candidate(string text, ReactionNetwork network)
    {
        try
        {
            return OptionParsing.Target(text, network);
        }
        catch (UserInputException exception)
        {
            throw new UserInputException("--candidate: " + exception.Message, exception);
        }
    }
}
