using Fractions;

namespace PathFinder.Chemistry;

/// <summary>The reference state of each element at 298.15 K and 1 bar, from which formation reactions start.</summary>
/// <remarks>
/// <para>Diatomic gases H2, N2, O2, F2, Cl2 (and D2, T2); Br2(l); I2(cr); Hg(l); C(cr,graphite); S(cr,rhombic);
/// Sn(cr,white); the noble gases as monatomic gases; every other element as its crystalline solid.</para>
/// <para>Phosphorus: white phosphorus, P(cr,white), following the convention of the CODATA Key Values
/// (1989) and NBS tables, even though red phosphorus is more stable; data built on the red form must be
/// converted before use.</para>
/// <para>Ions: by convention ΔfH°, ΔfG° and S° of H+(aq) are zero, so the formation of an aqueous ion
/// Xᶻ is written with z H+(aq) and z/2 H2(g); a gaseous ion's formation is written with z electrons e-
/// (the electron convention, ΔfH°(e-) = 0).</para>
/// </remarks>
public static class ReferenceStates
{
    private static readonly Dictionary<string, Species> ByElement = Build();

    /// <summary>The hydrogen ion in water, whose formation properties are zero by convention.</summary>
    public static Species AqueousProton { get; } = Species.Parse("H+(aq)");

    /// <summary>The electron, whose formation properties are zero by convention.</summary>
    public static Species Electron { get; } = Species.Parse("e-");

    /// <summary>All element reference species.</summary>
    public static IEnumerable<Species> All => ByElement.Values;

    /// <summary>The reference species of an element (H2(g) for H, C(cr,graphite) for C).</summary>
    public static Species Of(string elementSymbol) =>
        ByElement.TryGetValue(elementSymbol, out Species? species)
            ? species
            : throw new ArgumentException($"'{elementSymbol}' is not an element symbol", nameof(elementSymbol));

    /// <summary>Whether <paramref name="species"/> is an element in its reference state.</summary>
    public static bool IsElementReference(Species species)
    {
        ArgumentNullException.ThrowIfNull(species);
        if (species.Formula.Composition.Count != 1 || species.Formula.Charge != 0 || species.Label.Length > 0)
        {
            return false;
        }

        string symbol = species.Formula.Composition.Keys.First();
        return ByElement.TryGetValue(symbol, out Species? reference) && reference.Equals(species);
    }

    /// <summary>Whether the formation properties (ΔfH°, ΔfG°) of <paramref name="species"/> are zero by definition or convention.</summary>
    public static bool HasZeroFormationProperties(Species species) =>
        IsElementReference(species) || species.Equals(AqueousProton) || species.Equals(Electron);

    /// <summary>How many atoms of the element one formula unit of its reference species holds (2 for O2, 1 for C).</summary>
    public static int AtomsPerUnit(string elementSymbol) => (int)Of(elementSymbol).Formula.CountOf(elementSymbol).Numerator;

    private static Dictionary<string, Species> Build()
    {
        var table = new Dictionary<string, Species>(StringComparer.Ordinal);
        string[] diatomicGases = ["H", "D", "T", "N", "O", "F", "Cl"];
        string[] nobleGases = ["He", "Ne", "Ar", "Kr", "Xe", "Rn", "Og"];
        foreach (Element element in ElementTable.All)
        {
            string symbol = element.Symbol;
            string text = symbol switch
            {
                _ when diatomicGases.Contains(symbol) => $"{symbol}2(g)",
                _ when nobleGases.Contains(symbol) => $"{symbol}(g)",
                "Br" => "Br2(l)",
                "I" => "I2(cr)",
                "Hg" => "Hg(l)",
                "C" => "C(cr,graphite)",
                "S" => "S(cr,rhombic)",
                "P" => "P(cr,white)",
                "Sn" => "Sn(cr,white)",
                _ => $"{symbol}(cr)",
            };
            table[symbol] = Species.Parse(text);
        }

        return table;
    }

    /// <summary>The signed terms of the formation reaction of <paramref name="species"/> (products positive).</summary>
    internal static List<EquationTerm> FormationTerms(Species species)
    {
        var terms = new List<EquationTerm> { new(species, Fraction.One) };
        Fraction hydrogenAtoms = Fraction.Zero;
        foreach (KeyValuePair<string, Fraction> pair in species.Formula.Composition)
        {
            if (pair.Key == "H")
            {
                hydrogenAtoms += pair.Value;
                continue;
            }

            terms.Add(new EquationTerm(Of(pair.Key), -pair.Value / AtomsPerUnit(pair.Key)));
        }

        int charge = species.Formula.Charge;
        if (charge != 0 && species.State.Phase == Phase.Aqueous)
        {
            // X^z(aq): elements + z H+(aq) -> X^z(aq) + z/2 H2(g).
            terms.Add(new EquationTerm(AqueousProton, new Fraction(-charge)));
            hydrogenAtoms -= charge;
        }
        else if (charge != 0)
        {
            // X^z(g): elements -> X^z(g) + z e-.
            terms.Add(new EquationTerm(Electron, new Fraction(charge)));
        }

        if (!hydrogenAtoms.IsZero)
        {
            terms.Add(new EquationTerm(Of("H"), -hydrogenAtoms / 2));
        }

        return terms;
    }
}
