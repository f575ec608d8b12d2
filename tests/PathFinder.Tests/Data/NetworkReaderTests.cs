using System.Text;
using PathFinder.Chemistry;
using PathFinder.Data;
using PathFinder.Diagnostics;
using PathFinder.Quantities;
using PathFinder.Tests.TestSupport;

namespace PathFinder.Tests.Data;

public sealed class NetworkReaderTests : IDisposable
{
    private const string Header = "id,equation,property,value,uncertainty,unit,temperature,source";
    private const string GoodRow = "m1,CO(g) + 1/2 O2(g) -> CO2(g),dH,-283.0,0.2,kJ/mol,,lab";

    private readonly TempFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    // ---- one precise diagnostic per error class ----

    [Theory]
    [InlineData("m1,CH4(g) + 2 O2(g) -> CO2(g) + H2O(l),dH,-890.6,0.4,kJ/mol,,lab", "unbalanced-equation", "CH4(g)")]
    [InlineData("m1,Xy2O(g),dH,-100.0,1.0,kJ/mol,,lab", "unknown-element", "Xy2O")]
    [InlineData("m1,CO(g) + 1/2 Qq2(g) -> CO2(g),dH,-283.0,0.2,kJ/mol,,lab", "unknown-element", "Qq2")]
    [InlineData("m1,CO(g) + 1/2 O2(g) -> CO2(g),dH,abc,0.2,kJ/mol,,lab", "bad-number", "abc")]
    [InlineData("m1,CO(g) + 1/2 O2(g) -> CO2(g),dH,NaN,0.2,kJ/mol,,lab", "bad-number", "NaN")]
    [InlineData("m1,CO(g) + 1/2 O2(g) -> CO2(g),dH,Infinity,0.2,kJ/mol,,lab", "bad-number", "Infinity")]
    [InlineData("m1,CO(g) + 1/2 O2(g) -> CO2(g),dH,-1e400,0.2,kJ/mol,,lab", "bad-number", "-1e400")]
    [InlineData("m1,CO(g) + 1/2 O2(g) -> CO2(g),dH,-283.0,NaN,kJ/mol,,lab", "bad-number", "NaN")]
    [InlineData("m1,CO(g) + 1/2 O2(g) -> CO2(g),dH,-283.0,,kJ/mol,,lab", "missing-number", ",kJ/mol")]
    [InlineData("m1,CO(g) + 1/2 O2(g) -> CO2(g),dH,-283.0,-0.2,kJ/mol,,lab", "bad-uncertainty", "-0.2")]
    [InlineData("m1,CO(g) + 1/2 O2(g) -> CO2(g),dH,-283.0,0,kJ/mol,,lab", "bad-uncertainty", "0,kJ")]
    [InlineData("m1,CO(g) + 1/2 O2(g) -> CO2(g),dH,-283.0,0.2,kJ/fortnight,,lab", "unknown-unit", "kJ/fortnight")]
    [InlineData("m1,CO(g) + 1/2 O2(g) -> CO2(g),dH,-283.0,0.2,J/(mol·K),,lab", "wrong-unit", "J/(mol·K)")]
    [InlineData("m1,CO(g) + 1/2 O2(g) -> CO2(g),dS,-86.4,0.2,kJ/mol,,lab", "wrong-unit", "kJ/mol")]
    [InlineData("m1,CO(g) + 2 H2(g) -> CH3OH(g),lnK,-1.2,0.1,kJ/mol,450,lab", "wrong-unit", "kJ/mol")]
    [InlineData("m1,CO(g) + 2 H2(g) -> CH3OH(g),log10K,-1.2,0.1,J/(mol·K),450,lab", "wrong-unit", "J/(mol·K)")]
    [InlineData("m1,CO(g) + 2 H2(g) -> CH3OH(g),dG,-25.1,0.4,1,,lab", "wrong-unit", "1,,lab")]
    [InlineData("m1,Ca(OH2(cr) -> CaO(cr) + H2O(l),dH,109.0,1.0,kJ/mol,,lab", "bad-formula", "(OH2")]
    [InlineData("m1,CH4(g) + 2 O2(g) CO2(g) + 2 H2O(l),dH,-890.6,0.4,kJ/mol,,lab", "missing-arrow", "CO2(g)")]
    [InlineData("m1,CH4 + 2 O2(g) -> CO2(g) + 2 H2O(l),dH,-890.6,0.4,kJ/mol,,lab", "missing-state", " + 2 O2")]
    [InlineData("m1,Fe3+(aq),dH,-48.5,1.0,kJ/mol,,lab", "ambiguous-charge", "3+")]
    [InlineData("m1,CO(g) + 1/2 O2(g) -> CO2(g),dH,-283.0,0.2,kJ/mol,-5,lab", "bad-temperature", "-5")]
    [InlineData("m1,CO(g) + 1/2 O2(g) -> CO2(g),dH,-283.0,0.2,kJ/mol,0,lab", "bad-temperature", "0,lab")]
    [InlineData("m1,CO(g) + 1/2 O2(g) -> CO2(g),dH,-283.0,0.2,kJ/mol,20000,lab", "bad-temperature", "20000")]
    [InlineData("m1,CO(g) + 1/2 O2(g) -> CO2(g),dH,-283.0,0.2,kJ/mol,1e-300,lab", "bad-temperature", "1e-300")]
    [InlineData("m1,CO(g) + 1/2 O2(g) -> CO2(g),dH,-283.0,0.2,kJ/mol,0.5,lab", "bad-temperature", "0.5")]
    [InlineData("m1,CO(g) + 1/2 O2(g) -> CO2(g),dH,1e300,0.2,kcal/mol,,lab", "value-out-of-range", "1e300")]
    [InlineData("m1,CO(g) + 1/2 O2(g) -> CO2(g),dH,1e308,0.2,kJ/mol,,lab", "value-out-of-range", "1e308")]
    [InlineData("m1,CO(g) + 1/2 O2(g) -> CO2(g),dH,-2e8,0.2,J/mol,,lab", "value-out-of-range", "-2e8")]
    [InlineData("m1,CO(g) + 1/2 O2(g) -> CO2(g),dH,-2000,0.2,eV,,lab", "value-out-of-range", "-2000")]
    [InlineData("m1,CO(g) + 1/2 O2(g) -> CO2(g),lnK,2000,0.2,,,lab", "value-out-of-range", "2000")]
    [InlineData("m1,CO(g) + 1/2 O2(g) -> CO2(g),log10K,500,0.2,,,lab", "value-out-of-range", "500")]
    [InlineData("m1,CO2(g),S,2e5,1,J/(mol·K),,lab", "value-out-of-range", "2e5")]
    [InlineData("m1,CO(g) + 1/2 O2(g) -> CO2(g),dH,-283.0,1e-300,kJ/mol,,lab", "uncertainty-out-of-range", "1e-300")]
    [InlineData("m1,CO(g) + 1/2 O2(g) -> CO2(g),dH,-283.0,1e-7,kJ/mol,,lab", "uncertainty-out-of-range", "1e-7")]
    [InlineData("m1,CO(g) + 1/2 O2(g) -> CO2(g),dH,-90000,5e-5,kJ/mol,,lab", "uncertainty-out-of-range", "5e-5")]
    [InlineData("m1,CO(g) + 1/2 O2(g) -> CO2(g),dH,-283.0,1e6,kJ/mol,,lab", "uncertainty-out-of-range", "1e6")]
    [InlineData("m1,CO(g) + 1/2 O2(g) -> CO2(g),dX,-283.0,0.2,kJ/mol,,lab", "unknown-property", "dX")]
    [InlineData(",CO(g) + 1/2 O2(g) -> CO2(g),dH,-283.0,0.2,kJ/mol,,lab", "missing-id", "")]
    [InlineData("m\u001b[2J1,CO(g) + 1/2 O2(g) -> CO2(g),dH,-283.0,0.2,kJ/mol,,lab", "control-character-in-id", "\u001b")]
    [InlineData("\"m\u001b]0;pwned\u0007\",CO(g) + 1/2 O2(g) -> CO2(g),dH,-283.0,0.2,kJ/mol,,lab", "control-character-in-id", "\u001b")]
    [InlineData("\"m\n1\",CO(g) + 1/2 O2(g) -> CO2(g),dH,-283.0,0.2,kJ/mol,,lab", "control-character-in-id", "\n")]
    [InlineData("m\t1,CO(g) + 1/2 O2(g) -> CO2(g),dH,-283.0,0.2,kJ/mol,,lab", "control-character-in-id", "\t")]
    [InlineData("m\u202e1,CO(g) + 1/2 O2(g) -> CO2(g),dH,-283.0,0.2,kJ/mol,,lab", "control-character-in-id", "\u202e")]
    [InlineData("m1,,dH,-283.0,0.2,kJ/mol,,lab", "missing-equation", ",dH")]
    [InlineData("m1,O2(g),dH,1.0,0.2,kJ/mol,,lab", "reference-formation", "O2(g)")]
    public void Read_GivesExactlyOneDiagnosticAtTheFaultyField(string row, string code, string marker)
    {
        // Given a file whose only data row has one mistake
        string file = _folder.Write("lab.csv", Header + "\n" + row + "\n");

        // When it is read
        NetworkReadResult result = NetworkReader.Read(file);

        // Then there is exactly one diagnostic, an error with the code, on line 2, at the column of the faulty text
        Diagnostic diagnostic = Assert.Single(result.Diagnostics);
        Assert.Equal(Severity.Error, diagnostic.Severity);
        Assert.Equal(code, diagnostic.Code);
        Assert.Equal(file, diagnostic.Location.File);
        Assert.Equal(2, diagnostic.Location.Line);
        Assert.Equal(ColumnOf(row, marker), diagnostic.Location.Column);
        Assert.Empty(result.Network.Measurements);
        Assert.True(result.HasErrors);
    }

    [Fact]
    public void Read_RefusesAFormulaNestedThousandsOfLevelsDeepAtItsField()
    {
        // Given a row whose formula nests brackets 6,000 levels deep (it once overflowed the stack)
        string formula = new string('(', 6000) + "H" + new string(')', 6000) + "2";
        string file = _folder.Write("lab.csv", Header + "\nm1,H2(g) -> " + formula + "(g),dH,0.5,0.2,kJ/mol,,lab\n");

        // When it is read
        Diagnostic diagnostic = Assert.Single(NetworkReader.Read(file).Diagnostics);

        // Then one located error points at the first bracket too deep
        Assert.Equal(("bad-formula", 2), (diagnostic.Code, diagnostic.Location.Line));
        Assert.Equal("m1,H2(g) -> ".Length + 1 + FormulaParser.MaxNesting, diagnostic.Location.Column);
    }

    [Theory]
    [InlineData("dH,-99999,1e-4,kJ/mol,")]
    [InlineData("dH,-283.0,1e-6,kJ/mol,")]
    [InlineData("dH,-67.6,0.05,kcal/mol,")]
    [InlineData("dH,-2.93,0.001,eV,")]
    [InlineData("dH,-283.0,0.2,kJ/mol,1")]
    [InlineData("dH,-283.0,0.2,kJ/mol,10000")]
    [InlineData("lnK,999,0.5,,")]
    [InlineData("log10K,-434,0.5,1,")]
    public void Read_AcceptsMagnitudesAtTheEdgesOfTheRanges(string fields)
    {
        // Given one row near an edge of the accepted ranges (README, data format)
        string file = _folder.Write("lab.csv", Header + "\nm1,CO(g) + 1/2 O2(g) -> CO2(g)," + fields + ",lab\n");

        // When it is read, then it is used without an error
        NetworkReadResult result = NetworkReader.Read(file);
        Assert.Empty(result.Errors);
        Assert.Single(result.Network.Measurements);
    }

    [Fact]
    public void Read_SaysTheConvertedValueWhenAUnitMakesItTooLarge()
    {
        string file = _folder.Write("lab.csv", Header + "\nm1,CO(g) + 1/2 O2(g) -> CO2(g),dH,1e300,0.2,kcal/mol,,lab\n");

        Diagnostic diagnostic = Assert.Single(NetworkReader.Read(file).Diagnostics);

        Assert.Equal("the ΔH value 1e+300 kcal/mol (4.184e+300 kJ/mol) is beyond the accepted ±100000 kJ/mol", diagnostic.Message);
        Assert.Contains("check the unit and the exponent", diagnostic.Hint, StringComparison.Ordinal);
    }

    [Fact]
    public void Read_WarnsOnTheRowThatARowAmongConventionalZerosIsNotUsed()
    {
        // Given the hydrogen-electrode convention measured as a row beside a real one
        string file = _folder.Write("lab.csv", Header + "\n" + GoodRow + "\nm2,H+(aq) + e- -> 1/2 H2(g),dH,0.0,0.1,kJ/mol,,lab\n");

        // When it is read
        NetworkReadResult result = NetworkReader.Read(file);

        // Then the row is valid, but a warning on it says it only checks a convention and is used by no analysis
        Assert.False(result.HasErrors);
        Diagnostic warning = Assert.Single(result.UnusedRows);
        Assert.Equal(("conventional-only", Severity.Warning, 3, 4), (warning.Code, warning.Severity, warning.Location.Line, warning.Location.Column));
        Assert.Contains("not used by any analysis", warning.Message, StringComparison.Ordinal);
        Assert.Contains(result.Warnings, diagnostic => diagnostic.Code == "conventional-only");
    }

    [Fact]
    public void Read_RefusesAHeaderNamingAColumnTwiceAtTheSecond()
    {
        // Given a header with 'value' twice (the first column used to win silently)
        string file = _folder.Write("lab.csv", "id,equation,property,value,uncertainty,Value\nm1,CO(g) + 1/2 O2(g) -> CO2(g),dH,-283.0,0.2,-67.6\n");

        // When it is read
        Diagnostic error = Assert.Single(NetworkReader.Read(file).Diagnostics);

        // Then one error at the second 'value'
        Assert.Equal(("duplicate-column", Severity.Error, 1, 40), (error.Code, error.Severity, error.Location.Line, error.Location.Column));
        Assert.Contains("'Value' appears twice (first at column 22)", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Read_AcceptsSeveralBlankHeaderNames()
    {
        // Given a spreadsheet export with trailing empty columns
        string file = _folder.Write("lab.csv", Header + ",,\n" + GoodRow + ",,\n");

        // When it is read, then blank names are no duplicates
        Assert.DoesNotContain(NetworkReader.Read(file).Diagnostics, diagnostic => diagnostic.Code == "duplicate-column");
    }

    [Fact]
    public void Read_NamesSkippedEntriesOfAFolderInNotesAndReadsAnUpperCaseExtension()
    {
        // Given a folder whose data are in DATA.CSV, with a spreadsheet lock file and a subfolder beside
        _folder.Write("DATA.CSV", Header + "\n" + GoodRow + "\n");
        _folder.Write("~$DATA.CSV", "\u0001binary lock\n");
        Directory.CreateDirectory(Path.Combine(_folder.Path, "archive"));

        // When it is read
        NetworkReadResult result = NetworkReader.Read(_folder.Path);

        // Then the data are used, the folder stays valid, and the two entries are named in notes
        Assert.False(result.HasErrors);
        Assert.Single(result.Network.Measurements);
        Assert.Equal(["archive", "~$DATA.CSV"], result.Notes.Select(note => Path.GetFileName(note.Location.File)));
        Assert.All(result.Notes, note => Assert.Equal("skipped-file", note.Code));
        Assert.DoesNotContain(result.Warnings, warning => warning.Code == "skipped-file");
    }

    [Fact]
    public void Read_RefusesAFifoGivenAsTheNetworkWithoutBlocking()
    {
        string fifo = SpecialFiles.Fifo(Path.Combine(_folder.Path, "pipe.csv"));

        Diagnostic error = Assert.Single(NetworkReader.Read(fifo).Diagnostics);

        Assert.Equal(("not-a-regular-file", Severity.Error), (error.Code, error.Severity));
    }

    [Theory]
    [InlineData("property")]
    [InlineData("unit")]
    [InlineData("value")]
    [InlineData("equation")]
    public void Read_CutsA100000CharacterValueIn80CharacterMessages(string column)
    {
        // Given one field of 100,000 characters (its text used to be echoed in full)
        char letter = column == "equation" ? 'H' : 'x';
        string huge = new string(letter, 100_000);
        string row = column switch
        {
            "property" => $"m1,CO(g) + 1/2 O2(g) -> CO2(g),{huge},-283.0,0.2,kJ/mol,,lab",
            "unit" => $"m1,CO(g) + 1/2 O2(g) -> CO2(g),dH,-283.0,0.2,{huge},,lab",
            "value" => $"m1,CO(g) + 1/2 O2(g) -> CO2(g),dH,{huge},0.2,kJ/mol,,lab",
            _ => $"m1,CO(g) + 1/2 O2(g) -> {huge},dH,-283.0,0.2,kJ/mol,,lab",
        };
        string file = _folder.Write("lab.csv", Header + "\n" + row + "\n");

        // When it is read
        Diagnostic diagnostic = Assert.Single(NetworkReader.Read(file).Errors);

        // Then the message quotes at most 80 characters of it, ending in an ellipsis
        Assert.True(diagnostic.Message.Length + diagnostic.Hint.Length < 500, $"{diagnostic.Message.Length} + {diagnostic.Hint.Length} characters");
        Assert.Contains(new string(letter, 79) + "…", diagnostic.Message + diagnostic.Hint, StringComparison.Ordinal);
    }

    [Fact]
    public void Read_SpellsOutTheImbalance()
    {
        string file = _folder.Write("lab.csv", Header + "\nm1,CH4(g) + 2 O2(g) -> CO2(g) + H2O(l),dH,-890.6,0.4,kJ/mol,,lab\n");

        Diagnostic diagnostic = Assert.Single(NetworkReader.Read(file).Diagnostics);

        Assert.Equal("the equation is not balanced: left has 4 H, right has 2 H; left has 4 O, right has 3 O", diagnostic.Message);
        Assert.Equal("equation", diagnostic.Location.Field);
        Assert.Equal(4, diagnostic.Location.Column);
    }

    [Fact]
    public void Read_ReportsChargeImbalance()
    {
        string file = _folder.Write("lab.csv", Header + "\nm1,Na(cr) -> Na+(aq),dH,-240.1,0.2,kJ/mol,,lab\n");

        Diagnostic diagnostic = Assert.Single(NetworkReader.Read(file).Diagnostics);

        Assert.Equal("unbalanced-equation", diagnostic.Code);
        Assert.Equal("the equation is not balanced: left has charge 0, right has charge +1", diagnostic.Message);
    }

    [Fact]
    public void Read_KeepsTheColumnRightWhenTheEquationHasLeadingSpaces()
    {
        string row = "m1,   Xy2O(g),dH,-100.0,1.0,kJ/mol,,lab";
        string file = _folder.Write("lab.csv", Header + "\n" + row + "\n");

        Diagnostic diagnostic = Assert.Single(NetworkReader.Read(file).Diagnostics);

        Assert.Equal(ColumnOf(row, "Xy2O"), diagnostic.Location.Column);
    }

    [Fact]
    public void Read_NotFiniteNumbersGetTheirOwnMessage()
    {
        string file = _folder.Write("lab.csv", Header + "\nm1,CO(g) + 1/2 O2(g) -> CO2(g),dH,NaN,0.2,kJ/mol,,lab\n");

        Diagnostic diagnostic = Assert.Single(NetworkReader.Read(file).Diagnostics);

        Assert.Equal("the value 'NaN' is not a finite number", diagnostic.Message);
    }

    [Fact]
    public void Read_ReportsADuplicateIdAtTheSecondUse()
    {
        // Given two rows with the same id
        string file = _folder.Write("lab.csv", Header + "\n" + GoodRow + "\nm1,CO2(g),dH,-393.51,0.13,kJ/mol,,lab\n");

        // When read
        NetworkReadResult result = NetworkReader.Read(file);

        // Then the second row is refused with a pointer to the first
        Diagnostic error = Assert.Single(result.Errors);
        Assert.Equal("duplicate-id", error.Code);
        Assert.Equal(3, error.Location.Line);
        Assert.Equal(1, error.Location.Column);
        Assert.Equal($"measurement id 'm1' was already used at {file}:2:1", error.Message);
        Assert.Single(result.Network.Measurements);
    }

    [Fact]
    public void Read_ReportsADuplicateIdEvenWhenTheFirstRowIsInvalid()
    {
        // Given a first row with an impossible temperature and a second row reusing its id
        string file = _folder.Write("lab.csv", Header + "\n"
            + "T07,H2O(l) -> H2O(g),dH,44.0,0.1,kJ/mol,-5,lab\n"
            + "T07,C2H4(g) + H2(g) -> C2H6(g),dH,-136.3,0.4,kJ/mol,,lab\n");

        // When read
        NetworkReadResult result = NetworkReader.Read(file);

        // Then each row has exactly its own error
        Assert.Equal([("bad-temperature", 2), ("duplicate-id", 3)], result.Diagnostics.Select(d => (d.Code, d.Location.Line)));
        Assert.Empty(result.Network.Measurements);
    }

    [Fact]
    public void Read_ReportsDuplicateIdsAcrossFilesOfAFolder()
    {
        _folder.Write("a.csv", Header + "\n" + GoodRow + "\n");
        string second = _folder.Write("b.csv", Header + "\nm1,CO2(g),dH,-393.51,0.13,kJ/mol,,lab\n");

        Diagnostic error = Assert.Single(NetworkReader.Read(_folder.Path).Errors);

        Assert.Equal("duplicate-id", error.Code);
        Assert.Equal(second, error.Location.File);
    }

    [Fact]
    public void Read_ReportsAMissingRequiredColumnOnTheHeaderLine()
    {
        string file = _folder.Write("lab.csv", "# notes first\nid,equation,property,value,unit\nm1,CO2(g),dH,-393.51,kJ/mol\n");

        Diagnostic diagnostic = Assert.Single(NetworkReader.Read(file).Diagnostics);

        Assert.Equal("missing-column", diagnostic.Code);
        Assert.Equal("missing required column(s): uncertainty", diagnostic.Message);
        Assert.Equal((2, 1), (diagnostic.Location.Line, diagnostic.Location.Column));
    }

    [Theory]
    [InlineData("")]
    [InlineData("\n\n")]
    [InlineData("# only a comment\n# and another\n")]
    public void Read_ReportsAnEmptyFile(string content)
    {
        string file = _folder.Write("lab.csv", content);

        Diagnostic diagnostic = Assert.Single(NetworkReader.Read(file).Diagnostics);

        Assert.Equal("empty-file", diagnostic.Code);
        Assert.Equal(file, diagnostic.Location.File);
    }

    [Fact]
    public void Read_ReportsABinaryFile()
    {
        string file = _folder.WriteBytes("lab.csv", [0x50, 0x4B, 0x03, 0x04, 0x00, 0x00, 0x08, 0x00]);

        Diagnostic diagnostic = Assert.Single(NetworkReader.Read(file).Diagnostics);

        Assert.Equal("binary-file", diagnostic.Code);
    }

    [Fact]
    public void Read_ReportsAFileThatIsNotUtf8()
    {
        // "é" in Latin-1 (0xE9) is not valid UTF-8
        byte[] content = [.. Encoding.ASCII.GetBytes(Header + "\nm1,CO2(g),dH,-393.51,0.13,kJ/mol,,caf"), 0xE9, (byte)'\n'];
        string file = _folder.WriteBytes("lab.csv", content);

        Diagnostic diagnostic = Assert.Single(NetworkReader.Read(file).Diagnostics);

        Assert.Equal("not-utf8", diagnostic.Code);
    }

    [Fact]
    public void Read_ReportsAMissingPath()
    {
        NetworkReadResult result = NetworkReader.Read(Path.Combine(_folder.Path, "nowhere.csv"));

        Assert.Equal("not-found", Assert.Single(result.Diagnostics).Code);
        Assert.Empty(result.Network.Measurements);
    }

    [Fact]
    public void Read_ReportsAFolderWithoutMeasurementFiles()
    {
        _folder.Write("species.csv", "key,formula,state,name\n");

        Assert.Equal("empty-network", Assert.Single(NetworkReader.Read(_folder.Path).Diagnostics).Code);
    }

    [Fact]
    public void Read_ReportsADecimalCommaInACommaFileAsExtraFields()
    {
        string file = _folder.Write("lab.csv", "id,equation,property,value,uncertainty\nm1,CO2(g),dH,-393,51,0.13\n");

        Diagnostic diagnostic = Assert.Single(NetworkReader.Read(file).Diagnostics);

        Assert.Equal("extra-fields", diagnostic.Code);
        Assert.Contains("decimal comma", diagnostic.Hint, StringComparison.Ordinal);
    }

    [Fact]
    public void Read_KeepsTheValidRowsWhenOthersAreBad()
    {
        string file = _folder.Write("lab.csv", Header + "\n" + GoodRow + "\nm2,Xy(g),dH,1,1,kJ/mol,,lab\nm3,CO2(g),dH,-393.51,0.13,kJ/mol,,lab\n");

        NetworkReadResult result = NetworkReader.Read(file);

        Assert.Equal(["m1", "m3"], result.Network.Measurements.Select(m => m.Id));
        Assert.Equal(3, Assert.Single(result.Errors).Location.Line);
    }

    // ---- warnings ----

    [Theory]
    [InlineData("2 H2(g) + O2(g) -> 2 H2O(l)")]
    [InlineData("H2(g) + 1/2 O2(g) -> H2O(l)")]
    [InlineData("H2O(l)")]
    public void Read_WarnsAboutARepeatedMeasurementInOneSource(string repeat)
    {
        // Given the same reaction twice in one source (the second possibly a scaled copy or the shorthand)
        string file = _folder.Write("lab.csv", Header + "\n"
            + "w1,H2(g) + 1/2 O2(g) -> H2O(l),dH,-285.83,0.04,kJ/mol,,lab\n"
            + $"w2,{repeat},dH,-571.66,0.08,kJ/mol,,lab\n");

        // When read
        NetworkReadResult result = NetworkReader.Read(file);

        // Then one warning names both ids on the second row, and both measurements are kept
        Diagnostic warning = Assert.Single(result.Diagnostics);
        Assert.Equal(Severity.Warning, warning.Severity);
        Assert.Equal("repeated-measurement", warning.Code);
        Assert.Equal(3, warning.Location.Line);
        Assert.Equal("'w2' measures the same reaction at the same temperature as 'w1' in source 'lab'", warning.Message);
        Assert.Equal(2, result.Network.Measurements.Count);
        Assert.False(result.HasErrors);
    }

    [Theory]
    [InlineData("lab", "other", "dH")]
    [InlineData("lab", "lab", "dG")]
    public void Read_DoesNotWarnForTheSameReactionInAnotherSourceOrProperty(string firstSource, string secondSource, string secondProperty)
    {
        string file = _folder.Write("lab.csv", Header + "\n"
            + $"w1,H2(g) + 1/2 O2(g) -> H2O(l),dH,-285.83,0.04,kJ/mol,,{firstSource}\n"
            + $"w2,H2(g) + 1/2 O2(g) -> H2O(l),{secondProperty},-237.1,0.1,kJ/mol,,{secondSource}\n");

        Assert.Empty(NetworkReader.Read(file).Diagnostics);
    }

    [Fact]
    public void Read_WarnsAboutAFarTemperatureWithoutHeatCapacityData()
    {
        string file = _folder.Write("lab.csv", Header + "\n"
            + "w1,H2(g) + 1/2 O2(g) -> H2O(l),dH,-285.83,0.04,kJ/mol,400.5,a\n"
            + "w2,H2(g) + 1/2 O2(g) -> H2O(l),dH,-285.83,0.04,kJ/mol,,b\n");

        Diagnostic warning = Assert.Single(NetworkReader.Read(file).Diagnostics);

        Assert.Equal("no-heat-capacity", warning.Code);
        Assert.Equal(2, warning.Location.Line);
        Assert.Equal("temperature", warning.Location.Field);
        Assert.StartsWith("'w1' was measured at 400.5 K", warning.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("305")]
    [InlineData("298.15")]
    public void Read_DoesNotWarnNearTheStandardTemperature(string temperature)
    {
        string file = _folder.Write("lab.csv", Header + "\n"
            + $"w1,H2(g) + 1/2 O2(g) -> H2O(l),dH,-285.83,0.04,kJ/mol,{temperature},a\n"
            + "w2,H2(g) + 1/2 O2(g) -> H2O(l),dH,-285.83,0.04,kJ/mol,,b\n");

        NetworkReadResult result = NetworkReader.Read(file);

        Assert.Empty(result.Diagnostics);
        Assert.Equal(double.Parse(temperature, System.Globalization.CultureInfo.InvariantCulture), result.Network["w1"].Temperature, 12);
    }

    [Fact]
    public void Read_DoesNotWarnAboutTemperatureWhenHeatCapacityDataIsBeside()
    {
        string file = _folder.Write("lab.csv", Header + "\n"
            + "w1,H2(g) + 1/2 O2(g) -> H2O(l),dH,-285.83,0.04,kJ/mol,400,a\n"
            + "w2,H2(g) + 1/2 O2(g) -> H2O(l),dH,-285.83,0.04,kJ/mol,,b\n");
        string heatCapacity = _folder.Write("lab.heat-capacity.csv", "species,form,tmin,tmax,c1\nH2(g),constant,200,1000,28.8\nO2(g),constant,200,1000,29.4\nH2O(l),constant,273,500,75.3\n");

        NetworkReadResult result = NetworkReader.Read(file);

        Assert.Empty(result.Diagnostics);
        Assert.Equal(heatCapacity, result.HeatCapacityFile);
    }

    [Fact]
    public void Read_WarnsAboutASpeciesUsedOnlyOnce()
    {
        string file = _folder.Write("lab.csv", Header + "\n" + GoodRow + "\nm2,CO2(g),dH,-393.51,0.13,kJ/mol,,lab\n");

        Diagnostic warning = Assert.Single(NetworkReader.Read(file).Diagnostics);

        Assert.Equal("single-use-species", warning.Code);
        Assert.Equal(2, warning.Location.Line);
        Assert.Equal("CO(g) appears only in 'm1': nothing can check that value", warning.Message);
    }

    [Fact]
    public void Read_WarnsAboutMergedSpellings()
    {
        // Given ethanol written two ways and no species.csv
        string file = _folder.Write("lab.csv", Header + "\n"
            + "e1,C2H5OH(l) + 3 O2(g) -> 2 CO2(g) + 3 H2O(l),dH,-1366.8,0.4,kJ/mol,,lab\n"
            + "e2,CH3CH2OH(l) -> C2H4(g) + H2O(l),dH,44.3,0.5,kJ/mol,,lab\n"
            + "e3,C2H4(g) + 3 O2(g) -> 2 CO2(g) + 2 H2O(l),dH,-1411.0,0.4,kJ/mol,,lab\n");

        // When read
        NetworkReadResult result = NetworkReader.Read(file);

        // Then they are one species, and the merge is reported once at its first use
        Diagnostic warning = Assert.Single(result.Diagnostics);
        Assert.Equal("merged-spellings", warning.Code);
        Assert.Equal(2, warning.Location.Line);
        Assert.Equal("C2H5OH, CH3CH2OH in state l have the same composition and are treated as one species", warning.Message);
        Assert.Equal(3, result.Network.Species.Count(species => species.Formula.Composition.ContainsKey("C")));
    }

    // ---- layout of the file ----

    [Fact]
    public void Read_CommentAndBlankLinesKeepLineNumbersRight()
    {
        // Given comments and blank lines before and after the header
        string file = _folder.Write("lab.csv",
            "# lab notebook, page 12\n\n" + Header + "\n# calibrated on Monday\n\n" + GoodRow + "\nm2,CO2(g),dH,-393.51,0.13,kJ/fortnight,,lab\n");

        // When read
        NetworkReadResult result = NetworkReader.Read(file);

        // Then lines count from the top of the file
        Assert.Equal(6, result.Network["m1"].Location.Line);
        Assert.Equal(7, Assert.Single(result.Errors).Location.Line);
    }

    [Fact]
    public void Read_WindowsLineEndingsKeepLineNumbersAndColumnsRight()
    {
        string row = "m2,CO2(g),dH,-393.51,0.13,kJ/fortnight,,lab";
        string file = _folder.Write("lab.csv", "# comment\r\n" + Header + "\r\n" + GoodRow + "\r\n" + row + "\r\n");

        Diagnostic error = Assert.Single(NetworkReader.Read(file).Errors);

        Assert.Equal((4, ColumnOf(row, "kJ/fortnight")), (error.Location.Line, error.Location.Column));
        Assert.Equal("unknown unit 'kJ/fortnight'", error.Message);
    }

    [Fact]
    public void Read_HonoursQuotedFieldsWithCommas()
    {
        // Given a source with a comma and a quoted equation
        string file = _folder.Write("lab.csv", Header + "\n"
            + "m1,\"CO(g) + 1/2 O2(g) -> CO2(g)\",dH,-283.0,0.2,kJ/mol,,\"Harbour, Quay (2021)\"\n"
            + "m2,CO2(g),dH,-393.51,0.13,kJ/mol,,lab\n");

        NetworkReadResult result = NetworkReader.Read(file);

        Assert.Equal("Harbour, Quay (2021)", result.Network["m1"].Source);
        Assert.Equal(-283.0, result.Network["m1"].Value, 12);
    }

    [Fact]
    public void Read_LocatesErrorsInsideAndAfterQuotedFields()
    {
        // Given a quoted note with a comma before a bad unit, and a quoted bad equation
        string header = "id,note,equation,property,value,uncertainty,unit";
        string first = "m1,\"bomb, steel\",CO(g) + 1/2 O2(g) -> CO2(g),dH,-283.0,0.2,kJ/fortnight";
        string second = "m2,\"x\",\"Xy2O(g)\",dH,-100,1,kJ/mol";
        string file = _folder.Write("lab.csv", header + "\n" + first + "\n" + second + "\n");

        // When read
        Diagnostic[] errors = NetworkReader.Read(file).Errors.ToArray();

        // Then columns point into the raw line, inside the quotes
        Assert.Equal(2, errors.Length);
        Assert.Equal(("unknown-unit", 2, ColumnOf(first, "kJ/fortnight")), (errors[0].Code, errors[0].Location.Line, errors[0].Location.Column));
        Assert.Equal(("unknown-element", 3, ColumnOf(second, "Xy2O")), (errors[1].Code, errors[1].Location.Line, errors[1].Location.Column));
    }

    [Fact]
    public void Read_CountsLinesAfterAQuotedFieldSpanningTwoLines()
    {
        string header = "id,equation,property,value,uncertainty,notes";
        string file = _folder.Write("lab.csv", header + "\n"
            + "m1,CO(g) + 1/2 O2(g) -> CO2(g),dH,-283.0,0.2,\"first line\nsecond line\"\n"
            + "m2,CO2(g),dH,-393.51,abc,\n");

        NetworkReadResult result = NetworkReader.Read(file);

        Assert.Equal(2, result.Network["m1"].Location.Line);
        Assert.Equal("first line\nsecond line", result.Network["m1"].Notes["notes"]);
        Assert.Equal(4, Assert.Single(result.Errors).Location.Line);
    }

    [Fact]
    public void Read_SkipsAUtf8ByteOrderMark()
    {
        // Given a spreadsheet export with a BOM before the header
        byte[] content = [0xEF, 0xBB, 0xBF, .. Encoding.UTF8.GetBytes(Header + "\n" + GoodRow + "\nm2,CO2(g),dH,-393.51,0.13,kJ/mol,,lab\n")];
        string file = _folder.WriteBytes("lab.csv", content);

        // When read
        NetworkReadResult result = NetworkReader.Read(file);

        // Then the first header name is 'id', not '\uFEFFid'
        Assert.False(result.HasErrors);
        Assert.Equal(["m1", "m2"], result.Network.Measurements.Select(m => m.Id));
    }

    [Fact]
    public void Read_AcceptsColumnsInAnyOrderAndCase()
    {
        string file = _folder.Write("lab.csv", "Value,ID,Uncertainty,Property,Equation\n-393.51,m1,0.13,dH,CO2(g)\n");

        NetworkReadResult result = NetworkReader.Read(file);

        Assert.False(result.HasErrors);
        Assert.Equal(-393.51, result.Network["m1"].Value, 12);
    }

    [Fact]
    public void Read_KeepsExtraColumnsAsNotes()
    {
        string file = _folder.Write("lab.csv", Header + ",notes,operator\n"
            + GoodRow + ",bomb calorimeter,AK\n"
            + "m2,CO2(g),dH,-393.51,0.13,kJ/mol,,lab,,\n");

        NetworkReadResult result = NetworkReader.Read(file);

        Assert.Equal(2, result.Network["m1"].Notes.Count);
        Assert.Equal("bomb calorimeter", result.Network["m1"].Notes["notes"]);
        Assert.Equal("AK", result.Network["m1"].Notes["operator"]);
        Assert.Empty(result.Network["m2"].Notes);
    }

    [Fact]
    public void Read_DividesTheUncertaintyByTheCoverageFactor()
    {
        // Given an expanded uncertainty with k = 2 (GUM, JCGM 100:2008, 6.2: U = k·u)
        string file = _folder.Write("lab.csv", "id,equation,property,value,uncertainty,unit,coverage\n"
            + "m1,CO(g) + 1/2 O2(g) -> CO2(g),dH,-283.0,0.8,kJ/mol,2\n"
            + "m2,CO2(g),dH,-94.05,0.1,kcal/mol,2\n"
            + "m3,CO(g),dH,-110.5,0.3,kJ/mol,\n");

        NetworkReadResult result = NetworkReader.Read(file);

        // Then the standard uncertainty u = U/k is stored, in canonical units (NIST SP 811: 1 kcal = 4.184 kJ)
        Assert.Equal(0.4, result.Network["m1"].Uncertainty, 12);
        Assert.Equal(0.2092, result.Network["m2"].Uncertainty, 12);
        Assert.Equal(-393.5052, result.Network["m2"].Value, 10);
        Assert.Equal(-94.05, result.Network["m2"].ValueInOriginalUnit, 10);
        Assert.Equal(0.3, result.Network["m3"].Uncertainty, 12);
    }

    [Theory]
    [InlineData("0.5")]
    [InlineData("11")]
    public void Read_RefusesACoverageFactorOutsideOneToTen(string k)
    {
        string row = $"m1,CO2(g),dH,-393.51,0.8,{k}";
        string file = _folder.Write("lab.csv", "id,equation,property,value,uncertainty,coverage\n" + row + "\n");

        Diagnostic diagnostic = Assert.Single(NetworkReader.Read(file).Diagnostics);

        Assert.Equal(("bad-coverage", ColumnOf(row, k)), (diagnostic.Code, diagnostic.Location.Column));
    }

    [Theory]
    [InlineData(Header, "m1,CO2(g),dH,-393.51,0.13,kJ/mol,,")]
    [InlineData("id,equation,property,value,uncertainty", "m1,CO2(g),dH,-393.51,0.13")]
    public void Read_DefaultsTheSourceToTheFileName(string header, string row)
    {
        string file = _folder.Write("bench-7.csv", header + "\n" + row + "\n");

        NetworkReadResult result = NetworkReader.Read(file);

        Assert.Equal("bench-7", result.Network["m1"].Source);
        Assert.Equal(298.15, result.Network["m1"].Temperature, 12);
        Assert.Equal(EnergyUnit.KilojoulePerMole, result.Network["m1"].Unit);
    }

    [Fact]
    public void Read_DefaultsEntropyUnitsToJoulePerMoleKelvin()
    {
        string file = _folder.Write("lab.csv", "id,equation,property,value,uncertainty\nm1,H2O(l),S,69.95,0.03\n");

        NetworkReadResult result = NetworkReader.Read(file);

        Assert.Equal(EnergyUnit.JoulePerMoleKelvin, result.Network["m1"].Unit);
        Assert.Equal(ThermoProperty.AbsoluteEntropy, result.Network["m1"].Property);
    }

    [Fact]
    public void Read_AbsoluteEntropyOfOneSpeciesIsNotAFormation()
    {
        string file = _folder.Write("lab.csv", "id,equation,property,value,uncertainty\nm1,H2O(l),S,69.95,0.03\nm2,H2O(l),dH,-285.83,0.04\n");

        NetworkReadResult result = NetworkReader.Read(file);

        Assert.Single(result.Network["m1"].Equation.Terms);
        Assert.Equal(3, result.Network["m2"].Equation.Terms.Count);
    }

    [Fact]
    public void Read_RefusesAReactionForAbsoluteEntropy()
    {
        string file = _folder.Write("lab.csv", "id,equation,property,value,uncertainty\nm1,H2O(l) -> H2O(g),S,118.9,0.1\n");

        Diagnostic diagnostic = Assert.Single(NetworkReader.Read(file).Diagnostics);

        Assert.Contains("use dS for a reaction entropy", diagnostic.Hint, StringComparison.Ordinal);
    }

    // ---- culture ----

    [Fact]
    public void Read_GivesTheSameNumbersUnderACommaDecimalCulture()
    {
        // Given a file with decimal points, read once invariantly
        string file = _folder.Write("lab.csv", Header + "\n" + GoodRow + "\nm2,CO2(g),dH,-393.51,0.13,kcal/mol,400.5,lab\nm3,CO(g),dH,-110.53,-0.5,kJ/mol,,lab\n");
        NetworkReadResult invariant = NetworkReader.Read(file);

        // When read again with the current culture set to German (decimal comma)
        NetworkReadResult german;
        using (new CultureScope("de-DE"))
        {
            Assert.Equal(",", System.Globalization.CultureInfo.CurrentCulture.NumberFormat.NumberDecimalSeparator);
            german = NetworkReader.Read(file);
        }

        // Then values, uncertainties, temperatures and messages are identical
        Assert.Equal(-283.0, german.Network["m1"].Value, 12);
        Assert.Equal(-393.51 * 4.184, german.Network["m2"].Value, 10);
        Assert.Equal(400.5, german.Network["m2"].Temperature, 12);
        Assert.Equal(invariant.Network.Measurements.Select(m => (m.Id, m.Value, m.Uncertainty, m.Temperature)), german.Network.Measurements.Select(m => (m.Id, m.Value, m.Uncertainty, m.Temperature)));
        Assert.Equal(invariant.Diagnostics.Select(d => d.ToString()), german.Diagnostics.Select(d => d.ToString()));
        Assert.Contains(german.Diagnostics, d => d.Message == "the uncertainty must be positive, not -0.5");
        Assert.Contains(german.Diagnostics, d => d.Message.StartsWith("'m2' was measured at 400.5 K", StringComparison.Ordinal));
    }

    [Fact]
    public void Read_ReadsASemicolonFileWithDecimalCommasAndSaysSoOnce()
    {
        // Given a comma-decimal spreadsheet export: semicolons between fields, decimal commas in numbers
        string file = _folder.Write("lab.csv",
            "id;equation;property;value;uncertainty;unit;temperature;source\n"
            + "m1;CO(g) + 1/2 O2(g) -> CO2(g);dH;-283,0;0,2;kJ/mol;;Harbour, Quay\n"
            + "m2;CO2(g);dH;-393,51;0,13;kJ/mol;305,5;lab\n"
            + "m3;CO(g);dH;-110,53;0,17;kJ/mol;;lab\n");

        // When read (also under a comma-decimal culture, which must not matter)
        NetworkReadResult result;
        using (new CultureScope("de-DE"))
        {
            result = NetworkReader.Read(file);
        }

        // Then the numbers are right and one decimal-comma warning is given on the header
        Assert.Equal(-283.0, result.Network["m1"].Value, 12);
        Assert.Equal(0.2, result.Network["m1"].Uncertainty, 12);
        Assert.Equal(-393.51, result.Network["m2"].Value, 12);
        Assert.Equal(0.13, result.Network["m2"].Uncertainty, 12);
        Assert.Equal(305.5, result.Network["m2"].Temperature, 12);
        Assert.Equal("Harbour, Quay", result.Network["m1"].Source);
        Diagnostic warning = Assert.Single(result.Diagnostics);
        Assert.Equal(("decimal-comma", Severity.Warning, 1), (warning.Code, warning.Severity, warning.Location.Line));
    }

    // ---- species.csv ----

    [Fact]
    public void Read_ResolvesDeclaredKeysAndRefusesAmbiguousIsomers()
    {
        // Given ethanol and dimethyl ether declared as C2H6O(g) isomers
        _folder.Write("species.csv", "key,formula,state,name\nEtOH,C2H5OH,g,ethanol(g)\nDME,CH3OCH3,g,dimethyl ether(g)\n");
        string row = "m3,C2H6O(g) + 3 O2(g) -> 2 CO2(g) + 3 H2O(l),dH,-1400,1,kJ/mol,,lab";
        string file = _folder.Write("lab.csv", Header + "\n"
            + "m1,DME + 3 O2(g) -> 2 CO2(g) + 3 H2O(l),dH,-1460.4,0.6,kJ/mol,,lab\n"
            + "m2,EtOH + 3 O2(g) -> 2 CO2(g) + 3 H2O(l),dH,-1409.4,0.6,kJ/mol,,lab\n"
            + row + "\n");

        // When the folder is read
        NetworkReadResult result = NetworkReader.Read(_folder.Path);

        // Then the keys resolve to different species and the bare formula is ambiguous
        Assert.NotEqual(result.Network["m1"].Equation.Terms[0].Species, result.Network["m2"].Equation.Terms[0].Species);
        Assert.Equal("DME", result.Network["m1"].Equation.Terms[0].Species.Name);
        Assert.Equal("dimethyl ether(g)", result.Network["m1"].Equation.Terms[0].Species.Description);
        Diagnostic error = Assert.Single(result.Errors);
        Assert.Equal(("ambiguous-species", 4, ColumnOf(row, "C2H6O")), (error.Code, error.Location.Line, error.Location.Column));
        Assert.Equal("'C2H6O(g)' matches several declared isomers: EtOH, DME", error.Message);
        Assert.Equal(Path.Combine(_folder.Path, "species.csv"), result.SpeciesFile);
    }

    [Fact]
    public void Read_ResolvesAFormulaMatchingOneDeclaredSpecies()
    {
        string file = _folder.Write("lab.csv", Header + "\nm1,CH3CH2OH(l) + 3 O2(g) -> 2 CO2(g) + 3 H2O(l),dH,-1366.8,0.4,kJ/mol,,lab\n");
        _folder.Write("lab.species.csv", "key,formula,state,name\nEtOH,C2H5OH,l,ethanol\n");

        NetworkReadResult result = NetworkReader.Read(file);

        Assert.Equal("EtOH", result.Network["m1"].Equation.Terms[0].Species.Name);
        Assert.Equal("ethanol", result.Network["m1"].Equation.Terms[0].Species.Description);
        Assert.Equal("EtOH", result.Network["m1"].Equation.Terms[0].Species.Label);
    }

    // ---- typos that parse, values far outside their property's range (issue 16) ----

    /// <summary>Rows that parse and balance but hold a likely typo; the second row, when given, uses the intended species.</summary>
    [Theory]
    [InlineData("m1,H20(g),dH,-241.8,0.1,kJ/mol,,lab", "m2,H2(g) + 1/2 O2(g) -> H2O(g),dH,-241.8,0.1,kJ/mol,,lab", "zero-for-oxygen", "0(g),dH", "did you mean H2O(g)?")]
    [InlineData("m1,N02(g),S,240.1,0.2,J/(mol·K),,lab", "", "zero-for-oxygen", "02(g)", "did you mean NO2(g)?")]
    [InlineData("m1,N02(g) + 2 O2(g) -> N2O4(g),dH,-57.2,0.5,kJ/mol,,lab", "m2,1/2 N2(g) + O2(g) -> NO2(g),dH,33.1,0.8,kJ/mol,,lab", "zero-for-oxygen", "02(g) +", "did you mean NO2(g)?")]
    [InlineData("m1,NH3(g),dH,-45940,0.35,kJ/mol,,lab", "", "value-implausible", "-45940", "J/mol labelled kJ/mol")]
    [InlineData("m1,1/2 N2(g) + 3/2 H2(g) -> NH3(g),dH,-45940,0.35,kJ/mol,,lab", "", "value-implausible", "-45940", "÷1000 gives -45.94 kJ/mol")]
    [InlineData("m1,NH3(g),S,0.19277,0.0005,J/(mol·K),,lab", "", "value-implausible", "0.19277", "kJ/(mol·K) labelled J/(mol·K)")]
    [InlineData("m1,NH3(g),S,-192.77,0.05,J/(mol·K),,lab", "", "value-implausible", "-192.77", "check the unit")]
    [InlineData("m1,NH3(g),S,1927.7,0.5,J/(mol·K),,lab", "", "value-implausible", "1927.7", "check the unit")]
    public void Read_WarnsAboutLikelyTyposThatParse(string row, string other, string code, string marker, string text)
    {
        // Given rows that are valid as written but hold a likely typo
        string file = _folder.Write("lab.csv", Header + "\n" + row + "\n" + (other.Length > 0 ? other + "\n" : ""));

        // When they are read
        NetworkReadResult result = NetworkReader.Read(file);

        // Then the rows are kept, and one warning with the code sits on line 2 at the digit or value, saying what was likely meant
        Assert.False(result.HasErrors);
        Diagnostic warning = Assert.Single(result.Warnings, diagnostic => diagnostic.Code == code);
        Assert.Equal((2, ColumnOf(row, marker)), (warning.Location.Line, warning.Location.Column));
        Assert.Contains(text, warning.Message + " " + warning.Hint, StringComparison.Ordinal);
    }

    /// <summary>Real values at the edges of the rules of thumb (NIST-JANAF 1998 and CODATA 1989 values, from memory) pass without that warning.</summary>
    [Theory]
    [InlineData("m1,Al2O3(cr),dH,-1675.7,1.3,kJ/mol,,lab")]
    [InlineData("m1,W(g),dH,849.4,6.3,kJ/mol,,lab")]
    [InlineData("m1,CaF2(cr),dH,-1228.0,2.0,kJ/mol,,lab")]
    [InlineData("m1,C10H8(cr),dH,78.5,1.0,kJ/mol,,lab")]
    [InlineData("m1,Al^3+(aq),S,-321.7,10.0,J/(mol·K),,lab")]
    [InlineData("m1,H(g),S,114.717,0.002,J/(mol·K),,lab")]
    [InlineData("m1,Rn(g),S,176.2,0.1,J/(mol·K),,lab")]
    [InlineData("m1,\"C(cr,diamond)\",S,2.38,0.01,J/(mol·K),,lab")]
    [InlineData("m1,Al(g) -> Al^3+(g) + 3 e-,dH,5139.1,1.0,kJ/mol,,lab")]
    public void Read_RealValuesAtTheEdges_AreNotWarnedAbout(string row)
    {
        string file = _folder.Write("lab.csv", Header + "\n" + row + "\n");

        NetworkReadResult result = NetworkReader.Read(file);

        Assert.False(result.HasErrors);
        Assert.DoesNotContain(result.Warnings, diagnostic => diagnostic.Code is "value-implausible" or "zero-for-oxygen");
    }

    [Fact]
    public void Read_StrayCsvInAFolder_IsCountedFirstAndCanBeIgnored()
    {
        // Given a network folder with a good file and a stray notes CSV that is no measurement table
        string folder = Path.Combine(_folder.Path, "net");
        Directory.CreateDirectory(folder);
        File.WriteAllText(Path.Combine(folder, "lab.csv"), Header + "\n" + GoodRow + "\n");
        File.WriteAllText(Path.Combine(folder, "notes.csv"), "what,when\nweigh again,monday\n");

        // When it is read
        NetworkReadResult stray = NetworkReader.Read(folder);

        // Then the per-file counts name the stray file first
        Assert.True(stray.HasErrors);
        FileProblemCount first = stray.ProblemsByFile[0];
        Assert.Equal((Path.Combine(folder, "notes.csv"), 1), (first.File, first.Errors));

        // And when .pathfinderignore names it, the network is valid and a note says the file was not read
        File.WriteAllText(Path.Combine(folder, ".pathfinderignore"), "# scratch files\nnotes*.csv\n");
        NetworkReadResult ignored = NetworkReader.Read(folder);
        Assert.False(ignored.HasErrors);
        Diagnostic note = Assert.Single(ignored.Notes);
        Assert.Equal(("skipped-file", Path.Combine(folder, "notes.csv")), (note.Code, note.Location.File));
        Assert.Contains(".pathfinderignore", note.Message, StringComparison.Ordinal);
    }

    private static int ColumnOf(string line, string marker)
    {
        int index = line.IndexOf(marker, StringComparison.Ordinal);
        Assert.True(index >= 0, $"'{marker}' not in '{line}'");
        return index + 1;
    }
}
