using System.Text;
using Fractions;

namespace PathFinder.Chemistry;

/// <summary>A chemical formula: element counts and a net charge, with the text as the user wrote it.</summary>
/// <remarks>
/// Counts are exact fractions because hydrates such as <c>CaSO4·0.5H2O</c> carry fractional water.
/// Two formulas with the same composition and charge are chemically equal (<see cref="HillNotation"/>);
/// isomers are told apart by the species label, not by the formula.
/// </remarks>
public sealed class Formula : IEquatable<Formula>
{
    private readonly SortedDictionary<string, Fraction> _counts;
    private readonly KeyValuePair<string, Fraction>[] _countList;

    internal Formula(string text, IDictionary<string, Fraction> counts, int charge)
    {
        Text = text;
        _counts = new SortedDictionary<string, Fraction>(counts.ContainsKey("C") && !counts["C"].IsZero ? HillComparer.WithCarbon : HillComparer.WithoutCarbon);
        foreach (KeyValuePair<string, Fraction> pair in counts)
        {
            if (!pair.Value.IsZero)
            {
                _counts[pair.Key] = pair.Value;
            }
        }

        _countList = [.. _counts];
        Charge = charge;
        HillNotation = BuildHill();
    }

    /// <summary>The electron, written <c>e-</c>: no atoms, charge −1.</summary>
    public static Formula Electron { get; } = new("e-", new Dictionary<string, Fraction>(), -1);

    /// <summary>The formula as written (hydrate separators normalised to <c>·</c>).</summary>
    public string Text { get; }

    /// <summary>Element symbol to count, in Hill order (C, H, then alphabetical; alphabetical if no C).</summary>
    public IReadOnlyDictionary<string, Fraction> Composition => _counts;

    /// <summary>The same counts as <see cref="Composition"/>, as an array that is cheap to walk.</summary>
    internal ReadOnlySpan<KeyValuePair<string, Fraction>> CompositionSpan => _countList;

    /// <summary>The net charge in units of the elementary charge.</summary>
    public int Charge { get; }

    /// <summary>Whether this is the electron.</summary>
    public bool IsElectron => _counts.Count == 0 && Charge == -1;

    /// <summary>The composition in Hill notation with charge, e.g. <c>CH4</c>, <c>O4S^2-</c>; equal for equal compositions.</summary>
    public string HillNotation { get; }

    /// <summary>The count of an element, zero when absent.</summary>
    public Fraction CountOf(string symbol) => _counts.TryGetValue(symbol, out Fraction count) ? count : Fraction.Zero;

    /// <summary>Reads a formula; see <see cref="FormulaParser"/>.</summary>
    public static Formula Parse(string text) => FormulaParser.Parse(text).Value;

    /// <inheritdoc/>
    public bool Equals(Formula? other) => other is not null && HillNotation == other.HillNotation;

    /// <inheritdoc/>
    public override bool Equals(object? obj) => Equals(obj as Formula);

    /// <inheritdoc/>
    public override int GetHashCode() => StringComparer.Ordinal.GetHashCode(HillNotation);

    /// <inheritdoc/>
    public override string ToString() => Text;

    /// <summary>Formats a charge the way data files write it: <c>+</c>, <c>-</c>, <c>^2+</c>, <c>^3-</c>.</summary>
    public static string ChargeText(int charge) => charge switch
    {
        0 => "",
        1 => "+",
        -1 => "-",
        > 0 => $"^{charge}+",
        _ => $"^{-charge}-",
    };

    private string BuildHill()
    {
        if (IsElectron)
        {
            return "e-";
        }

        var text = new StringBuilder();
        foreach (KeyValuePair<string, Fraction> pair in _counts)
        {
            text.Append(pair.Key);
            if (pair.Value != Fraction.One)
            {
                text.Append(RationalText.Format(pair.Value));
            }
        }

        if (Charge != 0)
        {
            text.Append(Charge is 1 or -1 ? "^" + ChargeText(Charge) : ChargeText(Charge));
        }

        return text.ToString();
    }

    private sealed class HillComparer(bool carbonFirst) : IComparer<string>
    {
        public static readonly HillComparer WithCarbon = new(carbonFirst: true);
        public static readonly HillComparer WithoutCarbon = new(carbonFirst: false);

        // Hill order: with carbon, C first, H second, the rest alphabetical; without carbon, all alphabetical.
        public int Compare(string? x, string? y)
        {
            int rankX = Rank(x);
            int rankY = Rank(y);
            return rankX != rankY ? rankX.CompareTo(rankY) : string.CompareOrdinal(x, y);
        }

        private int Rank(string? symbol) => !carbonFirst ? 2 : symbol switch
        {
            "C" => 0,
            "H" => 1,
            _ => 2,
        };
    }
}
