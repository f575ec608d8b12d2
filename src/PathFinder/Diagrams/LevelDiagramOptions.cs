namespace PathFinder.Diagrams;

/// <summary>Settings for enthalpy-level (route) and cycle-closure diagrams.</summary>
public sealed record LevelDiagramOptions
{
    /// <summary>Decimals printed for values (default 1, i.e. 0.1 kJ/mol).</summary>
    /// <remarks>A value printed with an uncertainty gets more decimals when the uncertainty would otherwise round to
    /// zero: "−285.83 ± 0.04", not "−285.8 ± 0.0".</remarks>
    public int Decimals { get; init; } = 1;

    /// <summary>Height of the value span on the energy axis, in SVG units (default 340).</summary>
    public double PlotHeight { get; init; } = 340.0;

    /// <summary>A cycle fails to close when |z| exceeds this (default 2.0, about 95 % two-sided; common practice, no source).</summary>
    public double ZThreshold { get; init; } = 2.0;

    /// <summary>Caution line under the drawing.</summary>
    public string Caption { get; init; } = DiagramStyle.DefaultCaption;
}
