using PathFinder.Chemistry;
using PathFinder.Diagnostics;
using PathFinder.Quantities;

namespace PathFinder;

/// <summary>One measured value of a reaction (or formation) property, with its standard uncertainty and provenance.</summary>
/// <remarks>
/// Values and uncertainties are held in canonical units (kJ/mol for energies, J/(mol·K) for entropies);
/// <see cref="Unit"/> records the unit the user wrote, for display. The uncertainty is a standard
/// uncertainty (k = 1): an expanded uncertainty in the data is divided by its coverage factor on reading.
/// </remarks>
public sealed record Measurement
{
    /// <summary>The identifier from the data, unique within the network.</summary>
    public required string Id { get; init; }

    /// <summary>The equation measured; for <see cref="ThermoProperty.AbsoluteEntropy"/> a single species term.</summary>
    public required ChemicalEquation Equation { get; init; }

    /// <summary>The state function measured.</summary>
    public required ThermoProperty Property { get; init; }

    /// <summary>The value in the canonical unit.</summary>
    public required double Value { get; init; }

    /// <summary>The standard uncertainty (k = 1) in the canonical unit; always positive.</summary>
    public required double Uncertainty { get; init; }

    /// <summary>The unit the value was written in.</summary>
    public EnergyUnit Unit { get; init; } = EnergyUnit.KilojoulePerMole;

    /// <summary>The temperature of the measurement in K.</summary>
    public double Temperature { get; init; } = PhysicalConstants.StandardTemperature;

    /// <summary>The source (group, paper, notebook) the value comes from.</summary>
    public required string Source { get; init; }

    /// <summary>Where the row is in the data.</summary>
    public SourceLocation Location { get; init; }

    /// <summary>Extra columns of the row, kept as notes (column name to text).</summary>
    public IReadOnlyDictionary<string, string> Notes { get; init; } = new Dictionary<string, string>();

    /// <summary>The equation as written in the data.</summary>
    public string EquationText { get; init; } = "";

    /// <summary>The value converted back to the unit it was written in.</summary>
    public double ValueInOriginalUnit => Unit.FromCanonicalValue(Value);

    /// <inheritdoc/>
    public override string ToString() => $"{Id}: {Property.Code()} {Equation} = {Value:G6} ± {Uncertainty:G3}";
}
