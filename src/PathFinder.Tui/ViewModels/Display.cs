using System.Globalization;

namespace PathFinder.Tui.ViewModels;

/// <summary>Culture-invariant formatting of values for the screens; "—" stands for anything not available.</summary>
public static class Display
{
    /// <summary>Shown where the analysis gives no number.</summary>
    public const string NotAvailable = "—";

    /// <summary>Formats <c>value ± uncertainty</c> with two significant digits of uncertainty.</summary>
    /// <remarks>Two significant digits in the uncertainty is common practice (no source); the value gets the same decimals.</remarks>
    public static string ValueWithUncertainty(double? value, double? uncertainty)
    {
        if (value is not { } v)
        {
            return NotAvailable;
        }

        if (uncertainty is not { } u || !double.IsFinite(u) || u <= 0.0)
        {
            return Number(v, 4);
        }

        int decimals = Math.Clamp(1 - (int)Math.Floor(Math.Log10(u)), 0, 6);
        return $"{Number(v, decimals)} ± {Number(u, decimals)}";
    }

    /// <summary>Formats a number with fixed decimals, or "—".</summary>
    public static string Number(double? value, int decimals) =>
        value is { } v ? v.ToString("F" + decimals.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture) : NotAvailable;

    /// <summary>Formats a dimensionless z or normalized residual with two decimals, or "—".</summary>
    public static string Z(double? value) => value is { } v ? v.ToString("+0.00;-0.00;0.00", CultureInfo.InvariantCulture) : NotAvailable;

    /// <summary>Formats a count.</summary>
    public static string Count(int? value) => value is { } v ? v.ToString(CultureInfo.InvariantCulture) : NotAvailable;
}
