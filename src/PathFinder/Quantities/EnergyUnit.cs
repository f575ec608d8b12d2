namespace PathFinder.Quantities;

/// <summary>A unit of molar energy, molar entropy or a pure number, with its exact factor to the canonical unit.</summary>
/// <remarks>
/// Canonical units: kJ/mol for energies, J/(mol·K) for entropies. Per-particle units are converted with the
/// CODATA 2018 exact constants: 1 eV = e·N_A = 96.485 332 12... kJ/mol; 1 cm⁻¹ = h·c·(100 m⁻¹)·N_A =
/// 0.011 962 656 56... kJ/mol. The calorie is the thermochemical calorie, 4.184 J exactly (NIST SP 811).
/// </remarks>
/// <param name="Symbol">The symbol as printed, e.g. <c>kJ/mol</c>.</param>
/// <param name="Dimension">Energy or entropy.</param>
/// <param name="ToCanonical">Multiply a value in this unit by this to get the canonical unit.</param>
public sealed record EnergyUnit(string Symbol, UnitDimension Dimension, double ToCanonical)
{
    /// <summary>kJ/mol, the canonical energy unit.</summary>
    public static EnergyUnit KilojoulePerMole { get; } = new("kJ/mol", UnitDimension.MolarEnergy, 1.0);

    /// <summary>J/mol.</summary>
    public static EnergyUnit JoulePerMole { get; } = new("J/mol", UnitDimension.MolarEnergy, 1e-3);

    /// <summary>kcal/mol (thermochemical).</summary>
    public static EnergyUnit KilocaloriePerMole { get; } = new("kcal/mol", UnitDimension.MolarEnergy, PhysicalConstants.ThermochemicalCalorie);

    /// <summary>cal/mol (thermochemical).</summary>
    public static EnergyUnit CaloriePerMole { get; } = new("cal/mol", UnitDimension.MolarEnergy, PhysicalConstants.ThermochemicalCalorie * 1e-3);

    /// <summary>Electronvolt per particle.</summary>
    public static EnergyUnit ElectronVolt { get; } = new("eV", UnitDimension.MolarEnergy, PhysicalConstants.ElementaryCharge * PhysicalConstants.Avogadro * 1e-3);

    /// <summary>Wavenumber per particle, cm⁻¹.</summary>
    public static EnergyUnit Wavenumber { get; } = new("cm-1", UnitDimension.MolarEnergy, PhysicalConstants.Planck * PhysicalConstants.SpeedOfLight * 100.0 * PhysicalConstants.Avogadro * 1e-3);

    /// <summary>J/(mol·K), the canonical entropy unit.</summary>
    public static EnergyUnit JoulePerMoleKelvin { get; } = new("J/(mol·K)", UnitDimension.MolarEntropy, 1.0);

    /// <summary>cal/(mol·K) (thermochemical), also called the entropy unit (e.u.).</summary>
    public static EnergyUnit CaloriePerMoleKelvin { get; } = new("cal/(mol·K)", UnitDimension.MolarEntropy, PhysicalConstants.ThermochemicalCalorie);

    /// <summary>kJ/(mol·K).</summary>
    public static EnergyUnit KilojoulePerMoleKelvin { get; } = new("kJ/(mol·K)", UnitDimension.MolarEntropy, 1000.0);

    /// <summary>The unit of a pure number (ln K, log₁₀ K), written <c>1</c> or left empty.</summary>
    public static EnergyUnit Dimensionless { get; } = new("1", UnitDimension.Dimensionless, 1.0);

    private static readonly Dictionary<string, EnergyUnit> Aliases = BuildAliases();

    /// <summary>The symbols accepted in data, one per unit, for messages.</summary>
    public static IReadOnlyList<string> AcceptedSymbols { get; } =
        ["kJ/mol", "J/mol", "kcal/mol", "cal/mol", "eV", "cm-1", "J/(mol·K)", "cal/(mol·K)", "kJ/(mol·K)", "1"];

    /// <summary>Reads a unit symbol; spaces, case of "mol", "·", "*", "-1" exponents and ⁻¹ are tolerated.</summary>
    public static bool TryParse(string text, out EnergyUnit unit) => Aliases.TryGetValue(Normalise(text), out unit!);

    /// <summary>Converts a value in this unit to the canonical unit.</summary>
    public double ToCanonicalValue(double value) => value * ToCanonical;

    /// <summary>Converts a canonical value to this unit.</summary>
    public double FromCanonicalValue(double value) => value / ToCanonical;

    /// <inheritdoc/>
    public override string ToString() => Symbol;

    private static string Normalise(string text) =>
        text.Trim()
            .Replace(" ", "", StringComparison.Ordinal)
            .Replace("·", "", StringComparison.Ordinal)
            .Replace("*", "", StringComparison.Ordinal)
            .Replace("⁻¹", "-1", StringComparison.Ordinal)
            .Replace("^-1", "-1", StringComparison.Ordinal)
            .Replace("(", "", StringComparison.Ordinal)
            .Replace(")", "", StringComparison.Ordinal)
            .ToLowerInvariant();

    private static Dictionary<string, EnergyUnit> BuildAliases()
    {
        var table = new Dictionary<string, EnergyUnit>(StringComparer.Ordinal);
        void Add(EnergyUnit unit, params string[] names)
        {
            foreach (string name in names)
            {
                table[Normalise(name)] = unit;
            }
        }

        Add(KilojoulePerMole, "kJ/mol", "kJ mol-1", "kJmol-1");
        Add(JoulePerMole, "J/mol", "J mol-1");
        Add(KilocaloriePerMole, "kcal/mol", "kcal mol-1");
        Add(CaloriePerMole, "cal/mol", "cal mol-1");
        Add(ElectronVolt, "eV");
        Add(Wavenumber, "cm-1", "1/cm", "cm^-1", "cm⁻¹");
        Add(JoulePerMoleKelvin, "J/(mol·K)", "J/mol/K", "J/(mol K)", "J/K/mol", "J mol-1 K-1", "J/(K·mol)", "J/molK");
        Add(CaloriePerMoleKelvin, "cal/(mol·K)", "cal/mol/K", "cal/K/mol", "cal mol-1 K-1", "e.u.", "eu");
        Add(KilojoulePerMoleKelvin, "kJ/(mol·K)", "kJ/mol/K", "kJ/K/mol", "kJ mol-1 K-1");
        Add(Dimensionless, "1");
        return table;
    }
}
