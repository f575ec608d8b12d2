using System.Text.Json;
using PathFinder.Cli.Tests.TestSupport;

namespace PathFinder.Cli.Tests.Commands;

public sealed class ValidateCommandTests : IDisposable
{
    private readonly TempFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    [Fact]
    public void Validate_ValidNetworkPrintsASummaryAndExitsZero()
    {
        // Given the combustion-lab demo folder
        CliRun run = CliRun.Of("validate", RepoPaths.Demo("combustion-lab"));

        // Then the summary is printed and the result is valid
        Assert.Equal(0, run.ExitCode);
        Assert.Contains("46 usable measurement(s) in 5 file(s)", run.Out, StringComparison.Ordinal);
        Assert.Contains("0 error(s)", run.Out, StringComparison.Ordinal);
        Assert.Contains("Result: valid", run.Out, StringComparison.Ordinal);
        Assert.Contains("group-a (14), group-b (9), group-c (7), group-d (8), group-e (8)", run.Out, StringComparison.Ordinal);
        Assert.Contains("(1 source(s) declared)", run.Out, StringComparison.Ordinal);
        Assert.Equal("", run.Error);
    }

    [Fact]
    public void Validate_BrineIonsIsValid()
    {
        CliRun run = CliRun.Of("validate", RepoPaths.Demo("brine-ions.csv"));

        Assert.Equal(0, run.ExitCode);
        Assert.Contains("Result: valid", run.Out, StringComparison.Ordinal);
    }

    [Fact]
    public void Validate_FaultyNotebookListsEveryProblemAndExitsTwo()
    {
        string file = RepoPaths.Demo("notebook-with-typos.csv");

        CliRun run = CliRun.Of("validate", file);

        Assert.Equal(2, run.ExitCode);
        Assert.Contains("10 error(s), 0 warning(s)", run.Out, StringComparison.Ordinal);
        Assert.Contains($"{file}:4:5: error unbalanced-equation: the equation is not balanced: left has 4 H, right has 2 H; left has 4 O, right has 3 O", run.Out, StringComparison.Ordinal);
        Assert.Contains("Result: INVALID", run.Out, StringComparison.Ordinal);
    }

    [Fact]
    public void Validate_JsonOfAValidNetworkHasTheSummary()
    {
        CliRun run = CliRun.Of("validate", RepoPaths.Demo("combustion-lab"), "--json");

        Assert.Equal(0, run.ExitCode);
        using JsonDocument document = JsonDocument.Parse(run.Out);
        JsonElement root = document.RootElement;
        Assert.True(root.GetProperty("valid").GetBoolean());
        Assert.Equal(0, root.GetProperty("errors").GetInt32());
        Assert.Equal(5, root.GetProperty("files").GetArrayLength());
        JsonElement summary = root.GetProperty("summary");
        Assert.Equal(46, summary.GetProperty("measurements").GetInt32());
        Assert.Equal(["group-a", "group-b", "group-c", "group-d", "group-e"], summary.GetProperty("sources").EnumerateArray().Select(source => source.GetProperty("name").GetString()));
        Assert.Equal(["C", "H", "O"], summary.GetProperty("elements").EnumerateArray().Select(element => element.GetString()));
        Assert.Contains("dU", summary.GetProperty("properties").EnumerateArray().Select(property => property.GetProperty("property").GetString()));
        Assert.EndsWith("species.csv", root.GetProperty("speciesFile").GetString(), StringComparison.Ordinal);
    }

    [Fact]
    public void Validate_JsonOfTheFaultyNotebookListsLocatedDiagnostics()
    {
        string file = RepoPaths.Demo("notebook-with-typos.csv");

        CliRun run = CliRun.Of("validate", file, "--json");

        Assert.Equal(2, run.ExitCode);
        using JsonDocument document = JsonDocument.Parse(run.Out);
        JsonElement root = document.RootElement;
        Assert.False(root.GetProperty("valid").GetBoolean());
        Assert.Equal(10, root.GetProperty("errors").GetInt32());
        JsonElement[] diagnostics = [.. root.GetProperty("diagnostics").EnumerateArray()];
        Assert.Equal(10, diagnostics.Length);
        JsonElement first = diagnostics[0];
        Assert.Equal("error", first.GetProperty("severity").GetString());
        Assert.Equal("unbalanced-equation", first.GetProperty("code").GetString());
        Assert.Equal(file, first.GetProperty("file").GetString());
        Assert.Equal(4, first.GetProperty("line").GetInt32());
        Assert.Equal(5, first.GetProperty("column").GetInt32());
        Assert.Equal("equation", first.GetProperty("field").GetString());
        Assert.Equal(Enumerable.Range(4, 10), diagnostics.Select(diagnostic => diagnostic.GetProperty("line").GetInt32()));
    }

    [Fact]
    public void Validate_JsonKeepsReadableUnicode()
    {
        string file = _folder.Write("lab.csv", "id,equation,property,value,uncertainty,unit\nm1,CO(g),dS,89.0,0.2,kJ/(mol·K)\nm2,CO(g),dH,1,1,J/(mol·K)\n");

        CliRun run = CliRun.Of("validate", file, "--json");

        Assert.Contains("J/(mol·K)", run.Out, StringComparison.Ordinal);
        using JsonDocument document = JsonDocument.Parse(run.Out);
        JsonElement error = Assert.Single(document.RootElement.GetProperty("diagnostics").EnumerateArray(), diagnostic => diagnostic.GetProperty("severity").GetString() == "error");
        Assert.Equal("wrong-unit", error.GetProperty("code").GetString());
        Assert.Equal("dH cannot be in J/(mol·K)", error.GetProperty("message").GetString());
    }

    [Fact]
    public void Validate_SaysHowManySourcesDeclareASystematic()
    {
        // Given a folder network with two sources declared in sources.csv, one in kcal/mol
        string sources = WriteSourcesNetwork("source,systematic,unit,note\ngroup A,0.3,kJ/mol,bomb calibration\ngroup B,0.5,kcal/mol,\n");

        // When validated as text and as JSON
        CliRun text = CliRun.Of("validate", _folder.Path);
        CliRun json = CliRun.Of("validate", _folder.Path, "--json");

        // Then the text names the file and the count, and the JSON lists each source in kJ/mol
        Assert.Equal(0, text.ExitCode);
        Assert.Contains($"  systematics    {sources} (2 source(s) declared)", text.Out, StringComparison.Ordinal);
        Assert.Contains("Result: valid", text.Out, StringComparison.Ordinal);
        Assert.Equal(0, json.ExitCode);
        using JsonDocument document = JsonDocument.Parse(json.Out);
        JsonElement root = document.RootElement;
        Assert.Equal(sources, root.GetProperty("sourcesFile").GetString());
        JsonElement[] declared = [.. root.GetProperty("sourceSystematics").EnumerateArray()];
        Assert.Equal(["group A", "group B"], declared.Select(item => item.GetProperty("source").GetString()));
        Assert.Equal(2.092, declared[1].GetProperty("systematic").GetDouble(), 1e-12);
        Assert.Equal(["kJ/mol", "kJ/mol"], declared.Select(item => item.GetProperty("unit").GetString()));
    }

    [Fact]
    public void Validate_WithoutSourcesFileHasAnEmptyList()
    {
        CliRun run = CliRun.Of("validate", RepoPaths.Demo("brine-ions.csv"), "--json");

        using JsonDocument document = JsonDocument.Parse(run.Out);
        Assert.Equal(JsonValueKind.Null, document.RootElement.GetProperty("sourcesFile").ValueKind);
        Assert.Equal(0, document.RootElement.GetProperty("sourceSystematics").GetArrayLength());
        Assert.DoesNotContain("systematics", CliRun.Of("validate", RepoPaths.Demo("brine-ions.csv")).Out, StringComparison.Ordinal);
    }

    [Fact]
    public void Validate_BadSourcesFileExitsTwoWithLocatedErrors()
    {
        string sources = WriteSourcesNetwork("source,systematic,unit\nGroup A,0.3,kJ/mol\ngroup B,0.5,1\n");

        CliRun run = CliRun.Of("validate", _folder.Path);

        Assert.Equal(2, run.ExitCode);
        Assert.Contains($"{sources}:2:1: error unknown-source: no measurement has the source 'Group A' Fix: did you mean 'group A'? Source names are case-sensitive", run.Out, StringComparison.Ordinal);
        Assert.Contains($"{sources}:3:13: error wrong-unit: a systematic cannot be a pure number (unit 1)", run.Out, StringComparison.Ordinal);
        Assert.Contains($"  systematics    {sources} (0 source(s) declared)", run.Out, StringComparison.Ordinal);
        Assert.Contains("Result: INVALID", run.Out, StringComparison.Ordinal);
        Assert.DoesNotContain("   at ", run.Out + run.Error, StringComparison.Ordinal);
    }

    [Fact]
    public void Validate_WarningsAloneStillExitZero()
    {
        string file = _folder.Write("lab.csv", "id,equation,property,value,uncertainty\nm1,CO(g) + 1/2 O2(g) -> CO2(g),dH,-283.0,0.2\n");

        CliRun run = CliRun.Of("validate", file);

        Assert.Equal(0, run.ExitCode);
        Assert.Contains("warning single-use-species", run.Out, StringComparison.Ordinal);
        Assert.Contains("Result: valid, with warnings.", run.Out, StringComparison.Ordinal);
    }

    [Fact]
    public void Validate_NonexistentPathExitsTwoWithAMessage()
    {
        string path = Path.Combine(_folder.Path, "missing.csv");

        CliRun run = CliRun.Of("validate", path);

        Assert.Equal(2, run.ExitCode);
        Assert.Contains($"{path}: error not-found: no such file or folder", run.Out, StringComparison.Ordinal);
        Assert.DoesNotContain("   at ", run.Out + run.Error, StringComparison.Ordinal);
    }

    [Fact]
    public void Validate_BinaryFileExitsTwo()
    {
        string file = Path.Combine(_folder.Path, "photo.csv");
        File.WriteAllBytes(file, [0xFF, 0xD8, 0xFF, 0x00, 0x10]);

        CliRun run = CliRun.Of("validate", file, "--json");

        Assert.Equal(2, run.ExitCode);
        using JsonDocument document = JsonDocument.Parse(run.Out);
        Assert.Equal("binary-file", document.RootElement.GetProperty("diagnostics")[0].GetProperty("code").GetString());
    }

    /// <summary>Writes a small valid network (sources group A and group B) and <paramref name="sources"/> as its sources.csv.</summary>
    private string WriteSourcesNetwork(string sources)
    {
        _folder.Write("lab.csv", "id,equation,property,value,uncertainty,unit,temperature,source\n"
            + "m1,CO(g) + 1/2 O2(g) -> CO2(g),dH,-283.0,0.2,kJ/mol,,group A\n"
            + "m2,CO2(g),dH,-393.51,0.13,kJ/mol,,group B\n"
            + "m3,CO(g),dH,-110.53,0.17,kJ/mol,,group A\n");
        return _folder.Write("sources.csv", sources);
    }

    [Fact]
    public void Validate_RefusesADeviceWithExitTwo()
    {
        // Given /dev/zero, which never ends (it once made validate exit 3)
        CliRun run = CliRun.Of("validate", "/dev/zero");

        // Then it is refused as input, located, with exit 2
        Assert.Equal(2, run.ExitCode);
        Assert.Contains("/dev/zero: error not-a-regular-file", run.Out, StringComparison.Ordinal);
    }

    [Fact]
    public void Validate_DoesNotHangOnAFifoInTheFolderAndNamesIt()
    {
        // Given a network folder with a FIFO named like a data file
        string network = Path.Combine(_folder.Path, "net");
        Directory.CreateDirectory(network);
        File.WriteAllText(Path.Combine(network, "lab.csv"), "id,equation,property,value,uncertainty\nm1,CO(g) + 1/2 O2(g) -> CO2(g),dH,-283.0,0.2\n");
        SpecialFiles.Fifo(Path.Combine(network, "pipe.csv"));

        // When it is validated (reading the FIFO would block forever)
        CliRun run = CliRun.Of("validate", network);

        // Then the data are valid and the FIFO is named in a note
        Assert.Equal(0, run.ExitCode);
        Assert.Contains("1 note(s) on entries not read", run.Out, StringComparison.Ordinal);
        Assert.Contains("pipe.csv: note skipped-file: not read: not a regular file", run.Out, StringComparison.Ordinal);
    }

    [Fact]
    public void Solve_ShowsThatARowAmongConventionalZerosIsNotUsed()
    {
        // Given a valid network with a row that only checks the hydrogen-electrode convention
        string file = _folder.Write("lab.csv", "id,equation,property,value,uncertainty\nm1,C(graphite) + O2(g) -> CO2(g),dH,-393.51,0.13\nm2,H+(aq) + e- -> 1/2 H2(g),dH,0.0,0.1\n");

        // When it is solved
        CliRun run = CliRun.Of("solve", file);

        // Then the solve succeeds and says on standard error that m2 is not used
        Assert.Equal(0, run.ExitCode);
        Assert.Contains($"{file}:3:4: warning conventional-only: 'm2'", run.Error, StringComparison.Ordinal);
    }

    [Fact]
    public void Validate_ReadsTheCurationFileLikeEveryCommand()
    {
        // Given the demo with a curation file: two exclusions, an unusable row, and an id the data lack
        string demo = DemoCopy.CombustionLab(_folder);
        string curation = Path.Combine(demo, "curation.csv");
        File.WriteAllText(curation, "id,action,reason,date\nC03,exclude,slipped,2026-01-01\nA07,exclude,doubtful,2026-01-02\nB01,drop,x,2026-01-02\nZ99,exclude,gone,2026-01-03\n");

        // When it is validated, as text and as JSON
        CliRun run = CliRun.Of("validate", demo);
        CliRun json = CliRun.Of("validate", demo, "--json");

        // Then it says how many decisions apply and reports each problem, located, as a warning
        Assert.Equal(0, run.ExitCode);
        Assert.Contains($"curation       {curation}: 3 decision(s), 2 measurement(s) excluded now, 1 row(s) not applied", run.Out, StringComparison.Ordinal);
        Assert.Contains($"{curation}:4:5: warning unknown-action", run.Out, StringComparison.Ordinal);
        Assert.Contains($"{curation}:5:1: warning unknown-id: the decision names measurement 'Z99'", run.Out, StringComparison.Ordinal);
        Assert.Contains("0 error(s), 2 warning(s)", run.Out, StringComparison.Ordinal);
        using JsonDocument document = JsonDocument.Parse(json.Out);
        JsonElement element = document.RootElement.GetProperty("curation");
        Assert.Equal(3, element.GetProperty("decisions").GetInt32());
        Assert.Equal(["A07", "C03"], element.GetProperty("excluded").EnumerateArray().Select(id => id.GetString()));
        Assert.Equal(1, element.GetProperty("notApplied").GetInt32());
        Assert.Equal(2, document.RootElement.GetProperty("warnings").GetInt32());
    }
}
