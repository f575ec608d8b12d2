using System.CommandLine;
using PathFinder.Analysis;
using PathFinder.Cli.Output;

namespace PathFinder.Cli.Commands;

/// <summary><c>pathfinder check &lt;network&gt;</c>: cycle closure, suspects with leave-one-out predictions, sources.</summary>
public sealed class CheckCommand
{
    private readonly Argument<string> _network = CommonOptions.Network();
    private readonly Option<double> _threshold = new("--threshold") { Description = "|z| above which a cycle, source or measurement is flagged, above 0 and at most 100 (default 2).", DefaultValueFactory = _ => 2.0 };
    private readonly Option<double> _inflation = new("--inflation") { Description = "Factor by which the suspect procedure enlarges an offending uncertainty per step, above 1 and at most 100 (default 2).", DefaultValueFactory = _ => 2.0 };
    private readonly Option<int> _maxCycle = new("--max-cycle") { Description = "Largest cycle enumerated, 1 to 64 measurements (default 6).", DefaultValueFactory = _ => 6 };
    private readonly Option<int> _showCycles = new("--show-cycles") { Description = "How many cycles to list, worst first, 0 to 100000 (default 10).", DefaultValueFactory = _ => 10 };
    private readonly Option<bool> _json = CommonOptions.Json();
    private readonly Option<bool> _skipInvalid = CommonOptions.SkipInvalid();

    /// <summary>Builds the command bound to <paramref name="context"/>.</summary>
    public Command Build(CommandContext context)
    {
        var command = new Command("check", "Test every cycle that should close to zero, rank the measurements and sources that break closure, and say what the rest of the network predicts.")
        {
            _network, _threshold, _inflation, _maxCycle, _showCycles, _json, _skipInvalid,
        };
        command.SetAction(parse => Run(
            parse.GetValue(_network)!,
            parse.GetValue(_threshold),
            parse.GetValue(_inflation),
            parse.GetValue(_maxCycle),
            parse.GetValue(_showCycles),
            parse.GetValue(_json),
            parse.GetValue(_skipInvalid),
            context));
        return command;
    }

    /// <summary>Runs the check; exit 0 when consistent, 1 when not, 2 for bad input.</summary>
    public static int Run(string path, double threshold, double inflation, int maxCycle, int showCycles, bool json, bool skipInvalid, CommandContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        OptionParsing.AboveAndAtMost(threshold, 0, OptionRanges.MaxThreshold, "--threshold", "a |z| in standard uncertainties");
        OptionParsing.AboveAndAtMost(inflation, 1, OptionRanges.MaxInflation, "--inflation", "the factor that enlarges an uncertainty per step");
        OptionParsing.InRange(maxCycle, 1, OptionRanges.MaxCycle, "--max-cycle", "measurements per cycle");
        OptionParsing.InRange(showCycles, 0, OptionRanges.MaxListed, "--show-cycles", "cycles listed");
        AnalysisSession? session = AnalysisSession.Open(path, context, skipInvalid, out int exitCode);
        if (session is null)
        {
            return exitCode;
        }

        var options = new ConsistencyOptions { Threshold = threshold, InflationFactor = inflation, MaxCycleSize = maxCycle };
        ConsistencyReport report = ConsistencyCheck.Run(session.Network, session.HeatCapacities, options, session.Systematics);
        if (json)
        {
            CheckOutput.WriteJson(context.Out, report);
        }
        else
        {
            CheckOutput.WriteText(context.Out, report, Math.Max(0, showCycles));
        }

        return report.Consistent ? ExitCodes.Success : ExitCodes.AnalysisProblem;
    }
}
