using System.Text.Json;
using PathFinder.Cli.Tests.TestSupport;

namespace PathFinder.Cli.Tests.Commands;

public sealed class CheckCommandTests : IDisposable
{
    private readonly TempFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    [Fact]
    public void Check_Demo_ExitsOne_AndNamesE04ThenC03()
    {
        CliRun run = CliRun.Of("check", RepoPaths.Demo("combustion-lab"));

        Assert.Equal(ExitCodes.AnalysisProblem, run.ExitCode);
        Assert.Contains("Result: INCONSISTENT (exit code 1)", run.Out, StringComparison.Ordinal);
        Assert.Contains("Suspects (2, most serious first):", run.Out, StringComparison.Ordinal);

        // Suspect lines start with five spaces and an id; their detail lines are indented further
        string[] suspects = run.Out.Split('\n').SkipWhile(line => !line.Contains("Suspects (", StringComparison.Ordinal)).Skip(1)
            .TakeWhile(line => line.StartsWith("     ", StringComparison.Ordinal))
            .Where(line => !line.StartsWith("      ", StringComparison.Ordinal)).ToArray();
        Assert.Equal(2, suspects.Length);

        // First E04 (group E's ΔfG°(CO), copied from a kcal/mol column: off by about 104 kJ/mol, z ≈ +517), which only the
        // tie between ΔG, ΔH and S° can see; the cause is named
        Assert.StartsWith("     E04", suspects[0], StringComparison.Ordinal);
        Assert.Contains("[group-e]", suspects[0], StringComparison.Ordinal);
        Assert.Contains("looks like kcal/mol typed as kJ/mol", run.Out, StringComparison.Ordinal);

        // Then C03, the water-gas shift ΔH slipped by about 6 kJ/mol in transcription, still found
        Assert.StartsWith("     C03", suspects[1], StringComparison.Ordinal);
        Assert.Contains("[group-c]", suspects[1], StringComparison.Ordinal);
    }

    [Fact]
    public void Check_Json_FollowsTheContract()
    {
        CliRun run = CliRun.Of("check", RepoPaths.Demo("combustion-lab"), "--json");

        Assert.Equal(ExitCodes.AnalysisProblem, run.ExitCode);
        using JsonDocument document = JsonDocument.Parse(run.Out);
        JsonElement root = document.RootElement;
        Assert.False(root.GetProperty("consistent").GetBoolean());
        JsonElement[] suspects = root.GetProperty("suspects").EnumerateArray().ToArray();
        Assert.Equal(["E04", "C03"], suspects.Select(suspect => suspect.GetProperty("id").GetString()));

        // The first suspect is E04, most serious: ΔfG°(CO) typed from a kcal/mol column. Its likely cause is a field
        // with the data's own code, and the rest of the network puts ΔfG°(CO, g) near ΔfH° − T·ΔfS°
        // = −110.53 − 298.15 × (197.66 − 5.74 − ½ × 205.152) / 1000 = −137.168 kJ/mol (CODATA Key Values 1989, from memory)
        JsonElement slip = suspects[0];
        Assert.Equal("dG", slip.GetProperty("property").GetString());
        Assert.Equal("group-e", slip.GetProperty("source").GetString());
        Assert.Equal(-32.78, slip.GetProperty("measured").GetDouble(), 1e-9);
        Assert.True(slip.GetProperty("normalizedResidual").GetDouble() > 100);
        JsonElement cause = slip.GetProperty("likelyCause");
        Assert.Equal("calorie", cause.GetProperty("kind").GetString());
        Assert.Equal(-32.78 * 4.184, cause.GetProperty("explainedValue").GetDouble(), 1e-9);
        double slipPredicted = slip.GetProperty("predicted").GetDouble();
        double slipSpread = slip.GetProperty("predictedUncertainty").GetDouble();
        Assert.True(slipSpread > 0);
        Assert.InRange(slipPredicted, -137.168 - (3 * slipSpread), -137.168 + (3 * slipSpread));

        // The second is C03, the water-gas shift ΔH slipped in transcription
        JsonElement suspect = suspects[1];
        Assert.Equal("C03", suspect.GetProperty("id").GetString());
        Assert.Equal("group-c", suspect.GetProperty("source").GetString());
        Assert.Equal(-47.6, suspect.GetProperty("measured").GetDouble(), 1e-9);
        Assert.True(Math.Abs(suspect.GetProperty("normalizedResidual").GetDouble()) > 3);
        double predicted = suspect.GetProperty("predicted").GetDouble();
        double spread = suspect.GetProperty("predictedUncertainty").GetDouble();
        Assert.True(spread > 0);

        // The rest of the network puts the water-gas shift near ΔfH°(CO2) − ΔfH°(CO) − ΔfH°(H2O, g)
        // = −393.51 + 110.53 + 241.826 = −41.154 kJ/mol (CODATA Key Values 1989, from memory)
        Assert.InRange(predicted, -41.154 - (3 * spread), -41.154 + (3 * spread));

        // Cycles carry their members with exact factors; sources their offset statistics
        JsonElement[] cycles = root.GetProperty("cycles").EnumerateArray().ToArray();
        Assert.NotEmpty(cycles);
        Assert.Contains(cycles, cycle => cycle.GetProperty("flagged").GetBoolean() && cycle.GetProperty("members").EnumerateArray().Any(member => member.GetProperty("id").GetString() == "C03"));

        // The worst cycle is a G = H − TS closure through E04 (mixed: ΔH, S° and ΔG members), which fails to close
        JsonElement worst = cycles[0];
        Assert.True(worst.GetProperty("flagged").GetBoolean());
        Assert.True(worst.GetProperty("mixed").GetBoolean());
        Assert.Contains(worst.GetProperty("members").EnumerateArray(), member => member.GetProperty("id").GetString() == "E04");
        Assert.Equal(["S", "dG", "dH"], worst.GetProperty("members").EnumerateArray().Select(member => member.GetProperty("property").GetString()).Distinct().Order(StringComparer.Ordinal));
        Assert.All(cycles.SelectMany(cycle => cycle.GetProperty("members").EnumerateArray()), member => Assert.Matches("^-?[0-9]+(/[0-9]+|\\.[0-9]+)?$", member.GetProperty("factor").GetString()!));
        string[] sources = root.GetProperty("sources").EnumerateArray().Select(source => source.GetProperty("name").GetString()!).ToArray();
        Assert.Contains("group-a", sources);
        Assert.Contains("group-c", sources);
        Assert.Contains("group-e", sources);
    }

    [Fact]
    public void Check_ConsistentHandbookNetwork_ExitsZeroWithNoSuspects()
    {
        // Given formation enthalpies of CO2, CO, H2O(l), H2O(g) (CODATA Key Values, Cox, Wagman, Medvedev 1989,
        // from memory) and three reactions built from them with root-sum-square uncertainties
        string file = _folder.Write(
            "handbook.csv",
            "id,equation,property,value,uncertainty,unit,temperature,source\n"
            + "F1,CO2(g),dH,-393.51,0.13,kJ/mol,,table\n"
            + "F2,H2O(l),dH,-285.830,0.040,kJ/mol,,table\n"
            + "F3,H2O(g),dH,-241.826,0.040,kJ/mol,,table\n"
            + "F4,CO(g),dH,-110.53,0.17,kJ/mol,,table\n"
            + "R1,H2O(l) -> H2O(g),dH,44.004,0.057,kJ/mol,,flow\n"
            + "R2,CO(g) + 1/2 O2(g) -> CO2(g),dH,-282.98,0.22,kJ/mol,,bomb\n"
            + "R3,CO(g) + H2O(g) -> CO2(g) + H2(g),dH,-41.154,0.22,kJ/mol,,flow\n");

        CliRun text = CliRun.Of("check", file);
        CliRun json = CliRun.Of("check", file, "--json");

        Assert.Equal(ExitCodes.Success, text.ExitCode);
        Assert.Contains("Suspects: none.", text.Out, StringComparison.Ordinal);
        Assert.Contains("Result: consistent.", text.Out, StringComparison.Ordinal);
        Assert.Equal(ExitCodes.Success, json.ExitCode);
        using JsonDocument document = JsonDocument.Parse(json.Out);
        Assert.True(document.RootElement.GetProperty("consistent").GetBoolean());
        Assert.Equal(0, document.RootElement.GetProperty("suspects").GetArrayLength());

        // 7 measurements of 4 species: 3 independent cycles (m − rank)
        JsonElement model = document.RootElement.GetProperty("model");
        Assert.Equal(7, model.GetProperty("measurements").GetInt32());
        Assert.Equal(4, model.GetProperty("formationEnthalpies").GetInt32());
        Assert.Equal(4, model.GetProperty("rank").GetInt32());
        Assert.Equal(3, model.GetProperty("independentCycles").GetInt32());
    }

    [Theory]
    [InlineData("--threshold", "0")]
    [InlineData("--inflation", "1")]
    [InlineData("--max-cycle", "-2")]
    public void Check_BadOption_ExitsTwo(string option, string value)
    {
        CliRun run = CliRun.Of("check", RepoPaths.Demo("combustion-lab"), option, value);

        Assert.Equal(ExitCodes.InvalidInput, run.ExitCode);
        Assert.Contains(option, run.Error, StringComparison.Ordinal);
        Assert.Equal("", run.Out);
    }

    [Fact]
    public void Check_WithoutCycles_SaysNothingCanBeChecked()
    {
        // Given two measurements that share no route (no cycle: nothing is measured twice)
        using var folder = new TempFolder();
        string file = folder.Write("lab.csv", "id,equation,property,value,uncertainty\nm1,C(graphite) + O2(g) -> CO2(g),dH,-393.51,0.13\nm2,CO(g) + 1/2 O2(g) -> CO2(g),dH,-282.98,0.20\n");

        // When it is checked, as text and as JSON
        CliRun run = CliRun.Of("check", file);
        CliRun json = CliRun.Of("check", file, "--json");

        // Then it does not claim agreement: it says nothing could be checked
        Assert.Equal(0, run.ExitCode);
        Assert.DoesNotContain("agree", run.Out, StringComparison.Ordinal);
        Assert.Contains("Nothing can be checked", run.Out, StringComparison.Ordinal);
        Assert.Contains("Result: nothing could be checked", run.Out, StringComparison.Ordinal);
        using System.Text.Json.JsonDocument document = System.Text.Json.JsonDocument.Parse(json.Out);
        Assert.False(document.RootElement.GetProperty("checkable").GetBoolean());
    }
}
