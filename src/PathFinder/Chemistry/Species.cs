namespace PathFinder.Chemistry;

/// <summary>A chemical species: a formula in a physical state, with an optional label that tells isomers apart.</summary>
/// <remarks>
/// Identity is the composition (Hill notation with charge), the state and the label, so <c>C2H5OH(l)</c> and
/// <c>CH3CH2OH(l)</c> are one species while ethanol and dimethyl ether need labels (declared in
/// <c>species.csv</c>). <see cref="Name"/> is the formula as first written in the data with the state in its
/// canonical short form (<c>NH3(gas)</c> is shown as <c>NH3(g)</c>), or the key declared in <c>species.csv</c>.
/// </remarks>
public sealed class Species : IEquatable<Species>
{
    // Species key every dictionary of a network; the key never changes, so its hash is computed once.
    private readonly int _hashCode;

    private Species(Formula formula, PhysicalState state, string label, string name, string description)
    {
        Description = description;
        Formula = formula;
        State = state;
        Label = label;
        Name = name;
        Key = label.Length > 0 ? $"{formula.HillNotation}({state})[{label}]" : $"{formula.HillNotation}({state})";
        _hashCode = StringComparer.Ordinal.GetHashCode(Key);
    }

    /// <summary>The formula.</summary>
    public Formula Formula { get; }

    /// <summary>The physical state.</summary>
    public PhysicalState State { get; }

    /// <summary>The isomer label (a key from <c>species.csv</c>), or empty.</summary>
    public string Label { get; }

    /// <summary>How the species is shown: the formula as written in the data and the canonical state, e.g. <c>CH3OH(l)</c>, or its declared key.</summary>
    public string Name { get; }

    /// <summary>A descriptive name declared in <c>species.csv</c> (e.g. "dimethyl ether"), or empty.</summary>
    public string Description { get; }

    /// <summary>The canonical identity, e.g. <c>CH4O(l)</c> or <c>C2H6O(g)[DME]</c>.</summary>
    public string Key { get; }

    /// <summary>Whether the species is a gas (it counts towards Δn(gas) in ΔU → ΔH).</summary>
    public bool IsGas => State.Phase == Phase.Gas;

    /// <summary>Creates a species; <paramref name="name"/> defaults to the formula as written plus its state.</summary>
    public static Species Create(Formula formula, PhysicalState state, string label = "", string? name = null, string description = "")
    {
        ArgumentNullException.ThrowIfNull(formula);
        ArgumentNullException.ThrowIfNull(label);
        ArgumentNullException.ThrowIfNull(description);
        return new Species(formula, state, label, name ?? $"{formula.Text}({state})", description);
    }

    /// <summary>Reads a species such as <c>CH4(g)</c> (throws on bad input; use <see cref="SpeciesParser"/> to get a located failure).</summary>
    public static Species Parse(string text) => SpeciesParser.Parse(text).Value;

    /// <summary>The same species shown under another name (identity unchanged).</summary>
    public Species WithName(string name) => new(Formula, State, Label, name, Description);

    /// <inheritdoc/>
    public bool Equals(Species? other) => other is not null && (ReferenceEquals(this, other) || (_hashCode == other._hashCode && Key == other.Key));

    /// <inheritdoc/>
    public override bool Equals(object? obj) => Equals(obj as Species);

    /// <inheritdoc/>
    public override int GetHashCode() => _hashCode;

    /// <inheritdoc/>
    public override string ToString() => Name;
}
