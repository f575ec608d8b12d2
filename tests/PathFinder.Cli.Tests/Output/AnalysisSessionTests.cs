using System.Text.Json;
using PathFinder.Cli.Tests.TestSupport;

namespace PathFinder.Cli.Tests.Output;

/// <summary>The curation file beside the data is applied by every analysis command (through the analysis session).</summary>
public sealed class AnalysisSessionTests : IDisposable
{
    private readonly TempFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    private string CuratedDemo(string curation = "C03,exclude,slipped,2026-01-01\n")
    {
        string demo = DemoCopy.CombustionLab(_folder);
        File.WriteAllText(Path.Combine(demo, "curation.csv"), "id,action,reason,date\n" + curation);
        return demo;
    }

    [Fact]
    public void Check_WithC03Excluded_NoLongerNamesIt_ButE04Remains()
    {
        string demo = CuratedDemo();

        CliRun run = CliRun.Of("check", demo);

        // C03 is gone; E04 (group E's ΔG slip, which has nothing to do with C03) still makes the demo inconsistent
        Assert.Equal(ExitCodes.AnalysisProblem, run.ExitCode);
        Assert.Contains("Result: INCONSISTENT (exit code 1)", run.Out, StringComparison.Ordinal);
        Assert.Contains("1 measurement(s) excluded", run.Error, StringComparison.Ordinal);
        Assert.Contains("C03", run.Error, StringComparison.Ordinal);
        Assert.Contains("Suspects (1, most serious first):", run.Out, StringComparison.Ordinal);
        Assert.Contains("\n     E04 ", run.Out, StringComparison.Ordinal);
        Assert.DoesNotContain("C03", run.Out, StringComparison.Ordinal);
    }

    [Fact]
    public void Check_WithBothSlipsExcluded_IsConsistent()
    {
        string demo = CuratedDemo("C03,exclude,slipped,2026-01-01\nE04,exclude,kcal/mol column,2026-01-01\n");

        CliRun run = CliRun.Of("check", demo);

        Assert.Equal(ExitCodes.Success, run.ExitCode);
        Assert.Contains("Result: consistent.", run.Out, StringComparison.Ordinal);
        Assert.Contains("Suspects: none.", run.Out, StringComparison.Ordinal);
        Assert.Contains("2 measurement(s) excluded", run.Error, StringComparison.Ordinal);
        Assert.Contains("C03", run.Error, StringComparison.Ordinal);
        Assert.Contains("E04", run.Error, StringComparison.Ordinal);
    }

    [Fact]
    public void Solve_WithC03Excluded_NoLongerListsItAsSuspect()
    {
        string demo = CuratedDemo();

        CliRun run = CliRun.Of("solve", demo, "--json");

        // C03 is no suspect any more; E04 (the ΔG slip of group E) still is, and is the only one
        Assert.Equal(ExitCodes.Success, run.ExitCode);
        using JsonDocument document = JsonDocument.Parse(run.Out);
        Assert.Equal(["E04"], document.RootElement.GetProperty("suspects").EnumerateArray().Select(suspect => suspect.GetString()));
        // Every datum of the demo (the joint model solves ΔH, ΔU, S°, ΔS, ΔG and K rows together) less C03
        int rows = PathFinder.Data.NetworkReader.Read(demo).Network.Measurements.Count;
        Assert.Equal(rows - 1, document.RootElement.GetProperty("measurements").GetInt32());
    }

    [Fact]
    public void Routes_WithC03Excluded_NeverUseIt()
    {
        string demo = CuratedDemo();

        CliRun run = CliRun.Of("routes", demo, "--target", "CO(g)", "--json", "--top", "50");

        Assert.Equal(ExitCodes.Success, run.ExitCode);
        using JsonDocument document = JsonDocument.Parse(run.Out);
        string[] ids = document.RootElement.GetProperty("routes").EnumerateArray()
            .SelectMany(route => route.GetProperty("steps").EnumerateArray()).Select(step => step.GetProperty("id").GetString()!).ToArray();
        Assert.NotEmpty(ids);
        Assert.DoesNotContain("C03", ids);
    }

    [Fact]
    public void Draw_WithC03Excluded_CannotDrawIt()
    {
        string demo = CuratedDemo();
        string file = Path.Combine(_folder.Path, "c.svg");

        CliRun run = CliRun.Of("draw", demo, "--species", "CO(g)", "-o", file);

        Assert.Equal(ExitCodes.Success, run.ExitCode);
        Assert.DoesNotContain(">C03<", File.ReadAllText(file), StringComparison.Ordinal);
    }

    [Fact]
    public void UnusableCurationRow_IsALocatedWarningAndTheOtherDecisionsApply()
    {
        // Given a curation file with one row whose action is unknown (line 3) and one good exclusion
        string demo = DemoCopy.CombustionLab(_folder);
        string curation = Path.Combine(demo, "curation.csv");
        File.WriteAllText(curation, "id,action,reason,date\nC03,exclude,slipped,17/05/2026\nA07,banish,doubtful,2026-01-01\nE04,exclude,kcal as kJ,2026-01-01\n");

        // When an analysis command runs
        CliRun run = CliRun.Of("check", demo);

        // Then it runs with C03 (dated day first) and E04 excluded, and names the unused row by file, line and column
        Assert.Equal(ExitCodes.Success, run.ExitCode);
        Assert.Contains($"{curation}:3:5: warning unknown-action: unknown curation action 'banish'", run.Error, StringComparison.Ordinal);
        Assert.Contains("2 measurement(s) excluded", run.Error, StringComparison.Ordinal);
    }

    [Fact]
    public void CurationFileWithoutItsHeader_StopsEveryCommandWithExitTwo()
    {
        string demo = DemoCopy.CombustionLab(_folder);
        File.WriteAllText(Path.Combine(demo, "curation.csv"), "id,action,date\nC03,exclude,2026-01-01\n");

        Assert.Equal(ExitCodes.InvalidInput, CliRun.Of("check", demo).ExitCode);
        Assert.Equal(ExitCodes.InvalidInput, CliRun.Of("solve", demo).ExitCode);
        Assert.Equal(ExitCodes.InvalidInput, CliRun.Of("routes", demo, "--target", "CO(g)").ExitCode);
        Assert.Equal(ExitCodes.InvalidInput, CliRun.Of("validate", demo).ExitCode);
    }
}
