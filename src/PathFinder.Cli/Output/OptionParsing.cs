using System.Globalization;
using PathFinder.Analysis;
using PathFinder.Chemistry;
using PathFinder.Diagnostics;
using PathFinder.Quantities;

namespace PathFinder.Cli.Output;

/// <summary>Checks of option values that the command-line parser cannot express; failures become exit code 2.</summary>
public static class OptionParsing
{
    /// <summary>Reads a property code such as dH into its family.</summary>
    public static ThermoProperty Property(string code)
    {
        if (!ThermoProperties.TryParse(code, out ThermoProperty property) || property == ThermoProperty.AbsoluteEntropy)
        {
            throw new UserInputException($"--property '{code}' is not one of dH, dG, dS, dU");
        }

        return property.IsEquilibriumConstant()
            ? throw new UserInputException($"--property '{code}': results are given as ΔG: use --property dG (routes --temperature T also gives K)")
            : property;
    }

    /// <summary>Reads a target against the network, with a caret under the problem when it fails.</summary>
    public static ChemicalEquation Target(string text, ReactionNetwork network)
    {
        ParseResult<ChemicalEquation> target = TargetReaction.Parse(text, network);
        if (!target.TryGetValue(out ChemicalEquation? equation))
        {
            throw new UserInputException(TargetReaction.Describe(text, target.Failure));
        }

        return equation;
    }

    /// <summary>Requires a whole number from <paramref name="min"/> to <paramref name="max"/>; the message gives the range and <paramref name="why"/> (what the upper bound protects).</summary>
    public static int InRange(int value, int min, int max, string option, string why) =>
        value >= min && value <= max
            ? value
            : throw new UserInputException(string.Create(CultureInfo.InvariantCulture, $"{option} must be a whole number from {min:N0} to {max:N0}, not {value:N0} ({why})"));

    /// <summary>Requires a finite number from <paramref name="min"/> to <paramref name="max"/> (both included).</summary>
    public static double InRange(double value, double min, double max, string option, string why) =>
        double.IsFinite(value) && value >= min && value <= max
            ? value
            : throw new UserInputException(string.Create(CultureInfo.InvariantCulture, $"{option} must be a number from {min:G} to {max:G}, not {value:G} ({why})"));

    /// <summary>Requires a finite number above <paramref name="above"/> and at most <paramref name="max"/>.</summary>
    public static double AboveAndAtMost(double value, double above, double max, string option, string why) =>
        double.IsFinite(value) && value > above && value <= max
            ? value
            : throw new UserInputException(string.Create(CultureInfo.InvariantCulture, $"{option} must be a number above {above:G} and at most {max:G}, not {value:G} ({why})"));

    /// <summary>Requires a positive whole number.</summary>
    public static int Positive(int value, string option) =>
        value > 0 ? value : throw new UserInputException($"{option} must be a positive whole number, not {value}");

    /// <summary>Requires a positive finite number.</summary>
    public static double Positive(double value, string option) =>
        double.IsFinite(value) && value > 0 ? value : throw new UserInputException($"{option} must be a positive number");

    /// <summary>Requires a temperature in kelvin within the range accepted for data (1 to 10000 K, <see cref="AcceptedRanges"/>).</summary>
    public static double Temperature(double kelvin, string option = "--temperature") =>
        InRange(kelvin, AcceptedRanges.MinTemperature, AcceptedRanges.MaxTemperature, option, "in kelvin, the range accepted for data");
}
