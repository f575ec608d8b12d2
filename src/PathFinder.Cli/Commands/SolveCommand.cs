using System.CommandLine;
using PathFinder.Analysis;
using PathFinder.Cli.Output;
using PathFinder.Quantities;

namespace PathFinder.Cli.Commands;

/// <summary><c>pathfinder solve &lt;network&gt;</c>: one self-consistent best set of species values (weighted least squares).</summary>
public sealed class SolveCommand
{
    private readonly Argument<string> _network = CommonOptions.Network();
    private readonly Option<string> _property = new("--property", "-p") { Description = "dH (default: ΔfH° from ΔH and ΔU data), dG (ΔfG°) or dS (S° from ΔS and S° data).", DefaultValueFactory = _ => "dH" };
    private readonly Option<bool> _noAdjust = new("--no-adjust") { Description = "Solve the data as given, without the suspect procedure." };
    private readonly Option<double> _threshold = new("--threshold") { Description = "|z| threshold of the suspect procedure, above 0 and at most 100 (default 2).", DefaultValueFactory = _ => 2.0 };
    private readonly Option<string> _format = new("--format", "-f") { Description = "table (default), csv, json or markdown.", DefaultValueFactory = _ => "table" };
    private readonly Option<bool> _json = new("--json") { Description = "Same as --format json." };
    private readonly Option<double?> _temperature = new("--temperature") { Description = "Also give every species' value at this temperature (1 to 10000 K), moved with the heat-capacity data (dH: ΔfH°, needs Cp of the species and its elements; dS: S°; dG: ΔfG° from ΔH and S° data)." };
    private readonly Option<string?> _covariance = new("--covariance") { Description = "Also write the covariance of the solved quantities to this CSV file (row,column,covariance; n² rows for n species)." };
    private readonly Option<bool> _force = new("--force") { Description = OutputPaths.ForceDescription };
    private readonly Option<bool> _skipInvalid = CommonOptions.SkipInvalid();

    /// <summary>Builds the command bound to <paramref name="context"/>.</summary>
    public Command Build(CommandContext context)
    {
        var command = new Command("solve", "Solve the network by weighted least squares: the best estimate and uncertainty of every species the data determine.")
        {
            _network, _property, _noAdjust, _threshold, _format, _json, _temperature, _covariance, _force, _skipInvalid,
        };
        _format.AcceptOnlyFromAmong("table", "csv", "json", "markdown");
        command.SetAction(parse => Run(
            parse.GetValue(_network)!,
            parse.GetValue(_property)!,
            parse.GetValue(_noAdjust),
            parse.GetValue(_threshold),
            parse.GetValue(_json) ? "json" : parse.GetValue(_format)!,
            parse.GetValue(_skipInvalid),
            context,
            parse.GetValue(_temperature),
            parse.GetValue(_covariance) is { } covariance ? new OutputFile(covariance, parse.GetValue(_force)) : null));
        return command;
    }

    /// <summary>Runs the solve; exit 0, or 2 for bad input.</summary>
    public static int Run(string path, string propertyCode, bool noAdjust, double threshold, string format, bool skipInvalid, CommandContext context, double? temperature = null, OutputFile? covariance = null)
    {
        ArgumentNullException.ThrowIfNull(context);
        ThermoProperty property = OptionParsing.Property(propertyCode);
        OptionParsing.AboveAndAtMost(threshold, 0, OptionRanges.MaxThreshold, "--threshold", "a |z| in standard uncertainties");
        if (temperature is { } t)
        {
            OptionParsing.Temperature(t);
        }

        if (covariance is not null)
        {
            OutputPaths.Check(covariance.Path, "--covariance", covariance.Force);
        }

        AnalysisSession? session = AnalysisSession.Open(path, context, skipInvalid, out int exitCode);
        if (session is null)
        {
            return exitCode;
        }

        PropertyFamily family = PropertyFamilies.FamilyOf(property);
        NetworkSolutions solutions = session.Solutions(adjust: !noAdjust, new ConsistencyOptions { Threshold = threshold });
        SolveReport report = solutions.Report(family)
            ?? throw new UserInputException(family switch
            {
                PropertyFamily.Enthalpy => "the network has no ΔH, ΔU, ΔG or K data: no ΔfH° to solve",
                PropertyFamily.Entropy => "the network has no S°, ΔS, ΔG or K data: no S° to solve",
                _ => "ΔfG° needs both ΔfH° and S°: the network has no data for one of them (give ΔG, K, or S° data beside ΔH)",
            });
        TemperatureTable? atTemperature = temperature is { } kelvin ? TemperatureTable.Evaluate(solutions, family, kelvin) : null;
        if (covariance is not null)
        {
            SolveOutput.WriteCovariance(covariance.Path, report, covariance.Force);
        }

        SolveOutput.Write(context.Out, report, format, atTemperature);
        return ExitCodes.Success;
    }
}
