namespace PathFinder.Diagrams;

/// <summary>Fonts, sizes and the colour-blind-safe palette shared by all diagrams.</summary>
/// <remarks>Colours are from the Okabe–Ito palette; every colour cue is doubled by a line style, a line width or a marker
/// so that the pictures stay readable in greyscale.</remarks>
internal static class DiagramStyle
{
    public const string FontFamily = "'DejaVu Sans', Arial, Helvetica, sans-serif";
    public const double TitleSize = 16.0;
    public const double LabelSize = 13.0;
    public const double SmallSize = 11.0;
    public const double CaptionSize = 10.5;
    public const double Margin = 16.0;

    public const string Ink = "#1A1A1A";
    public const string Muted = "#555555";
    public const string Faint = "#8C8C8C";
    public const string Blue = "#0072B2";
    public const string BlueTint = "#DCEAF5";
    public const string Vermillion = "#D55E00";
    public const string Orange = "#E69F00";
    public const string OrangeTint = "#FCEBC7";
    public const string Green = "#009E73";
    public const string MeasurementFill = "#F2F2F2";

    /// <summary>The default caution printed under every diagram.</summary>
    public const string DefaultCaption = "Estimates from measured data; confirm by calorimetry before design use.";
}
