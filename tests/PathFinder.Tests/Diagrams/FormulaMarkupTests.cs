using System.Text;
using PathFinder.Diagrams;

namespace PathFinder.Tests.Diagrams;

public class FormulaMarkupTests
{
    /// <summary>Writes tokens as <c>_{sub}</c> and <c>^{sup}</c> so expectations read like typeset formulas.</summary>
    private static string Show(IReadOnlyList<FormulaToken> tokens)
    {
        var sb = new StringBuilder();
        foreach (FormulaToken t in tokens)
        {
            sb.Append(t.Role switch
            {
                FormulaTextRole.Subscript => "_{" + t.Text + "}",
                FormulaTextRole.Superscript => "^{" + t.Text + "}",
                _ => t.Text,
            });
        }

        return sb.ToString();
    }

    [Theory]
    [InlineData("CH3OH(l)", "CH_{3}OH(l)")]
    [InlineData("SO4^2-(aq)", "SO_{4}^{2−}(aq)")]
    [InlineData("Fe^3+", "Fe^{3+}")]
    [InlineData("CuSO4·5H2O(cr)", "CuSO_{4}·5H_{2}O(cr)")]
    [InlineData("CuSO4*5H2O(cr)", "CuSO_{4}·5H_{2}O(cr)")]
    [InlineData("2H2O(l)", "2H_{2}O(l)")]
    [InlineData("CO(g) + ½O2(g)", "CO(g) + ½O_{2}(g)")]
    [InlineData("3/2O2(g)", "3/2O_{2}(g)")]
    [InlineData("Ca3(PO4)2(cr)", "Ca_{3}(PO_{4})_{2}(cr)")]
    [InlineData("[Cu(NH3)4]^2+", "[Cu(NH_{3})_{4}]^{2+}")]
    [InlineData("Fe(OH)3(s)", "Fe(OH)_{3}(s)")]
    [InlineData("Cl-(aq)", "Cl^{−}(aq)")]
    [InlineData("NH4+", "NH_{4}^{+}")]
    [InlineData("Na+(aq) + Cl-(aq)", "Na^{+}(aq) + Cl^{−}(aq)")]
    [InlineData("e-", "e^{−}")]
    [InlineData("O2^2-", "O_{2}^{2−}")]
    [InlineData("C6H12O6(cr)", "C_{6}H_{12}O_{6}(cr)")]
    [InlineData("S8(cr,rhombic)", "S_{8}(cr,rhombic)")]
    [InlineData("H2(g) + Cl2(g) → 2HCl(g)", "H_{2}(g) + Cl_{2}(g) → 2HCl(g)")]
    [InlineData("reactants", "reactants")]
    [InlineData("", "")]
    public void Tokenize_TypesetsFormulaParts(string formula, string expected)
    {
        // Given a formula in the markup; When tokenized; Then subscripts, charges and states are as typeset by hand.
        Assert.Equal(expected, Show(FormulaMarkup.Tokenize(formula)));
    }

    [Fact]
    public void Tokenize_MergesNeighbouringCharactersOfOneRole()
    {
        IReadOnlyList<FormulaToken> tokens = FormulaMarkup.Tokenize("C6H12");

        Assert.Equal(
            [new("C", FormulaTextRole.Normal), new("6", FormulaTextRole.Subscript), new("H", FormulaTextRole.Normal), new("12", FormulaTextRole.Subscript)],
            tokens);
    }

    [Fact]
    public void ToPlainText_DropsCaretAndUsesMinusSign()
    {
        Assert.Equal("SO4 2−(aq)".Replace(" ", string.Empty, StringComparison.Ordinal), FormulaMarkup.ToPlainText("SO4^2-(aq)"));
    }

    [Theory]
    [InlineData("½ O2(g) → CO2(g)", "½ O₂(g) → CO₂(g)")]
    [InlineData("SO4^2-(aq)", "SO₄²⁻(aq)")]
    [InlineData("Cl-(aq) + H+(aq)", "Cl⁻(aq) + H⁺(aq)")]
    [InlineData("Route 1 to CO(g)", "Route 1 to CO(g)")]
    public void ToUnicodeText_WritesSubscriptsAndChargesAsUnicodeCharacters(string markup, string expected)
    {
        Assert.Equal(expected, FormulaMarkup.ToUnicodeText(markup));
    }
}
