using System.Text.Json;
using PathFinder.Cli.Tests.TestSupport;

namespace PathFinder.Cli.Tests.Output;

/// <summary>The curation file beside the data is applied by every analysis command (through the analysis session).</summary>
public sealed class AnalysisSessionTests : IDisposable
{
    private readonly TempFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    private string CuratedDemo()
    {
        string demo = DemoCopy.CombustionLab(_folder);
        // The demo's two planted slips: C03 (a wrong water-gas shift value) and E04 (kcal typed as kJ)
        File.WriteAllText(Path.Combine(demo, "curation.csv"), "id,action,reason,date\nC03,exclude,slipped,2026-01-01\nE04,exclude,kcal as kJ,2026-01-01\n");
        return demo;
    }

    [Fact]
    public void Check_WithC03Excluded_IsConsistent()
    {
        string demo = CuratedDemo();

        CliRun run = CliRun.Of("check", demo);

        Assert.Equal(ExitCodes.Success, run.ExitCode);
        Assert.Contains("Result: consistent.", run.Out, StringComparison.Ordinal);
        Assert.Contains("2 measurement(s) excluded", run.Error, StringComparison.Ordinal);
        Assert.Contains("C03", run.Error, StringComparison.Ordinal);
    }

    [Fact]
    public void Solve_WithC03Excluded_NoLongerListsItAsSuspect()
    {
        string demo = CuratedDemo();

        CliRun run = CliRun.Of("solve", demo, "--json");

        Assert.Equal(ExitCodes.Success, run.ExitCode);
        using JsonDocument document = JsonDocument.Parse(run.Out);
        Assert.Equal(0, document.RootElement.GetProperty("suspects").GetArrayLength());
        // Every datum of the demo (the joint model solves ΔH, ΔU, S°, ΔS, ΔG and K rows together) less C03 and E04
        int rows = PathFinder.Data.NetworkReader.Read(demo).Network.Measurements.Count;
        Assert.Equal(rows - 2, document.RootElement.GetProperty("measurements").GetInt32());
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
