using PathFinder.Quantities;
using PathFinder.Tui.Analysis;

namespace PathFinder.Tui.ViewModels;

/// <summary>The species list: best estimate ± u and how many measurements touch each species.</summary>
public sealed class SpeciesViewModel
{
    private readonly ExplorerViewModel _owner;

    internal SpeciesViewModel(ExplorerViewModel owner) => _owner = owner;

    /// <summary>The column headers.</summary>
    public static IReadOnlyList<string> Headers { get; } = ["species", "key", "property", "best estimate ± u", "measurements"];

    /// <summary>The estimates shown, in network order.</summary>
    public IReadOnlyList<SpeciesEstimate> Rows => _owner.Analysis?.Species ?? [];

    /// <summary>The cells of one row.</summary>
    public static IReadOnlyList<string> Cells(SpeciesEstimate estimate)
    {
        ArgumentNullException.ThrowIfNull(estimate);
        return
        [
            estimate.Species.Name,
            estimate.Species.Key,
            PropertyName(estimate.Property),
            Display.ValueWithUncertainty(estimate.Value, estimate.Uncertainty),
            Display.Count(estimate.MeasurementCount),
        ];
    }

    /// <summary>The name of an estimated property with its unit, e.g. "ΔfH° kJ/mol" or "S° J/(mol·K)".</summary>
    public static string PropertyName(ThermoProperty property) => property switch
    {
        ThermoProperty.Enthalpy => $"ΔfH° {property.CanonicalUnit().Symbol}",
        ThermoProperty.GibbsEnergy => $"ΔfG° {property.CanonicalUnit().Symbol}",
        ThermoProperty.InternalEnergy => $"ΔfU° {property.CanonicalUnit().Symbol}",
        ThermoProperty.Entropy => $"ΔfS° {property.CanonicalUnit().Symbol}",
        _ => $"{property.Symbol()} {property.CanonicalUnit().Symbol}",
    };

    /// <summary>The table as shown (for export).</summary>
    public TableSnapshot Snapshot() => new("Species", Headers, Rows.Select(Cells).ToArray(), [4]);
}
