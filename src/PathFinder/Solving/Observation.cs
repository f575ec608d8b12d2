namespace PathFinder.Solving;

/// <summary>One measured linear combination of the unknowns: aᵀx = value ± uncertainty.</summary>
/// <remarks>
/// The uncertainty u is a standard uncertainty (one standard deviation) in the same unit as the value; the
/// weight in the least-squares objective is w = 1/u².
/// </remarks>
public sealed class Observation
{
    /// <summary>Creates an observation.</summary>
    /// <exception cref="ArgumentOutOfRangeException">The value is not finite, the uncertainty not finite and positive, or the row is empty.</exception>
    public Observation(SparseRow row, double value, double uncertainty)
    {
        ArgumentNullException.ThrowIfNull(row);
        if (row.Count == 0)
        {
            throw new ArgumentOutOfRangeException(nameof(row), "An observation must involve at least one unknown.");
        }

        if (!double.IsFinite(value))
        {
            throw new ArgumentOutOfRangeException(nameof(value), value, "The value must be finite.");
        }

        if (!double.IsFinite(uncertainty) || uncertainty <= 0.0)
        {
            throw new ArgumentOutOfRangeException(nameof(uncertainty), uncertainty, "The uncertainty must be finite and positive.");
        }

        Row = row;
        Value = value;
        Uncertainty = uncertainty;
    }

    /// <summary>The design row a (which unknowns, with which coefficients).</summary>
    public SparseRow Row { get; }

    /// <summary>The measured value v.</summary>
    public double Value { get; }

    /// <summary>The standard uncertainty u &gt; 0.</summary>
    public double Uncertainty { get; }

    /// <summary>The weight w = 1/u².</summary>
    public double Weight => 1.0 / (Uncertainty * Uncertainty);

    /// <summary>Returns a copy with another uncertainty.</summary>
    public Observation WithUncertainty(double uncertainty) => new(Row, Value, uncertainty);
}
