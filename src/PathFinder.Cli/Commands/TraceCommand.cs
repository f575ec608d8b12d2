using System.CommandLine;
using PathFinder.Analysis;
using PathFinder.Chemistry;
using PathFinder.Cli.Output;
using PathFinder.Quantities;

namespace PathFinder.Cli.Commands;

/// <summary><c>pathfinder trace &lt;network&gt; --target "…"</c>: which measurements and sources a network estimate rests on.</summary>
public sealed class TraceCommand
{
    private readonly Argument<string> _network = CommonOptions.Network();
    private readonly Option<string> _target = CommonOptions.Target();
    private readonly Option<string> _property = CommonOptions.Property();
    private readonly Option<int> _top = new("--top") { Description = "How many measurements to list, largest share first, 1 to 100000 (default 10).", DefaultValueFactory = _ => 10 };
    private readonly Option<bool> _noAdjust = new("--no-adjust") { Description = "Trace the solve of the data as given, without the suspect procedure." };
    private readonly Option<bool> _json = CommonOptions.Json();
    private readonly Option<bool> _skipInvalid = CommonOptions.SkipInvalid();

    /// <summary>Builds the command bound to <paramref name="context"/>.</summary>
    public Command Build(CommandContext context)
    {
        var command = new Command("trace", "Show where the network estimate of a target comes from: each measurement's sensitivity and share of the variance, and the sources that dominate.")
        {
            _network, _target, _property, _top, _noAdjust, _json, _skipInvalid,
        };
        command.SetAction(parse => Run(
            parse.GetValue(_network)!,
            parse.GetValue(_target)!,
            parse.GetValue(_property)!,
            parse.GetValue(_top),
            parse.GetValue(_noAdjust),
            parse.GetValue(_json),
            parse.GetValue(_skipInvalid),
            context));
        return command;
    }

    /// <summary>Runs the trace; exit 0 when the data determine the target, 1 when they do not, 2 for bad input.</summary>
    public static int Run(string path, string targetText, string propertyCode, int top, bool noAdjust, bool json, bool skipInvalid, CommandContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        ThermoProperty property = OptionParsing.Property(propertyCode);
        OptionParsing.InRange(top, 1, OptionRanges.MaxListed, "--top", "measurements listed");
        AnalysisSession? session = AnalysisSession.Open(path, context, skipInvalid, out int exitCode);
        if (session is null)
        {
            return exitCode;
        }

        ChemicalEquation target = OptionParsing.Target(targetText, session.Network);
        PropertyFamily family = PropertyFamilies.FamilyOf(property);
        NetworkSolutions solutions = session.Solutions(adjust: !noAdjust);
        SolveReport? report = solutions.Report(family);
        if (report is null)
        {
            context.Error.WriteLine($"not determined: the network has no data that bear on {family.ResultProperty().Code()}");
            return ExitCodes.AnalysisProblem;
        }

        ValueProvenance provenance = ValueProvenance.Trace(report, target);
        TraceOutput.Write(context.Out, provenance, property, report.Adjusted, top, json);
        if (!provenance.IsDetermined)
        {
            context.Error.WriteLine($"not determined: {provenance.Reason}");
            return ExitCodes.AnalysisProblem;
        }

        return ExitCodes.Success;
    }
}
