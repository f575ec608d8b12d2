using Fractions;
using PathFinder.Chemistry;

namespace PathFinder.Tests.Chemistry;

public sealed class ReferenceStatesTests
{
    [Theory]
    [InlineData("H", "H2(g)")]
    [InlineData("O", "O2(g)")]
    [InlineData("N", "N2(g)")]
    [InlineData("Cl", "Cl2(g)")]
    [InlineData("Br", "Br2(l)")]
    [InlineData("I", "I2(cr)")]
    [InlineData("Hg", "Hg(l)")]
    [InlineData("C", "C(cr,graphite)")]
    [InlineData("S", "S(cr,rhombic)")]
    [InlineData("P", "P(cr,white)")]
    [InlineData("Ar", "Ar(g)")]
    [InlineData("Na", "Na(cr)")]
    [InlineData("Fe", "Fe(cr)")]
    public void Of_GivesTheStandardReferenceState(string element, string species)
    {
        // Reference states at 298.15 K and 1 bar per CODATA Key Values for Thermodynamics
        // (Cox, Wagman, Medvedev 1989), from memory
        Assert.Equal(Species.Parse(species), ReferenceStates.Of(element));
    }

    [Fact]
    public void Of_RefusesNonSymbols()
    {
        Assert.Throws<ArgumentException>(() => ReferenceStates.Of("Xy"));
    }

    [Fact]
    public void All_CoversEveryElement()
    {
        Assert.Equal(ElementTable.All.Count, ReferenceStates.All.Count());
    }

    [Theory]
    [InlineData("O2(g)", true)]
    [InlineData("C(graphite)", true)]
    [InlineData("C(cr,diamond)", false)]
    [InlineData("O(g)", false)]
    [InlineData("Br2(g)", false)]
    [InlineData("H+(aq)", false)]
    public void IsElementReference_MatchesPhaseAndModification(string text, bool expected)
    {
        Assert.Equal(expected, ReferenceStates.IsElementReference(Species.Parse(text)));
    }

    [Theory]
    [InlineData("H+(aq)", true)]
    [InlineData("e-", true)]
    [InlineData("N2(g)", true)]
    [InlineData("Na+(aq)", false)]
    [InlineData("H2O(l)", false)]
    public void HasZeroFormationProperties_IncludesTheConventionalZeros(string text, bool expected)
    {
        Assert.Equal(expected, ReferenceStates.HasZeroFormationProperties(Species.Parse(text)));
    }

    [Theory]
    [InlineData("CO2(g)", "C(cr,graphite) + O2(g) -> CO2(g)")]
    [InlineData("H2O(l)", "1/2 O2(g) + H2(g) -> H2O(l)")]
    [InlineData("NH4+(aq)", "1/2 N2(g) + H+(aq) + 3/2 H2(g) -> NH4+(aq)")]
    [InlineData("Cl-(aq)", "1/2 Cl2(g) + 1/2 H2(g) -> Cl-(aq) + H+(aq)")]
    [InlineData("Cl-(g)", "1/2 Cl2(g) + e- -> Cl-(g)")]
    [InlineData("Na+(g)", "Na(cr) -> Na+(g) + e-")]
    [InlineData("SO4^2-(aq)", "2 O2(g) + S(cr,rhombic) + H2(g) -> SO4^2-(aq) + 2 H+(aq)")]
    [InlineData("C(cr,diamond)", "C(cr,graphite) -> C(cr,diamond)")]
    [InlineData("Br2(g)", "Br2(l) -> Br2(g)")]
    [InlineData("Ca(OH)2(cr)", "Ca(cr) + O2(g) + H2(g) -> Ca(OH)2(cr)")]
    [InlineData("CaSO4·0.5H2O(cr)", "Ca(cr) + 9/4 O2(g) + S(cr,rhombic) + 1/2 H2(g) -> CaSO4·0.5H2O(cr)")]
    public void Formation_ExpandsToElementsInReferenceStates(string text, string expected)
    {
        // Given a species in the formation shorthand
        ChemicalEquation formation = ChemicalEquation.Formation(Species.Parse(text));

        // Then it is formed from the reference states (H+(aq) for aqueous ions, e- for gaseous ions), balanced
        Assert.Equal(expected, formation.ToString());
        Assert.Empty(formation.FindImbalances());
        Assert.True(formation.IsFormation);
        Assert.Equal(Species.Parse(text), formation.FormedSpecies);
    }

    [Fact]
    public void Formation_OfAnElementReferenceIsEmpty()
    {
        Assert.True(ChemicalEquation.Formation(Species.Parse("O2(g)")).IsEmpty);
    }

    [Fact]
    public void AtomsPerUnit_CountsAtomsInTheReferenceMolecule()
    {
        Assert.Equal(2, ReferenceStates.AtomsPerUnit("O"));
        Assert.Equal(1, ReferenceStates.AtomsPerUnit("C"));
        Assert.Equal(2, ReferenceStates.AtomsPerUnit("Br"));
    }

    [Fact]
    public void Formation_OfAnAqueousCationUsesAqueousProtonsWithTheHydrogenConvention()
    {
        // Convention (from memory, NBS tables): ΔfH°(H+, aq) = 0, so Na+(aq) forms as Na + H+(aq) -> Na+(aq) + 1/2 H2
        ChemicalEquation formation = ChemicalEquation.Formation(Species.Parse("Na+(aq)"));

        Assert.Equal(new Fraction(-1), formation.CoefficientOf(ReferenceStates.AqueousProton));
        Assert.Equal(new Fraction(1, 2), formation.CoefficientOf(Species.Parse("H2(g)")));
    }
}
