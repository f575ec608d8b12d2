using System.Globalization;
using System.Text.Json;
using PathFinder.Cli.Tests.TestSupport;
using PathFinder.Tests.TestSupport;

namespace PathFinder.Cli.Tests.Commands;

public sealed class SolveCommandTests : IDisposable
{
    private static readonly string Demo = RepoPaths.Demo("combustion-lab");

    private readonly TempFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    [Fact]
    public void Solve_Csv_GuardsNamesASpreadsheetWouldRun_AndKeepsNumbersAsNumbers()
    {
        // Given species keyed @SUM(A1) and -Y|<b>
        string network = HostileNetwork.Write(_folder);

        // When the solution is written as CSV
        CliRun run = CliRun.Of("solve", network, "--format", "csv", "--no-adjust");

        // Then the names are text cells starting with an apostrophe, the values plain numbers
        Assert.Equal(ExitCodes.Success, run.ExitCode);
        string[] lines = run.Out.Split('\n', StringSplitOptions.RemoveEmptyEntries);
        string sum = Assert.Single(lines, line => line.Contains("SUM", StringComparison.Ordinal));
        Assert.StartsWith("'@SUM(A1),-100.0", sum, StringComparison.Ordinal);
        Assert.StartsWith("CO2(g),-393.5", Assert.Single(lines, line => line.Contains("CO2", StringComparison.Ordinal)), StringComparison.Ordinal);
        Assert.StartsWith("'-Y|<b>,-10.05,", Assert.Single(lines, line => line.Contains("-Y", StringComparison.Ordinal)), StringComparison.Ordinal);
        Assert.DoesNotContain(lines, line => line[0] is '=' or '+' or '-' or '@');
    }

    [Fact]
    public void Solve_Covariance_GuardsTextCellsAndKeepsNumbers()
    {
        // Given the hostile network
        string network = HostileNetwork.Write(_folder);
        string file = Path.Combine(_folder.Path, "cov.csv");

        // When the covariance is written
        CliRun run = CliRun.Of("solve", network, "--no-adjust", "--covariance", file);

        // Then every line has three cells, the last a number, and no cell starts like a formula
        Assert.Equal(ExitCodes.Success, run.ExitCode);
        string[] lines = File.ReadAllText(file).Split('\n', StringSplitOptions.RemoveEmptyEntries);
        Assert.Equal("row,column,covariance", lines[0]);
        Assert.Equal(10, lines.Length);
        foreach (string line in lines.Skip(1))
        {
            string[] cells = line.Split(',');
            Assert.Equal(3, cells.Length);
            Assert.True(double.TryParse(cells[2], NumberStyles.Float, CultureInfo.InvariantCulture, out _), line);
            Assert.DoesNotContain(cells, cell => cell.Length > 0 && cell[0] is '=' or '+' or '@' or '-' && !double.TryParse(cell, NumberStyles.Float, CultureInfo.InvariantCulture, out _));
        }
    }

    [Fact]
    public void Solve_Markdown_EscapesPipesAndHtmlInNames()
    {
        // Given a species keyed -Y|<b>
        string network = HostileNetwork.Write(_folder);

        // When the solution is written as Markdown
        CliRun run = CliRun.Of("solve", network, "--format", "markdown", "--no-adjust");

        // Then the pipe cannot open a column and the tag is not HTML
        Assert.Equal(ExitCodes.Success, run.ExitCode);
        Assert.Contains("| -Y\\|\\<b\\> | -10.05 |", run.Out, StringComparison.Ordinal);
        Assert.DoesNotContain("<b>", run.Out, StringComparison.Ordinal);
    }

    [Fact]
    public void Solve_Json_FollowsTheContract_WithNamesAsWrittenInTheData()
    {
        CliRun run = CliRun.Of("solve", Demo, "--json");

        Assert.Equal(ExitCodes.Success, run.ExitCode);
        using JsonDocument document = JsonDocument.Parse(run.Out);
        JsonElement root = document.RootElement;
        Assert.Equal("dH", root.GetProperty("property").GetString());
        Assert.Equal("kJ/mol", root.GetProperty("unit").GetString());
        Assert.True(root.GetProperty("adjusted").GetBoolean());
        Dictionary<string, (double Value, double Uncertainty)> species = root.GetProperty("species").EnumerateArray()
            .ToDictionary(item => item.GetProperty("name").GetString()!, item => (item.GetProperty("value").GetDouble(), item.GetProperty("uncertainty").GetDouble()));

        // Declared keys stay as written (DME(g), EtOH(l)); no reference state is listed
        Assert.Contains("DME(g)", species.Keys);
        Assert.Contains("EtOH(l)", species.Keys);
        Assert.DoesNotContain("O2(g)", species.Keys);

        // ΔfH°(CO2, g) and ΔfH°(H2O, l) come back at CODATA Key Values 1989 (−393.51 ± 0.13, −285.830 ± 0.040; from memory)
        Assert.InRange(species["CO2(g)"].Value, -393.51 - 0.13, -393.51 + 0.13);
        Assert.InRange(species["H2O(l)"].Value, -285.830 - 0.040, -285.830 + 0.040);
        Assert.All(species.Values, item => Assert.True(item.Uncertainty > 0));

        // C03 is down-weighted as a suspect
        Assert.Contains("C03", root.GetProperty("suspects").EnumerateArray().Select(item => item.GetString()));
    }

    [Fact]
    public void Solve_JsonFlag_EqualsFormatJson()
    {
        CliRun flag = CliRun.Of("solve", Demo, "--json");
        CliRun format = CliRun.Of("solve", Demo, "--format", "json");

        // Compared as JSON with numbers to 1e-12 relative: the native dense kernel may differ in the last bit between runs
        using JsonDocument expected = JsonDocument.Parse(format.Out);
        using JsonDocument actual = JsonDocument.Parse(flag.Out);
        AssertSameJson(expected.RootElement, actual.RootElement);
    }

    [Fact]
    public void Solve_NoAdjust_SolvesTheDataAsGiven()
    {
        CliRun run = CliRun.Of("solve", Demo, "--json", "--no-adjust");

        Assert.Equal(ExitCodes.Success, run.ExitCode);
        using JsonDocument document = JsonDocument.Parse(run.Out);
        Assert.False(document.RootElement.GetProperty("adjusted").GetBoolean());
        Assert.Equal(0, document.RootElement.GetProperty("suspects").GetArrayLength());
        Assert.Equal(0, document.RootElement.GetProperty("adjustments").GetInt32());
    }

    [Fact]
    public void Solve_Csv_HasOneRowPerDeterminedSpecies_MatchingTheJson()
    {
        CliRun csv = CliRun.Of("solve", Demo, "--format", "csv");
        CliRun json = CliRun.Of("solve", Demo, "--json");

        Assert.Equal(ExitCodes.Success, csv.ExitCode);
        string[] lines = csv.Out.Split('\n', StringSplitOptions.RemoveEmptyEntries);
        Assert.Equal("species,dfH,uncertainty,unit,measurements", lines[0]);
        using JsonDocument document = JsonDocument.Parse(json.Out);
        JsonElement[] species = document.RootElement.GetProperty("species").EnumerateArray().ToArray();
        Assert.Equal(species.Length, lines.Length - 1);
        for (int i = 0; i < species.Length; i++)
        {
            string[] fields = lines[i + 1].Split(',');
            Assert.Equal(species[i].GetProperty("name").GetString(), fields[0]);
            Assert.Equal(species[i].GetProperty("value").GetDouble(), double.Parse(fields[1], CultureInfo.InvariantCulture), 1e-12);
            Assert.Equal("kJ/mol", fields[3]);
        }
    }

    [Fact]
    public void Solve_Table_AndMarkdown_ListTheSpecies()
    {
        CliRun table = CliRun.Of("solve", Demo);
        CliRun markdown = CliRun.Of("solve", Demo, "--format", "markdown");

        Assert.Equal(ExitCodes.Success, table.ExitCode);
        Assert.Contains("ΔfH° at 298.15 K in kJ/mol", table.Out, StringComparison.Ordinal);
        Assert.Contains("DME(g)", table.Out, StringComparison.Ordinal);
        Assert.Contains("Suspects down-weighted: E04, C03", table.Out, StringComparison.Ordinal);
        Assert.Equal(ExitCodes.Success, markdown.ExitCode);
        Assert.StartsWith("| species | ΔfH° / (kJ/mol) |", markdown.Out, StringComparison.Ordinal);

        // ΔfH°(CO2) is no longer A01 alone (−393.51 ± 0.13): the joint model adds group E's ΔfG°(CO2) through S°,
        // −394.4 + 298.15 × (213.8 − 5.74 − 205.2) / 1000 = −393.55 kJ/mol, and with the rest of the network the joint value is −393.54 ± 0.12
        Assert.Contains("| CO2(g) | -393.54 | 0.12 |", markdown.Out, StringComparison.Ordinal);
    }

    [Fact]
    public void Solve_OtherFamilies_AndBadInput()
    {
        CliRun gibbs = CliRun.Of("solve", Demo, "--property", "dG", "--json");
        CliRun badFormat = CliRun.Of("solve", Demo, "--format", "xml");
        CliRun badProperty = CliRun.Of("solve", Demo, "--property", "dX");

        Assert.Equal(ExitCodes.Success, gibbs.ExitCode);
        using JsonDocument document = JsonDocument.Parse(gibbs.Out);
        Assert.Equal("dG", document.RootElement.GetProperty("property").GetString());
        Assert.Equal(ExitCodes.InvalidInput, badFormat.ExitCode);
        Assert.Equal(ExitCodes.InvalidInput, badProperty.ExitCode);
        Assert.Contains("--property 'dX'", badProperty.Error, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("csv")]
    [InlineData("table")]
    [InlineData("markdown")]
    [InlineData("json")]
    public void Solve_Output_IsTheSameUnderACommaDecimalCulture(string format)
    {
        // Given the output under an English culture
        string invariant;
        using (new CultureScope("en-US"))
        {
            invariant = CliRun.Of("solve", Demo, "--format", format).Out;
        }

        // When run under de-DE (decimal comma)
        CliRun german;
        using (new CultureScope("de-DE"))
        {
            german = CliRun.Of("solve", Demo, "--format", format);
        }

        // Then the text is the same, with decimal points. Full-precision numbers (csv, json) are compared as
        // numbers: the native dense kernel may differ in the last bit from one run to the next (see the report).
        Assert.Equal(ExitCodes.Success, german.ExitCode);
        Assert.Contains("-393.5", german.Out, StringComparison.Ordinal);
        Assert.DoesNotContain("-393,5", german.Out, StringComparison.Ordinal);
        switch (format)
        {
            case "csv":
                string[] expectedLines = invariant.Split('\n');
                string[] actualLines = german.Out.Split('\n');
                Assert.Equal(expectedLines.Length, actualLines.Length);
                for (int i = 0; i < expectedLines.Length; i++)
                {
                    string[] expected = expectedLines[i].Split(',');
                    string[] actual = actualLines[i].Split(',');
                    Assert.Equal(expected.Length, actual.Length);
                    for (int k = 0; k < expected.Length; k++)
                    {
                        bool isNumber = double.TryParse(expected[k], NumberStyles.Float, CultureInfo.InvariantCulture, out double value);
                        if (isNumber && expected[k].Contains('.', StringComparison.Ordinal))
                        {
                            Assert.Equal(value, double.Parse(actual[k], NumberStyles.Float, CultureInfo.InvariantCulture), Math.Abs(value) * 1e-12);
                        }
                        else
                        {
                            Assert.Equal(expected[k], actual[k]);
                        }
                    }
                }

                break;
            case "json":
                using (JsonDocument expected = JsonDocument.Parse(invariant))
                using (JsonDocument actual = JsonDocument.Parse(german.Out))
                {
                    AssertSameJson(expected.RootElement, actual.RootElement);
                }

                break;
            default:
                Assert.Equal(invariant, german.Out);
                break;
        }
    }

    private static void AssertSameJson(JsonElement expected, JsonElement actual)
    {
        Assert.Equal(expected.ValueKind, actual.ValueKind);
        switch (expected.ValueKind)
        {
            case JsonValueKind.Object:
                Assert.Equal(expected.EnumerateObject().Select(p => p.Name), actual.EnumerateObject().Select(p => p.Name));
                foreach (JsonProperty property in expected.EnumerateObject())
                {
                    AssertSameJson(property.Value, actual.GetProperty(property.Name));
                }

                break;
            case JsonValueKind.Array:
                Assert.Equal(expected.GetArrayLength(), actual.GetArrayLength());
                for (int i = 0; i < expected.GetArrayLength(); i++)
                {
                    AssertSameJson(expected[i], actual[i]);
                }

                break;
            case JsonValueKind.Number:
                double value = expected.GetDouble();
                Assert.Equal(value, actual.GetDouble(), Math.Max(1e-12, Math.Abs(value) * 1e-12));
                break;
            default:
                Assert.Equal(expected.GetRawText(), actual.GetRawText());
                break;
        }
    }
}
