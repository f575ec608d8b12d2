using System.Runtime.CompilerServices;
using System.Runtime.InteropServices;
using System.Text;
using Fractions;

namespace PathFinder.Chemistry;

/// <summary>A chemical equation as a set of signed terms (products positive, reactants negative), netted and exact.</summary>
/// <remarks>
/// Equations form a vector space over the rationals, which is what Hess's law uses: flipping an equation
/// negates it, scaling multiplies every coefficient, and summing adds terms, cancelling intermediates.
/// A species that appears on both sides is netted when the equation is built.
/// </remarks>
public sealed class ChemicalEquation
{
    private readonly EquationTerm[] _terms;

    [ThreadStatic]
    private static List<Species>? t_species;

    [ThreadStatic]
    private static List<Fraction>? t_sums;

    private ChemicalEquation(EquationTerm[] terms, bool isFormation)
    {
        _terms = terms;
        IsFormation = isFormation;
    }

    /// <summary>The netted terms, reactants first, each side in order of first appearance.</summary>
    public IReadOnlyList<EquationTerm> Terms => _terms;

    /// <summary>Whether this equation was written in the formation shorthand (a single species).</summary>
    public bool IsFormation { get; }

    /// <summary>The species formed, when <see cref="IsFormation"/> is true.</summary>
    public Species? FormedSpecies => IsFormation ? _terms.First(term => term.Coefficient > Fraction.Zero && !ReferenceStates.HasZeroFormationProperties(term.Species)).Species : null;

    /// <summary>Whether no species remains after netting.</summary>
    public bool IsEmpty => _terms.Length == 0;

    /// <summary>Builds an equation from signed terms, netting repeated species and dropping zero coefficients.</summary>
    public static ChemicalEquation FromTerms(IEnumerable<EquationTerm> terms) => FromTerms(terms, isFormation: false);

    /// <summary>The formation reaction of <paramref name="species"/> from its elements in their reference states.</summary>
    public static ChemicalEquation Formation(Species species)
    {
        ArgumentNullException.ThrowIfNull(species);
        return FromTerms(ReferenceStates.FormationTerms(species), isFormation: true);
    }

    /// <summary>Reads an equation (throws on bad input; use <see cref="EquationParser"/> for located failures).</summary>
    public static ChemicalEquation Parse(string text) => EquationParser.Parse(text).Value;

    /// <summary>The signed coefficient of <paramref name="species"/>, zero when absent.</summary>
    public Fraction CoefficientOf(Species species)
    {
        foreach (EquationTerm term in _terms)
        {
            if (term.Species.Equals(species))
            {
                return term.Coefficient;
            }
        }

        return Fraction.Zero;
    }

    /// <summary>This equation multiplied by <paramref name="factor"/> (a negative factor flips it).</summary>
    public ChemicalEquation Scale(Fraction factor) =>
        FromTerms(_terms.Select(term => term with { Coefficient = term.Coefficient * factor }));

    /// <summary>The sum of two equations; intermediates cancel.</summary>
    public ChemicalEquation Add(ChemicalEquation other)
    {
        ArgumentNullException.ThrowIfNull(other);
        return FromTerms(_terms.Concat(other._terms));
    }

    /// <summary>The change in moles of gas, Σ ν over gaseous species (used for ΔH = ΔU + Δn(gas)·R·T).</summary>
    public Fraction GasMoleChange()
    {
        Fraction total = Fraction.Zero;
        foreach (EquationTerm term in _terms)
        {
            if (term.Species.IsGas && !term.Species.Formula.IsElectron)
            {
                total += term.Coefficient;
            }
        }

        return total;
    }

    /// <summary>Checks element and charge balance; returns one message per imbalance, empty when balanced.</summary>
    /// <remarks>Messages spell the imbalance out: "left has 4 H, right has 2 H".</remarks>
    public IReadOnlyList<string> FindImbalances() => IsBalancedQuick() ? [] : ListImbalances();

    /// <summary>
    /// Whether Σ ν·count is zero for every element and for the charge, in checked 64-bit rationals; false when
    /// unbalanced or when a number does not fit, in which case <see cref="ListImbalances"/> decides exactly.
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveOptimization)]
    private bool IsBalancedQuick()
    {
        Span<long> numerators = stackalloc long[16];
        Span<long> denominators = stackalloc long[16];
        var symbols = new string[16];
        int count = 0;
        long charge = 0;
        long chargeDenominator = 1;
        try
        {
            foreach (EquationTerm term in _terms)
            {
                if (!SmallRational.TryFrom(term.Coefficient, out long nu, out long nuDenominator))
                {
                    return false;
                }

                Formula formula = term.Species.Formula;
                foreach (KeyValuePair<string, Fraction> pair in formula.CompositionSpan)
                {
                    if (!SmallRational.TryFrom(pair.Value, out long n, out long d))
                    {
                        return false;
                    }

                    int at = 0;
                    while (at < count && !string.Equals(symbols[at], pair.Key, StringComparison.Ordinal))
                    {
                        at++;
                    }

                    if (at == count)
                    {
                        if (count == symbols.Length)
                        {
                            return false;
                        }

                        symbols[at] = pair.Key;
                        numerators[at] = 0;
                        denominators[at] = 1;
                        count++;
                    }

                    (numerators[at], denominators[at]) = SmallRational.Add(numerators[at], denominators[at], nu * n, nuDenominator * d);
                }

                (charge, chargeDenominator) = SmallRational.Add(charge, chargeDenominator, nu * formula.Charge, nuDenominator);
            }
        }
        catch (OverflowException)
        {
            return false;
        }

        if (charge != 0)
        {
            return false;
        }

        for (int i = 0; i < count; i++)
        {
            if (numerators[i] != 0)
            {
                return false;
            }
        }

        return true;
    }

    private List<string> ListImbalances()
    {
        var left = new SortedDictionary<string, Fraction>(StringComparer.Ordinal);
        var right = new SortedDictionary<string, Fraction>(StringComparer.Ordinal);
        Fraction leftCharge = Fraction.Zero;
        Fraction rightCharge = Fraction.Zero;
        foreach (EquationTerm term in _terms)
        {
            bool product = term.Coefficient > Fraction.Zero;
            Fraction amount = product ? term.Coefficient : -term.Coefficient;
            SortedDictionary<string, Fraction> side = product ? right : left;
            foreach (KeyValuePair<string, Fraction> pair in term.Species.Formula.Composition)
            {
                side[pair.Key] = side.GetValueOrDefault(pair.Key, Fraction.Zero) + (amount * pair.Value);
            }

            if (product)
            {
                rightCharge += amount * term.Species.Formula.Charge;
            }
            else
            {
                leftCharge += amount * term.Species.Formula.Charge;
            }
        }

        var problems = new List<string>();
        foreach (string element in left.Keys.Union(right.Keys).OrderBy(symbol => symbol, StringComparer.Ordinal))
        {
            Fraction l = left.GetValueOrDefault(element, Fraction.Zero);
            Fraction r = right.GetValueOrDefault(element, Fraction.Zero);
            if (l != r)
            {
                problems.Add($"left has {RationalText.Format(l)} {element}, right has {RationalText.Format(r)} {element}");
            }
        }

        if (leftCharge != rightCharge)
        {
            problems.Add($"left has charge {SignedCharge(leftCharge)}, right has charge {SignedCharge(rightCharge)}");
        }

        return problems;
    }

    /// <summary>Formats as <c>CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)</c>.</summary>
    public override string ToString()
    {
        var text = new StringBuilder();
        AppendSide(text, _terms.Where(term => term.Coefficient < Fraction.Zero), negate: true);
        text.Append(" -> ");
        AppendSide(text, _terms.Where(term => term.Coefficient > Fraction.Zero), negate: false);
        return text.ToString();
    }

    private static string SignedCharge(Fraction charge) =>
        charge > Fraction.Zero ? "+" + RationalText.Format(charge) : RationalText.Format(charge);

    private static void AppendSide(StringBuilder text, IEnumerable<EquationTerm> terms, bool negate)
    {
        bool first = true;
        foreach (EquationTerm term in terms)
        {
            if (!first)
            {
                text.Append(" + ");
            }

            Fraction amount = negate ? -term.Coefficient : term.Coefficient;
            if (amount != Fraction.One)
            {
                text.Append(RationalText.Format(amount)).Append(' ');
            }

            text.Append(term.Species.Name);
            first = false;
        }

        if (first)
        {
            text.Append('0');
        }
    }

    private static ChemicalEquation FromTerms(IEnumerable<EquationTerm> terms, bool isFormation) =>
        terms switch
        {
            EquationTerm[] array => FromTerms(array, isFormation),
            List<EquationTerm> list => FromTerms(CollectionsMarshal.AsSpan(list), isFormation),
            _ => FromTerms(terms.ToArray(), isFormation),
        };

    /// <summary>Builds an equation from signed terms held by the caller (the parser's reused buffer).</summary>
    internal static ChemicalEquation FromTerms(ReadOnlySpan<EquationTerm> terms) => FromTerms(terms, isFormation: false);

    private static ChemicalEquation FromTerms(ReadOnlySpan<EquationTerm> terms, bool isFormation)
    {
        // Reused per thread: every equation read passes here, and nothing in here comes back to this method.
        List<Species> species = t_species ??= new List<Species>(16);
        List<Fraction> sums = t_sums ??= new List<Fraction>(16);
        species.Clear();
        sums.Clear();
        // Equations are short: species are matched by a linear scan, and a dictionary is only built for long sums.
        Dictionary<Species, int>? index = null;
        foreach (EquationTerm term in terms)
        {
            int at = -1;
            if (index is not null)
            {
                at = index.GetValueOrDefault(term.Species, -1);
            }
            else
            {
                for (int i = 0; i < species.Count; i++)
                {
                    if (species[i].Equals(term.Species))
                    {
                        at = i;
                        break;
                    }
                }
            }

            if (at < 0)
            {
                species.Add(term.Species);
                sums.Add((Fraction.Zero + term.Coefficient).Reduce());
                if (index is not null)
                {
                    index[term.Species] = species.Count - 1;
                }
                else if (species.Count > 16)
                {
                    index = new Dictionary<Species, int>(species.Count * 2);
                    for (int i = 0; i < species.Count; i++)
                    {
                        index[species[i]] = i;
                    }
                }
            }
            else
            {
                sums[at] = (sums[at] + term.Coefficient).Reduce();
            }
        }

        // Reactants first, then products, each side in order of first appearance.
        int kept = 0;
        foreach (Fraction sum in sums)
        {
            if (!sum.IsZero)
            {
                kept++;
            }
        }

        var netted = new EquationTerm[kept];
        int next = 0;
        for (int pass = 0; pass < 2; pass++)
        {
            for (int i = 0; i < species.Count; i++)
            {
                Fraction sum = sums[i];
                if (!sum.IsZero && (sum > Fraction.Zero) == (pass == 1))
                {
                    netted[next++] = new EquationTerm(species[i], sum);
                }
            }
        }

        return new ChemicalEquation(netted, isFormation);
    }
}
