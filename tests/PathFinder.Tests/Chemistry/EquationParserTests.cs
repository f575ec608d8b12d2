using Fractions;
using PathFinder.Chemistry;
using PathFinder.Diagnostics;

namespace PathFinder.Tests.Chemistry;

public sealed class EquationParserTests
{
    [Theory]
    [InlineData("CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)")]
    [InlineData("CH4(g) + 2 O2(g) → CO2(g) + 2 H2O(l)")]
    [InlineData("CH4(g) + 2 O2(g) = CO2(g) + 2 H2O(l)")]
    [InlineData("CH4(g) + 2 O2(g) <=> CO2(g) + 2 H2O(l)")]
    [InlineData("CH4(g) + 2O2(g) -> CO2(g) + 2H2O(l)")]
    [InlineData("  CH4(g)   +   2 O2(g)->CO2(g) + 2 H2O(l) ")]
    public void Parse_AcceptsEveryArrowAndSpacing(string text)
    {
        // Given methane combustion in several spellings
        ChemicalEquation equation = EquationParser.Parse(text).Value;

        // Then the signed coefficients are the same
        Assert.Equal(new Fraction(-1), equation.CoefficientOf(Species.Parse("CH4(g)")));
        Assert.Equal(new Fraction(-2), equation.CoefficientOf(Species.Parse("O2(g)")));
        Assert.Equal(Fraction.One, equation.CoefficientOf(Species.Parse("CO2(g)")));
        Assert.Equal(new Fraction(2), equation.CoefficientOf(Species.Parse("H2O(l)")));
        Assert.False(equation.IsFormation);
    }

    [Theory]
    [InlineData("CO(g) + 1/2 O2(g) -> CO2(g)", 1, 2)]
    [InlineData("CO(g) + 0.5 O2(g) -> CO2(g)", 1, 2)]
    [InlineData("CO(g) + 1/2O2(g) -> CO2(g)", 1, 2)]
    [InlineData("C2H6(g) + 7/2 O2(g) -> 2 CO2(g) + 3 H2O(l)", 7, 2)]
    [InlineData("0.1 CO(g) + 0.05 O2(g) -> 0.1 CO2(g)", 1, 20)]
    public void Parse_KeepsFractionalAndDecimalCoefficientsExact(string text, int numerator, int denominator)
    {
        ChemicalEquation equation = EquationParser.Parse(text).Value;

        Assert.Equal(new Fraction(-numerator, denominator), equation.CoefficientOf(Species.Parse("O2(g)")));
        Assert.Empty(equation.FindImbalances());
    }

    [Fact]
    public void Parse_ReadsPointOneAsOneTenth()
    {
        ChemicalEquation equation = EquationParser.Parse("0.1 H2(g) + 0.05 O2(g) -> 0.1 H2O(l)").Value;

        Assert.Equal(new Fraction(1, 10), equation.CoefficientOf(Species.Parse("H2O(l)")));
    }

    [Fact]
    public void Parse_TellsChargeSignsFromSeparators()
    {
        // A + touching a formula is a charge; a + with spaces separates terms
        ChemicalEquation equation = EquationParser.Parse("NaCl(cr) -> Na+(aq) + Cl-(aq)").Value;

        Assert.Equal(3, equation.Terms.Count);
        Assert.Equal(1, equation.Terms.Single(term => term.Species.Key == "Na^+(aq)").Species.Formula.Charge);
        Assert.Empty(equation.FindImbalances());
    }

    [Fact]
    public void Parse_ASingleSpeciesIsItsFormation()
    {
        ChemicalEquation equation = EquationParser.Parse("CO2(g)").Value;

        Assert.True(equation.IsFormation);
        Assert.Equal(Species.Parse("CO2(g)"), equation.FormedSpecies);
    }

    [Theory]
    [InlineData("", 0, "missing-arrow")]
    [InlineData("   ", 0, "missing-arrow")]
    [InlineData("CH4(g) + 2 O2(g) CO2(g) + 2 H2O(l)", 17, "missing-arrow")]
    [InlineData("H2(g) + Cl2(g)", 14, "missing-arrow")]
    [InlineData("2 H2O(l)", 8, "missing-arrow")]
    [InlineData("A -> B -> C", 7, "bad-equation")]
    [InlineData("-> CO2(g)", 0, "bad-equation")]
    [InlineData("CO2(g) ->", 9, "bad-equation")]
    [InlineData("CO(g) + + O2(g) -> CO2(g)", 8, "bad-equation")]
    [InlineData("H2O(l) -> H2O(l)", 0, "bad-equation")]
    [InlineData("x CO(g) -> CO2(g)", 0, "bad-coefficient")]
    [InlineData("0 CO(g) -> CO2(g)", 0, "bad-coefficient")]
    [InlineData("CO(g) + 1/2 O2 -> CO2(g)", 14, "missing-state")]
    [InlineData("CO(g) + 1/2 Oo2(g) -> CO2(g)", 13, "unknown-element")]
    [InlineData("CO(g) -> CO2(g) + Fe3+(aq)", 20, "ambiguous-charge")]
    [InlineData("O2(g)", 0, "reference-formation")]
    public void Parse_ReportsProblemsAtTheExactOffset(string text, int offset, string code)
    {
        ParseResult<ChemicalEquation> result = EquationParser.Parse(text);

        Assert.False(result.Success);
        Assert.Equal(code, result.Failure.Code);
        Assert.Equal(offset, result.Failure.Offset);
    }

    [Fact]
    public void Parse_HintsAtSpacesWhenAPlusIsGluedBetweenSpecies()
    {
        ParseFailure failure = EquationParser.Parse("CO(g)+O2(g) -> CO2(g)").Failure!;

        Assert.Contains("spaces around the plus", failure.Hint, StringComparison.Ordinal);
    }

    /// <summary>The exact cases of issue 16 whose messages pointed the wrong way: each now says what to change.</summary>
    [Theory]
    [InlineData("NH3(G)", 4, "bad-state", "lower case", "NH3(g)")]
    [InlineData("NH3 (g)", 3, "bad-spacing", "remove the space", "NH3(g)")]
    [InlineData("NO(g)+1/2 O2(g)->NO2(g)", 5, "bad-spacing", "put spaces around + and ->", "+")]
    [InlineData("2 NH3 (g) -> N2(g) + 3 H2(g)", 5, "bad-spacing", "remove the space", "NH3(g)")]
    public void Parse_PointsMistypedSpeciesAndSeparatorsTheRightWay(string text, int offset, string code, string fix, string named)
    {
        // When an equation with a capital state, a space before the state or a glued '+' is read
        ParseFailure failure = EquationParser.Parse(text).Failure!;

        // Then the message no longer blames an element symbol or a coefficient, and the hint says what to change
        Assert.Equal(code, failure.Code);
        Assert.Equal(offset, failure.Offset);
        Assert.DoesNotContain("is not an element symbol", failure.Message, StringComparison.Ordinal);
        Assert.DoesNotContain("is not a coefficient", failure.Message, StringComparison.Ordinal);
        Assert.Contains(fix, failure.Message + " " + failure.Hint, StringComparison.Ordinal);
        Assert.Contains(named, failure.Message + " " + failure.Hint, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("NO(g) + ½ O2(g) → NO2(g)", "O2(g)", 1, 2)]
    [InlineData("NO(g) + ½O2(g) ⇌ NO2(g)", "O2(g)", 1, 2)]
    [InlineData("NO(g) + ½ O2(g) ⟶ NO2(g)", "O2(g)", 1, 2)]
    [InlineData("NO(g) + ½ O2(g) = NO2(g)", "O2(g)", 1, 2)]
    [InlineData("¼ N2(g) + ¾ H2(g) -> ½ NH3(g)", "N2(g)", 1, 4)]
    [InlineData("⅓ N2(g) + H2(g) -> ⅔ NH3(g)", "N2(g)", 1, 3)]
    public void Parse_ReadsTheArrowsAndFractionsTheDiagramsPrint(string text, string reactant, int numerator, int denominator)
    {
        // When an equation copied from a diagram is read
        ChemicalEquation equation = EquationParser.Parse(text).Value;

        // Then the reactant's coefficient is the exact fraction and the equation balances
        Assert.Equal(new Fraction(-numerator, denominator), equation.CoefficientOf(Species.Parse(reactant)));
        Assert.Empty(equation.FindImbalances());
    }

    [Fact]
    public void Parse_UsesTheResolverForEverySpecies()
    {
        // Given a resolver that knows a declared key
        Species ether = Species.Create(Formula.Parse("C2H6O"), PhysicalState.Gas, "DME");
        ParseResult<Species> Resolve(string text) => text == "DME" ? ParseResult<Species>.Ok(ether) : SpeciesParser.Parse(text);

        // When an equation uses the key
        ChemicalEquation equation = EquationParser.Parse("DME + 3 O2(g) -> 2 CO2(g) + 3 H2O(l)", Resolve).Value;

        // Then the declared species is used and the equation balances
        Assert.Equal(new Fraction(-1), equation.CoefficientOf(ether));
        Assert.Empty(equation.FindImbalances());
    }
}
