using System.Globalization;
using System.Text.Json;
using System.Xml.Linq;
using PathFinder.Cli.Tests.TestSupport;

namespace PathFinder.Cli.Tests.Commands;

public sealed class DrawCommandTests : IDisposable
{
    private static readonly string Demo = RepoPaths.Demo("combustion-lab");

    private readonly TempFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    private string Output(string name) => Path.Combine(_folder.Path, name);

    public static TheoryData<string[]> Drawings => new()
    {
        new[] { "--target", "CO(g)" },
        new[] { "--target", "CO(g)", "--route", "0" },
        new[] { "--target", "CO(g)", "--kind", "levels", "--route", "2" },
        new[] { "--cycle", "1" },
        new[] { "--kind", "closure", "--cycle", "1" },
        new[] { "--species", "CO(g)", "--depth", "2" },
        new[] { "--species", "DME(g)" },
    };

    [Theory]
    [MemberData(nameof(Drawings))]
    public void Draw_WritesAnSvgThatParses(string[] focus)
    {
        string file = Output("figure.svg");

        CliRun run = CliRun.Of(["draw", Demo, .. focus, "-o", file]);

        Assert.Equal(ExitCodes.Success, run.ExitCode);
        Assert.Contains($"wrote {file}", run.Out, StringComparison.Ordinal);
        XDocument svg = XDocument.Load(file);
        Assert.Equal("svg", svg.Root!.Name.LocalName);
        Assert.Contains(svg.Descendants(), element => element.Name.LocalName == "text");
    }

    [Fact]
    public void Draw_ClosureOfTheWorstCycle_NamesTheSlippedMeasurement()
    {
        string file = Output("closure.svg");

        CliRun run = CliRun.Of("draw", Demo, "--kind", "closure", "--cycle", "1", "-o", file);

        // The worst cycle of the demo is a G = H − TS closure through E04 (as 'check' lists it first): its ladder of
        // terms is drawn, naming E04 and the gap
        Assert.Equal(ExitCodes.Success, run.ExitCode);
        string svg = File.ReadAllText(file);
        Assert.Contains(">E04", svg, StringComparison.Ordinal);
        Assert.Contains("(G = H − TS)", svg, StringComparison.Ordinal);
        Assert.Contains("does not close", svg, StringComparison.Ordinal);
    }

    [Fact]
    public void Draw_ClosureOfTheFirstCycleThroughC03_NamesC03()
    {
        // Given the first failing cycle through C03, by the number 'check --json' gives it
        using JsonDocument check = JsonDocument.Parse(CliRun.Of("check", Demo, "--json").Out);
        JsonElement cycle = check.RootElement.GetProperty("cycles").EnumerateArray()
            .First(cycle => cycle.GetProperty("flagged").GetBoolean() && cycle.GetProperty("members").EnumerateArray().Any(member => member.GetProperty("id").GetString() == "C03"));
        string number = cycle.GetProperty("number").GetInt32().ToString(CultureInfo.InvariantCulture);
        string file = Output("closure-c03.svg");

        // When its closure is drawn
        CliRun run = CliRun.Of("draw", Demo, "--kind", "closure", "--cycle", number, "-o", file);

        // Then the drawing names C03 and shows the gap
        Assert.Equal(ExitCodes.Success, run.ExitCode);
        string svg = File.ReadAllText(file);
        Assert.Contains(">C03", svg, StringComparison.Ordinal);
        Assert.Contains("does not close", svg, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("--species", "NH3(g)")]
    [InlineData("--target", "CH4(g) -> CO2(g)")]
    [InlineData("--kind", "levels")]
    public void Draw_BadFocus_ExitsTwoAndWritesNothing(string option, string value)
    {
        string file = Output("bad.svg");
        string[] args = option == "--kind" ? ["draw", Demo, option, value, "--cycle", "1", "-o", file] : ["draw", Demo, option, value, "-o", file];

        CliRun run = CliRun.Of(args);

        Assert.Equal(ExitCodes.InvalidInput, run.ExitCode);
        Assert.StartsWith("error:", run.Error, StringComparison.Ordinal);
        Assert.DoesNotContain("   at ", run.Error, StringComparison.Ordinal);
        Assert.False(File.Exists(file));
    }

    [Fact]
    public void Draw_TwoFoci_ExitsTwo()
    {
        CliRun run = CliRun.Of("draw", Demo, "--species", "CO(g)", "--cycle", "1", "-o", Output("two.svg"));

        Assert.Equal(ExitCodes.InvalidInput, run.ExitCode);
        Assert.Contains("exactly one focus", run.Error, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("--cycle", "999")]
    [InlineData("--target", "CO(g)", "--route", "999")]
    [InlineData("--target", "NH3(g)")]
    public void Draw_NothingToDraw_ExitsOneAndWritesNoFile(params string[] focus)
    {
        string file = Output("nothing.svg");

        CliRun run = CliRun.Of(["draw", Demo, .. focus, "-o", file]);

        Assert.Equal(ExitCodes.AnalysisProblem, run.ExitCode);
        Assert.Contains("nothing to draw", run.Error, StringComparison.Ordinal);
        Assert.Contains("no file was written", run.Error, StringComparison.Ordinal);
        Assert.False(File.Exists(file));
        Assert.Empty(Directory.EnumerateFiles(_folder.Path));
    }

    [Fact]
    public void Draw_OutputFolderMissing_ExitsTwo()
    {
        string file = Path.Combine(_folder.Path, "no-such-folder", "figure.svg");

        CliRun run = CliRun.Of("draw", Demo, "--cycle", "1", "-o", file);

        Assert.Equal(ExitCodes.InvalidInput, run.ExitCode);
        Assert.Contains("the folder of --output does not exist", run.Error, StringComparison.Ordinal);
        Assert.False(Directory.Exists(Path.GetDirectoryName(file)));
    }
}
