using System.Globalization;

namespace PathFinder.Cli.Output;

/// <summary>Number and text formatting shared by the commands' text output (invariant culture).</summary>
public static class Text
{
    /// <summary>The caution printed under every derived value.</summary>
    public const string Caution =
        "Caution: derived values are estimates from the data given. Confirm by calorimetry before design or hazard use; local codes and licensed practice govern.";

    /// <summary>A value with a fixed number of decimals, or "—" when not finite.</summary>
    public static string Number(double value, int decimals = 2) =>
        double.IsFinite(value) ? value.ToString("F" + decimals.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture) : "—";

    /// <summary>A signed value with a fixed number of decimals.</summary>
    public static string Signed(double value, int decimals = 2) =>
        double.IsFinite(value) ? (value >= 0 ? "+" : "") + Number(value, decimals) : "—";

    /// <summary>"value ± u unit".</summary>
    public static string WithUncertainty(double value, double uncertainty, string unit, int decimals = 2) =>
        $"{Number(value, decimals)} ± {Number(uncertainty, decimals)} {unit}";

    /// <summary>Pads or cuts text to a width.</summary>
    public static string Fit(string text, int width) =>
        text.Length <= width ? text.PadRight(width) : text[..Math.Max(0, width - 1)] + "…";
}
