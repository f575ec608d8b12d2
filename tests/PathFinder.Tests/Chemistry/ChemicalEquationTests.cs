using Fractions;
using PathFinder.Chemistry;

namespace PathFinder.Tests.Chemistry;

public sealed class ChemicalEquationTests
{
    [Theory]
    [InlineData("CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)")]
    [InlineData("K4[Fe(CN)6](cr) -> 4 K+(aq) + Fe(CN)6^4-(aq)")]
    [InlineData("CuSO4·5H2O(cr) -> CuSO4(cr) + 5 H2O(l)")]
    [InlineData("CaSO4·0.5H2O(cr) + 3/2 H2O(l) -> CaSO4·2H2O(cr)")]
    [InlineData("Fe^3+(aq) + e- -> Fe^2+(aq)")]
    [InlineData("NH3(g) + H+(aq) -> NH4+(aq)")]
    public void FindImbalances_IsEmptyForBalancedEquations(string text)
    {
        Assert.Empty(ChemicalEquation.Parse(text).FindImbalances());
    }

    [Fact]
    public void FindImbalances_SpellsOutEachElement()
    {
        // Given methane combustion with one water missing
        ChemicalEquation equation = ChemicalEquation.Parse("CH4(g) + 2 O2(g) -> CO2(g) + H2O(l)");

        // Then H and O are reported, alphabetically, with both sides' counts
        Assert.Equal(["left has 4 H, right has 2 H", "left has 4 O, right has 3 O"], equation.FindImbalances());
    }

    [Fact]
    public void FindImbalances_ReportsFractionalCountsExactly()
    {
        ChemicalEquation equation = ChemicalEquation.Parse("H2(g) + O2(g) -> H2O(l) + 1/3 O2(g)");

        Assert.Equal(["left has 4/3 O, right has 1 O"], equation.FindImbalances());
    }

    [Fact]
    public void FindImbalances_ReportsCharge()
    {
        ChemicalEquation equation = ChemicalEquation.Parse("Na(cr) -> Na+(aq)");

        Assert.Equal(["left has charge 0, right has charge +1"], equation.FindImbalances());
    }

    [Fact]
    public void FindImbalances_ReportsNegativeCharge()
    {
        ChemicalEquation equation = ChemicalEquation.Parse("SO4^2-(aq) -> SO3(g) + 1/2 O2(g)");

        Assert.Equal(["left has charge -2, right has charge 0"], equation.FindImbalances());
    }

    [Fact]
    public void FromTerms_NetsASpeciesOnBothSides()
    {
        // Given water on both sides
        ChemicalEquation equation = ChemicalEquation.Parse("2 H2(g) + O2(g) + H2O(l) -> 3 H2O(l)");

        // Then it is netted to the product side
        Assert.Equal(3, equation.Terms.Count);
        Assert.Equal(new Fraction(2), equation.CoefficientOf(Species.Parse("H2O(l)")));
        Assert.Equal("2 H2(g) + O2(g) -> 2 H2O(l)", equation.ToString());
        Assert.Empty(equation.FindImbalances());
    }

    [Fact]
    public void FromTerms_AddsDecimalCoefficientsExactly()
    {
        // 0.1 + 0.2 = 0.3 only when the decimals are kept exact
        ChemicalEquation equation = ChemicalEquation.Parse("0.1 H2(g) + 0.2 H2(g) + 0.15 O2(g) -> 0.3 H2O(l)");

        Assert.Equal(new Fraction(-3, 10), equation.CoefficientOf(Species.Parse("H2(g)")));
        Assert.Empty(equation.FindImbalances());
    }

    [Fact]
    public void FromTerms_DropsSpeciesThatCancel()
    {
        ChemicalEquation equation = ChemicalEquation.FromTerms(
        [
            new EquationTerm(Species.Parse("CO(g)"), new Fraction(-1)),
            new EquationTerm(Species.Parse("H2O(g)"), new Fraction(-1)),
            new EquationTerm(Species.Parse("H2O(g)"), Fraction.One),
            new EquationTerm(Species.Parse("CO(g)"), Fraction.One),
        ]);

        Assert.True(equation.IsEmpty);
    }

    [Fact]
    public void Add_CancelsIntermediates()
    {
        // Hess's law: C + 1/2 O2 -> CO, then CO + 1/2 O2 -> CO2, sums to C + O2 -> CO2
        ChemicalEquation first = ChemicalEquation.Parse("C(cr,graphite) + 1/2 O2(g) -> CO(g)");
        ChemicalEquation second = ChemicalEquation.Parse("CO(g) + 1/2 O2(g) -> CO2(g)");

        ChemicalEquation sum = first.Add(second);

        Assert.Equal("C(cr,graphite) + O2(g) -> CO2(g)", sum.ToString());
        Assert.Equal(Fraction.Zero, sum.CoefficientOf(Species.Parse("CO(g)")));
    }

    [Fact]
    public void Scale_ByMinusOneFlipsTheEquation()
    {
        ChemicalEquation equation = ChemicalEquation.Parse("CO(g) + 1/2 O2(g) -> CO2(g)");

        ChemicalEquation flipped = equation.Scale(new Fraction(-1));

        Assert.Equal("CO2(g) -> CO(g) + 1/2 O2(g)", flipped.ToString());
        Assert.True(equation.Add(flipped).IsEmpty);
    }

    [Fact]
    public void Scale_ByTwoDoublesEveryCoefficient()
    {
        ChemicalEquation doubled = ChemicalEquation.Parse("CO(g) + 1/2 O2(g) -> CO2(g)").Scale(new Fraction(2));

        Assert.Equal("2 CO(g) + O2(g) -> 2 CO2(g)", doubled.ToString());
    }

    [Theory]
    [InlineData("CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)", -2, 1)]
    [InlineData("CO(g) + 1/2 O2(g) -> CO2(g)", -1, 2)]
    [InlineData("H2O(l) -> H2O(g)", 1, 1)]
    [InlineData("CaCO3(cr) -> CaO(cr) + CO2(g)", 1, 1)]
    [InlineData("NaCl(cr) -> Na+(aq) + Cl-(aq)", 0, 1)]
    [InlineData("Na(g) -> Na+(g) + e-", 0, 1)]
    public void GasMoleChange_SumsGaseousCoefficientsWithoutElectrons(string text, int numerator, int denominator)
    {
        Assert.Equal(new Fraction(numerator, denominator), ChemicalEquation.Parse(text).GasMoleChange());
    }

    [Fact]
    public void ToString_WritesReactantsThenProducts()
    {
        Assert.Equal("CH4(g) + 2 O2(g) -> CO2(g) + 2 H2O(l)", ChemicalEquation.Parse("CH4(g) + 2 O2(g) = CO2(g) + 2 H2O(l)").ToString());
    }

    [Fact]
    public void Parse_RoundTripsThroughToString()
    {
        ChemicalEquation equation = ChemicalEquation.Parse("C2H6(g) + 7/2 O2(g) -> 2 CO2(g) + 3 H2O(l)");

        ChemicalEquation again = ChemicalEquation.Parse(equation.ToString());

        Assert.True(equation.Add(again.Scale(new Fraction(-1))).IsEmpty);
    }

    [Fact]
    public void FindImbalances_IsExactBeyond64BitCoefficients()
    {
        // Given coefficients too large for 64-bit arithmetic, once balanced and once off by one hydrogen molecule
        string big = "100000000000000000000";
        ChemicalEquation balanced = ChemicalEquation.Parse($"{big} H2(g) + 50000000000000000000 O2(g) -> {big} H2O(l)");
        ChemicalEquation unbalanced = ChemicalEquation.Parse($"100000000000000000001 H2(g) + 50000000000000000000 O2(g) -> {big} H2O(l)");

        // Then the balanced one passes and the other is reported with its exact counts
        Assert.Empty(balanced.FindImbalances());
        Assert.Equal(["left has 200000000000000000002 H, right has 200000000000000000000 H"], unbalanced.FindImbalances());
    }

    [Fact]
    public void Add_NetsRepeatedSpeciesInLongSums()
    {
        // Given a sum of twenty equations, each using O2(g) and a species of its own (more terms than a short scan handles)
        ChemicalEquation sum = ChemicalEquation.Parse("H2(g) + 1/2 O2(g) -> H2O(l)");
        for (int n = 1; n <= 20; n++)
        {
            sum = sum.Add(ChemicalEquation.Parse($"C{n}H{2 * n}(g) + {3 * n}/2 O2(g) -> {n} CO2(g) + {n} H2O(l)"));
        }

        // Then O2 and H2O are netted into one term each, reactants stay before products, and the sum balances
        Assert.Single(sum.Terms, term => term.Species.Key == "O2(g)");
        Assert.Single(sum.Terms, term => term.Species.Key == "H2O(l)");
        Assert.Equal(new Fraction(1 + (3 * 210), 2), -sum.CoefficientOf(Species.Parse("O2(g)")));
        Assert.Equal(new Fraction(211), sum.CoefficientOf(Species.Parse("H2O(l)")));
        int firstProduct = sum.Terms.ToList().FindIndex(term => term.Coefficient > Fraction.Zero);
        Assert.All(sum.Terms.Skip(firstProduct), term => Assert.True(term.Coefficient > Fraction.Zero));
        Assert.Empty(sum.FindImbalances());
    }
}
