using PathFinder.Data;
using PathFinder.Diagnostics;
using PathFinder.Quantities;
using PathFinder.Tests.TestSupport;

namespace PathFinder.Tests.Data;

public sealed class SourceSystematicsReaderTests : IDisposable
{
    private const string Data =
        "id,equation,property,value,uncertainty,unit,temperature,source\n"
        + "m1,CO(g) + 1/2 O2(g) -> CO2(g),dH,-283.0,0.2,kJ/mol,,group A\n"
        + "m2,CO2(g),dH,-393.51,0.13,kJ/mol,,group B\n"
        + "m3,CO(g),dH,-110.53,0.17,kJ/mol,,group A\n"
        + "m4,CO2(g),S,213.79,0.01,J/(mol·K),,group C\n";

    private const string Header = "source,systematic,unit,note";

    private readonly TempFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    // ---- good files ----

    [Fact]
    public void Read_FolderNetwork_GivesEachDeclarationInTheCanonicalUnit()
    {
        // Given a folder network and a sources.csv with a comment, kJ/mol, kcal/mol and J/(mol·K) declarations
        _folder.Write("lab.csv", Data);
        string sources = _folder.Write("sources.csv",
            "# shared calibrations\n"
            + Header + "\n"
            + "group A,0.3,kJ/mol,bomb calibration\n"
            + "group B,0.5,kcal/mol,\n"
            + "\"group C\",1.5,J/(mol·K),adiabatic calorimeter\n");

        // When the folder is read
        NetworkReadResult result = NetworkReader.Read(_folder.Path);

        // Then there are three declarations, converted, located, and the file is not a measurement file
        Assert.Empty(result.Diagnostics);
        Assert.Equal(sources, result.SourcesFile);
        Assert.Equal(["group A", "group B", "group C"], result.SourceSystematics.Select(declared => declared.Source));
        SourceSystematic a = result.SourceSystematics[0];
        Assert.Equal((0.3, EnergyUnit.KilojoulePerMole, "bomb calibration", true), (a.Systematic, a.Unit, a.Note, a.IsEnergy));
        Assert.Equal(new SourceLocation(sources, 3, 1, "source"), a.Location);

        // 0.5 kcal/mol = 0.5 × 4.184 kJ/mol = 2.092 kJ/mol: the thermochemical calorie is 4.184 J by definition (NIST SP 811)
        SourceSystematic b = result.SourceSystematics[1];
        Assert.Equal(EnergyUnit.KilocaloriePerMole, b.Unit);
        Assert.Equal(2.092, b.Systematic, 1e-12);
        Assert.Equal("", b.Note);

        SourceSystematic c = result.SourceSystematics[2];
        Assert.Equal((1.5, EnergyUnit.JoulePerMoleKelvin, false), (c.Systematic, c.Unit, c.IsEnergy));
        Assert.Equal(new SourceLocation(sources, 5, 2, "source"), c.Location);

        Assert.Equal(["lab.csv"], result.Files.Select(Path.GetFileName));
        Assert.Equal(4, result.Network.Measurements.Count);
    }

    [Fact]
    public void Read_SingleFileNetwork_ReadsTheStemSourcesFileBesideIt()
    {
        // Given lab.csv without a source column (its source is the file name) and lab.sources.csv beside it
        string file = _folder.Write("lab.csv", "id,equation,property,value,uncertainty\nm1,CO(g) + 1/2 O2(g) -> CO2(g),dH,-283.0,0.2\nm2,CO2(g),dH,-393.51,0.13\nm3,CO(g),dH,-110.53,0.17\n");
        string sources = _folder.Write("lab.sources.csv", "source,unit,systematic\nlab,kJ/mol,0.25\n");
        _folder.Write("sources.csv", "source,systematic,unit\nnot-this-file,1,kJ/mol\n");

        // When the file is read
        NetworkReadResult result = NetworkReader.Read(file);

        // Then the declaration in lab.sources.csv is used, and the folder's sources.csv is not
        Assert.Empty(result.Errors);
        Assert.Equal(sources, result.SourcesFile);
        SourceSystematic declared = Assert.Single(result.SourceSystematics);
        Assert.Equal(("lab", 0.25), (declared.Source, declared.Systematic));
    }

    [Fact]
    public void Read_WithoutASourcesFile_GivesNoDeclarations()
    {
        _folder.Write("lab.csv", Data);

        NetworkReadResult result = NetworkReader.Read(_folder.Path);

        Assert.Null(result.SourcesFile);
        Assert.Empty(result.SourceSystematics);
    }

    [Fact]
    public void Read_ReadsASemicolonFileWithDecimalCommasAndSaysSoOnce()
    {
        // Given a comma-decimal spreadsheet export of sources.csv
        _folder.Write("lab.csv", Data);
        string sources = _folder.Write("sources.csv", "source;systematic;unit;note\ngroup A;0,3;kJ/mol;bomb, benzoic acid\ngroup C;1,5e0;J/(mol·K);\n");

        // When read under a comma-decimal culture (which must not matter)
        NetworkReadResult result;
        using (new CultureScope("de-DE"))
        {
            result = NetworkReader.Read(_folder.Path);
        }

        // Then the numbers are right, the note keeps its comma, and one warning is on the header
        Assert.Equal([0.3, 1.5], result.SourceSystematics.Select(declared => declared.Systematic));
        Assert.Equal("bomb, benzoic acid", result.SourceSystematics[0].Note);
        Diagnostic warning = Assert.Single(result.Diagnostics);
        Assert.Equal(("decimal-comma", Severity.Warning, sources, 1), (warning.Code, warning.Severity, warning.Location.File, warning.Location.Line));
    }

    // ---- one located error per mistake ----

    [Theory]
    [InlineData(",0.3,kJ/mol,", "missing-source", ",0.3", "the declaration names no source")]
    [InlineData("group Z,0.3,kJ/mol,", "unknown-source", "group Z", "no measurement has the source 'group Z'")]
    [InlineData("group A,abc,kJ/mol,", "bad-number", "abc", "the systematic 'abc' is not a number")]
    [InlineData("group A,NaN,kJ/mol,", "bad-number", "NaN", "the systematic 'NaN' is not a finite number")]
    [InlineData("group A,Infinity,kJ/mol,", "bad-number", "Infinity", "the systematic 'Infinity' is not a finite number")]
    [InlineData("group A,1e400,kJ/mol,", "bad-number", "1e400", "the systematic '1e400' is not a finite number")]
    [InlineData("group A,,kJ/mol,", "missing-number", ",kJ/mol", "the systematic is empty")]
    [InlineData("group A,0,kJ/mol,", "bad-systematic", "0,kJ", "the systematic must be positive, not 0")]
    [InlineData("group A,-0.3,kJ/mol,", "bad-systematic", "-0.3", "the systematic must be positive, not -0.3")]
    [InlineData("group A,1e-300,kJ/mol,", "bad-systematic", "1e-300", "the systematic 1e-300 kJ/mol is outside the accepted 1e-06 to 100000 kJ/mol")]
    [InlineData("group A,1e300,kcal/mol,", "bad-systematic", "1e300", "the systematic 1e+300 kcal/mol is outside the accepted 1e-06 to 100000 kJ/mol")]
    [InlineData("group A,0.3,kJ/fortnight,", "unknown-unit", "kJ/fortnight", "unknown unit 'kJ/fortnight'")]
    [InlineData("group A,0.3,1,", "wrong-unit", ",1,", "a systematic cannot be a pure number (unit 1)")]
    [InlineData("group A,0.3,,calibration", "missing-unit", ",calibration", "the unit is empty")]
    [InlineData("group A,0.3,kJ/mol,bomb, calibrated", "extra-fields", " calibrated", "the row has 5 fields but the header has 4")]
    public void Read_GivesExactlyOneErrorAtTheFaultyField(string row, string code, string marker, string message)
    {
        // Given valid data and a sources.csv whose only declaration has one mistake
        _folder.Write("lab.csv", Data);
        string sources = _folder.Write("sources.csv", Header + "\n" + row + "\n");

        // When the folder is read
        NetworkReadResult result = NetworkReader.Read(_folder.Path);

        // Then there is one error, in sources.csv on line 2 at the faulty text, with a hint, and no declaration
        Diagnostic error = Assert.Single(result.Diagnostics);
        Assert.Equal((Severity.Error, code, message), (error.Severity, error.Code, error.Message));
        Assert.Equal((sources, 2), (error.Location.File, error.Location.Line));
        int column = ColumnOf(row, marker) + (marker.StartsWith(',') && marker.EndsWith(',') ? 1 : 0);
        Assert.Equal(column, error.Location.Column);
        Assert.NotEqual("", error.Hint);
        Assert.Empty(result.SourceSystematics);
        Assert.True(result.HasErrors);
        Assert.Equal(4, result.Network.Measurements.Count);
    }

    [Theory]
    [InlineData("", "missing-unit")]
    [InlineData("1", "wrong-unit")]
    public void Read_AsksForAnEnergyOrEntropyUnit(string unit, string code)
    {
        _folder.Write("lab.csv", Data);
        _folder.Write("sources.csv", $"source,systematic,unit\ngroup A,0.3,{unit}\n");

        Diagnostic error = Assert.Single(NetworkReader.Read(_folder.Path).Diagnostics);

        Assert.Equal(code, error.Code);
        Assert.Equal("the unit is required: an energy unit such as kJ/mol or an entropy unit such as J/(mol·K)", error.Hint);
    }

    [Fact]
    public void Read_UnknownUnitListsTheEnergyAndEntropyUnitsOnly()
    {
        _folder.Write("lab.csv", Data);
        _folder.Write("sources.csv", "source,systematic,unit\ngroup A,0.3,kJ\n");

        Diagnostic error = Assert.Single(NetworkReader.Read(_folder.Path).Diagnostics);

        Assert.Equal("use one of kJ/mol, J/mol, kcal/mol, cal/mol, eV, cm-1, J/(mol·K), cal/(mol·K), kJ/(mol·K)", error.Hint);
    }

    [Theory]
    [InlineData("Group A", "did you mean 'group A'? Source names are case-sensitive; the data's sources are 'group A', 'group B', 'group C'")]
    [InlineData("grop A", "did you mean 'group A'? Source names must match the data exactly; the data's sources are 'group A', 'group B', 'group C'")]
    [InlineData("gruop C", "did you mean 'group C'? Source names must match the data exactly; the data's sources are 'group A', 'group B', 'group C'")]
    [InlineData("group D", "write the source exactly as the data does; the data's sources are 'group A', 'group B', 'group C'")]
    [InlineData("Harbour Quay", "write the source exactly as the data does; the data's sources are 'group A', 'group B', 'group C'")]
    public void Read_UnknownSourceSuggestsANearSpellingAndListsTheSources(string source, string hint)
    {
        _folder.Write("lab.csv", Data);
        _folder.Write("sources.csv", $"source,systematic,unit\n{source},0.3,kJ/mol\n");

        Diagnostic error = Assert.Single(NetworkReader.Read(_folder.Path).Diagnostics);

        Assert.Equal(("unknown-source", hint), (error.Code, error.Hint));
    }

    [Fact]
    public void Read_UnknownSourceListsTheFirstFewOfManySources()
    {
        // Given data from eight sources s1..s8
        string rows = string.Concat(Enumerable.Range(1, 8).Select(i => $"m{i},CO2(g),dH,-393.5,0.2,kJ/mol,,s{i}\n"));
        _folder.Write("lab.csv", "id,equation,property,value,uncertainty,unit,temperature,source\n" + rows);
        _folder.Write("sources.csv", "source,systematic,unit\nzeta,0.3,kJ/mol\n");

        Diagnostic error = Assert.Single(NetworkReader.Read(_folder.Path).Errors);

        Assert.Equal("write the source exactly as the data does; the data's sources include 's1', 's2', 's3', 's4', 's5' and 3 more", error.Hint);
    }

    [Fact]
    public void Read_ASourceOfARowWithErrorsIsStillKnown()
    {
        // Given the only row of group D has a bad number: its own error says what is wrong
        _folder.Write("lab.csv", Data + "m5,CO(g),dH,abc,0.2,kJ/mol,,group D\n");
        _folder.Write("sources.csv", "source,systematic,unit\ngroup D,0.3,kJ/mol\n");

        NetworkReadResult result = NetworkReader.Read(_folder.Path);

        // Then sources.csv is not blamed for it
        Diagnostic error = Assert.Single(result.Errors);
        Assert.Equal(("bad-number", "lab.csv"), (error.Code, Path.GetFileName(error.Location.File)));
        Assert.Equal("group D", Assert.Single(result.SourceSystematics).Source);
    }

    [Fact]
    public void Read_ASourceDeclaredTwicePointsToTheFirst()
    {
        _folder.Write("lab.csv", Data);
        string sources = _folder.Write("sources.csv", "unit,systematic,source\nkJ/mol,0.3,group A\nkJ/mol,0.2,group B\nkcal/mol,0.4,group A\n");

        NetworkReadResult result = NetworkReader.Read(_folder.Path);

        Diagnostic error = Assert.Single(result.Diagnostics);
        Assert.Equal(("duplicate-source", 4, 14), (error.Code, error.Location.Line, error.Location.Column));
        Assert.Equal($"source 'group A' already has a systematic of this kind (energy or entropy) at {sources}:2:12", error.Message);
        Assert.Equal([0.3, 0.2], result.SourceSystematics.Select(declared => declared.Systematic));
    }

    [Fact]
    public void Read_OneEnergyAndOneEntropySystematicOfASource_AreBothKept()
    {
        _folder.Write("lab.csv", Data + "s1,H2(g),S,130.68,0.01,J/(mol·K),,group A\n");
        _folder.Write("sources.csv", "source,systematic,unit\ngroup A,0.3,kJ/mol\ngroup A,0.2,J/(mol·K)\n");

        NetworkReadResult result = NetworkReader.Read(_folder.Path);

        Assert.DoesNotContain(result.Diagnostics, diagnostic => diagnostic.Severity == Severity.Error);
        Assert.Equal([true, false], result.SourceSystematics.Select(declared => declared.IsEnergy));
    }

    [Fact]
    public void Read_ASystematicOfAKindTheSourceHasNoRowsOf_IsWarnedAbout()
    {
        _folder.Write("lab.csv", Data);
        _folder.Write("sources.csv", "source,systematic,unit\ngroup A,0.2,J/(mol·K)\n");

        NetworkReadResult result = NetworkReader.Read(_folder.Path);

        Diagnostic warning = Assert.Single(result.Diagnostics);
        Assert.Equal(("systematic-acts-on-nothing", Severity.Warning, 2, 13), (warning.Code, warning.Severity, warning.Location.Line, warning.Location.Column));
        Assert.Single(result.SourceSystematics);
    }

    [Theory]
    [InlineData("source,value,unit", "sources file lacks column(s): systematic")]
    [InlineData("Unit,SOURCE", "sources file lacks column(s): systematic")]
    [InlineData("name,systematic", "sources file lacks column(s): source, unit")]
    public void Read_MissingColumnIsAnErrorOnTheHeader(string header, string message)
    {
        _folder.Write("lab.csv", Data);
        _folder.Write("sources.csv", $"# calibrations\n{header}\ngroup A,0.3,kJ/mol\n");

        NetworkReadResult result = NetworkReader.Read(_folder.Path);

        Diagnostic error = Assert.Single(result.Diagnostics);
        Assert.Equal(("missing-column", message, 2, 1), (error.Code, error.Message, error.Location.Line, error.Location.Column));
        Assert.Equal("the header must be source,systematic,unit (note optional), in any order", error.Hint);
        Assert.Empty(result.SourceSystematics);
    }

    [Theory]
    [InlineData("")]
    [InlineData("# calibrations, to come\n")]
    public void Read_AnEmptyFileNamesTheSourcesHeader(string content)
    {
        _folder.Write("lab.csv", Data);
        string sources = _folder.Write("sources.csv", content);

        Diagnostic error = Assert.Single(NetworkReader.Read(_folder.Path).Diagnostics);

        Assert.Equal(("empty-file", sources), (error.Code, error.Location.File));
        Assert.Equal("the first non-comment line must be the header: source,systematic,unit,note", error.Hint);
    }

    [Fact]
    public void Read_RepeatedColumnIsAnError_UnknownColumnAWarning()
    {
        _folder.Write("lab.csv", Data);
        _folder.Write("sources.csv", "source,systematic,unit,comment,Unit\ngroup A,0.3,kJ/mol,x,kcal/mol\n");

        NetworkReadResult result = NetworkReader.Read(_folder.Path);

        Assert.Equal(
            [("unknown-column", Severity.Warning, 24), ("duplicate-column", Severity.Error, 32)],
            result.Diagnostics.Select(diagnostic => (diagnostic.Code, diagnostic.Severity, diagnostic.Location.Column)));
        Assert.Empty(result.SourceSystematics);
    }

    [Fact]
    public void Read_EveryBadRowIsReportedAndTheGoodOnesKept()
    {
        _folder.Write("lab.csv", Data);
        _folder.Write("sources.csv", Header + "\ngroup A,0.3,kJ/mol,\ngroup Z,-1,kJ,\ngroup C,2,J/(mol·K),\n");

        NetworkReadResult result = NetworkReader.Read(_folder.Path);

        Assert.Equal(
            [("unknown-source", 3, 1), ("bad-systematic", 3, 9), ("unknown-unit", 3, 12)],
            result.Errors.Select(error => (error.Code, error.Location.Line, error.Location.Column)));
        Assert.Equal(["group A", "group C"], result.SourceSystematics.Select(declared => declared.Source));
    }

    private static int ColumnOf(string line, string marker)
    {
        int index = line.IndexOf(marker, StringComparison.Ordinal);
        Assert.True(index >= 0, $"'{marker}' not in '{line}'");
        return index + 1;
    }
}
