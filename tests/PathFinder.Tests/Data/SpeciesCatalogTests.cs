using PathFinder.Chemistry;
using PathFinder.Data;
using PathFinder.Diagnostics;
using PathFinder.Tests.TestSupport;

namespace PathFinder.Tests.Data;

public sealed class SpeciesCatalogTests : IDisposable
{
    private readonly TempFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    [Fact]
    public void Read_DeclaresLabelledSpeciesInFileOrder()
    {
        // Given two isomers of C2H6O(g) declared with keys and names
        List<Diagnostic> diagnostics = [];
        SpeciesCatalog catalog = ReadCatalog("# isomers\nkey,formula,state,name\nEtOH,C2H5OH,g,ethanol(g)\nDME,CH3OCH3,g,\n", diagnostics);

        // Then both are declared and labelled, shown by their keys, with the declared names as descriptions
        Assert.Empty(diagnostics);
        Assert.Equal(["EtOH", "DME"], catalog.Declared.Select(species => species.Label));
        Assert.Equal(["EtOH", "DME"], catalog.Declared.Select(species => species.Name));
        Assert.Equal(["ethanol(g)", ""], catalog.Declared.Select(species => species.Description));
        Assert.Equal("C2H6O(g)[DME]", catalog.Declared[1].Key);
    }

    [Theory]
    [InlineData("NH3(gas)", "NH3(g)", "NH3(g)")]
    [InlineData("H2O(liquid)", "H2O(l)", "H2O(l)")]
    [InlineData("C(graphite)", "C(cr,graphite)", "C(cr,graphite)")]
    [InlineData("NaCl(s)", "NaCl(cr)", "NaCl(cr)")]
    public void Resolve_OneSpeciesWrittenTwoWays_IsShownWithTheCanonicalState(string first, string second, string shown)
    {
        // Given a species written first with a long or implied state, then in the short form
        SpeciesCatalog catalog = ReadCatalog("key,formula,state\n", []);

        // When both spellings are resolved
        Species a = catalog.Resolve(first).Value;
        Species b = catalog.Resolve(second).Value;

        // Then both are one species with one label, whose state is the canonical short form
        Assert.Equal(a, b);
        Assert.Equal(shown, a.Name);
        Assert.Equal(shown, b.Name);
    }

    [Fact]
    public void Resolve_DeclaredSpecies_KeepsItsDeclaredName()
    {
        SpeciesCatalog catalog = ReadCatalog("key,formula,state\nDME(gas),CH3OCH3,gas\n", []);

        Assert.Equal("DME(gas)", catalog.Resolve("DME(gas)").Value.Name);
    }

    [Fact]
    public void Resolve_PrefersDeclaredKeys()
    {
        SpeciesCatalog catalog = ReadCatalog("key,formula,state\nEtOH(l),C2H5OH,l\n", []);

        Species species = catalog.Resolve("EtOH(l)").Value;

        Assert.Equal("EtOH(l)", species.Label);
        Assert.Equal(Phase.Liquid, species.State.Phase);
    }

    [Fact]
    public void Resolve_RefusesAFormulaMatchingSeveralIsomers()
    {
        SpeciesCatalog catalog = ReadCatalog("key,formula,state\nEtOH,C2H5OH,g\nDME,CH3OCH3,g\n", []);

        ParseResult<Species> result = catalog.Resolve("C2H6O(g)");

        Assert.False(result.Success);
        Assert.Equal("ambiguous-species", result.Failure.Code);
        Assert.Equal("write the species key from species.csv instead of the formula", result.Failure.Hint);
    }

    [Fact]
    public void Resolve_MapsAFormulaToItsOnlyDeclaredIsomerButNotAnotherState()
    {
        SpeciesCatalog catalog = ReadCatalog("key,formula,state\nEtOH,C2H5OH,l\n", []);

        Assert.Equal("EtOH", catalog.Resolve("CH3CH2OH(l)").Value.Label);
        Assert.Equal("", catalog.Resolve("CH3CH2OH(g)").Value.Label);
    }

    [Fact]
    public void Resolve_RemembersSpellingsAndShowsTheFirst()
    {
        // Given an empty catalog and two spellings of one undeclared species
        var catalog = SpeciesCatalog.Read(null, "", []);
        Species first = catalog.Resolve("C2H5OH(l)").Value;
        Species second = catalog.Resolve("CH3CH2OH(l)").Value;
        catalog.Resolve("C2H5OH(l)");

        // Then both resolve to the first spelling, and the merge is listed once with both spellings
        Assert.Equal("C2H5OH(l)", second.Name);
        Assert.Same(first, second);
        var merged = Assert.Single(catalog.MergedSpellings());
        Assert.Equal(["C2H5OH", "CH3CH2OH"], merged.Spellings);
    }

    [Fact]
    public void Resolve_PassesParseFailuresThrough()
    {
        var catalog = SpeciesCatalog.Read(null, "", []);

        Assert.Equal("missing-state", catalog.Resolve("CH4").Failure!.Code);
    }

    [Theory]
    [InlineData("key,formula,state\nEt OH,C2H5OH,l\n", "bad-species-key", 2, 1)]
    [InlineData("key,formula,state\n,C2H5OH,l\n", "bad-species-key", 2, 1)]
    [InlineData("key,formula,state\nA+B,C2H5OH,l\n", "bad-species-key", 2, 1)]
    [InlineData("key,formula,state\nDME\u001b[2J,C2H6O,g\n", "bad-species-key", 2, 1)]
    [InlineData("key,formula,state\nEtOH,C2H5OH,l\nEtOH,CH3OCH3,g\n", "duplicate-species-key", 3, 1)]
    [InlineData("key,formula,state\nEtOH,C2H5Xy,l\n", "unknown-element", 2, 10)]
    [InlineData("key,formula,state\nEtOH,C2H5OH,plasma\n", "bad-state", 2, 13)]
    [InlineData("key,formula\nEtOH,C2H5OH\n", "missing-column", 1, 1)]
    public void Read_ReportsBadDeclarationsAtTheField(string content, string code, int line, int column)
    {
        List<Diagnostic> diagnostics = [];

        ReadCatalog(content, diagnostics);

        Diagnostic diagnostic = Assert.Single(diagnostics);
        Assert.Equal((code, line, column), (diagnostic.Code, diagnostic.Location.Line, diagnostic.Location.Column));
    }

    [Fact]
    public void Read_OfNoFileIsEmpty()
    {
        List<Diagnostic> diagnostics = [];

        SpeciesCatalog catalog = SpeciesCatalog.Read(Path.Combine(_folder.Path, "species.csv"), "species.csv", diagnostics);

        Assert.Empty(catalog.Declared);
        Assert.Empty(diagnostics);
    }

    private SpeciesCatalog ReadCatalog(string content, List<Diagnostic> diagnostics)
    {
        string file = _folder.Write("species.csv", content);
        return SpeciesCatalog.Read(file, file, diagnostics);
    }
}
