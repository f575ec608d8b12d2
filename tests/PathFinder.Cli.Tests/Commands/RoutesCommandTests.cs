using System.Globalization;
using System.Text.Json;
using PathFinder.Cli.Tests.TestSupport;

namespace PathFinder.Cli.Tests.Commands;

public sealed class RoutesCommandTests : IDisposable
{
    private readonly TempFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    private string Handbook() => _folder.Write(
        "handbook.csv",
        "id,equation,property,value,uncertainty,unit,temperature,source\n"
        // ΔfH°(CO2, g) = −393.51 ± 0.13 and ΔfH°(CO, g) = −110.53 ± 0.17 kJ/mol: CODATA Key Values
        // (Cox, Wagman, Medvedev 1989), from memory; ΔcH(CO) = −393.51 + 110.53 = −282.98
        + "G1,C(graphite) + O2(g) -> CO2(g),dH,-393.51,0.13,kJ/mol,,bomb\n"
        + "G2,CO(g) + 1/2 O2(g) -> CO2(g),dH,-282.98,0.20,kJ/mol,,bomb\n"
        // ΔfH°(H2O, l) = −285.830 ± 0.040 (CODATA 1989, from memory), written for two moles
        + "H1,2 H2(g) + O2(g) -> 2 H2O(l),dH,-571.66,0.08,kJ/mol,,table\n");

    [Fact]
    public void Routes_RefuseATargetNestedThousandsOfLevelsDeepWithExitTwo()
    {
        // Given a target whose formula nests brackets 6,000 levels deep (it once overflowed the stack: exit 134)
        string target = new string('(', 6000) + "CO" + new string(')', 6000) + "(g)";

        // When routes are asked for
        CliRun run = CliRun.Of("routes", Handbook(), "--target", target);

        // Then the target is refused as bad input, with the nesting limit named
        Assert.Equal(ExitCodes.InvalidInput, run.ExitCode);
        Assert.Contains("32 levels", run.Error, StringComparison.Ordinal);
        Assert.DoesNotContain("   at ", run.Error, StringComparison.Ordinal);
    }

    [Fact]
    public void Routes_MarkRoutesThroughASuspect_UnlessTheDataAreTakenAsGiven()
    {
        // Given the demo lab, whose water-gas shift value C03 is a suspect (the other, E04, is a ΔG and on no ΔH route)
        string demo = RepoPaths.Demo("combustion-lab");
        const string Shift = "CO(g) + H2O(g) -> CO2(g) + H2(g)";

        // When routes are listed with and without the suspect procedure
        CliRun adjusted = CliRun.Of("routes", demo, "--target", Shift, "--json");
        CliRun asGiven = CliRun.Of("routes", demo, "--target", Shift, "--json", "--no-adjust");

        // Then the direct route through C03 names it as a suspect only in the adjusted run,
        // and the network estimate as given is pulled towards C03's low value
        Assert.Equal(ExitCodes.Success, adjusted.ExitCode);
        Assert.Equal(ExitCodes.Success, asGiven.ExitCode);
        using JsonDocument a = JsonDocument.Parse(adjusted.Out);
        using JsonDocument g = JsonDocument.Parse(asGiven.Out);
        JsonElement direct = a.RootElement.GetProperty("routes").EnumerateArray().Single(route => route.GetProperty("steps").GetArrayLength() == 1);
        Assert.Equal(["C03"], direct.GetProperty("usesSuspects").EnumerateArray().Select(id => id.GetString()));
        Assert.All(g.RootElement.GetProperty("routes").EnumerateArray(), route => Assert.Equal(0, route.GetProperty("usesSuspects").GetArrayLength()));
        double adjustedEstimate = a.RootElement.GetProperty("networkEstimate").GetProperty("value").GetDouble();
        double givenEstimate = g.RootElement.GetProperty("networkEstimate").GetProperty("value").GetDouble();
        Assert.True(givenEstimate < adjustedEstimate, $"{givenEstimate} should be below {adjustedEstimate}");
    }

    [Theory]
    [InlineData("lnK")]
    [InlineData("log10K")]
    [InlineData("S")]
    public void Routes_PropertyThatIsNoReactionQuantity_IsRefusedWithExitTwo(string property)
    {
        // Given a property code that data may use but results are not given in
        CliRun run = CliRun.Of("routes", Handbook(), "--target", "CO(g)", "--property", property);

        // Then the command refuses it, says what to use, and prints no stack trace
        Assert.Equal(ExitCodes.InvalidInput, run.ExitCode);
        Assert.Contains("--property", run.Error, StringComparison.Ordinal);
        Assert.Contains("dG", run.Error, StringComparison.Ordinal);
        Assert.DoesNotContain("   at ", run.Error, StringComparison.Ordinal);
    }

    [Fact]
    public void Routes_Text_ShowsTheRouteToCarbonMonoxideWithItsValue()
    {
        // Given the combustions of graphite and CO (CODATA 1989 values, from memory)
        CliRun run = CliRun.Of("routes", Handbook(), "--target", "CO(g)");

        // Then exit 0 and the route gives −110.53 ± 0.24 (= √(0.13² + 0.20²)) kJ/mol, the CODATA ΔfH°(CO, g)
        Assert.Equal(ExitCodes.Success, run.ExitCode);
        Assert.Contains("C(cr,graphite) + 1/2 O2(g) -> CO(g)", run.Out, StringComparison.Ordinal);
        Assert.Contains("G1 G2(-1)", run.Out, StringComparison.Ordinal);
        Assert.Contains("ΔH = -110.53 ± 0.24 kJ/mol", run.Out, StringComparison.Ordinal);
        Assert.Contains("complete up to 6 steps", run.Out, StringComparison.Ordinal);
        Assert.Equal("", run.Error);
    }

    [Fact]
    public void Routes_Json_FollowsTheContract_WithExactFactors()
    {
        CliRun run = CliRun.Of("routes", Handbook(), "--target", "H2O(l)", "--json");

        Assert.Equal(ExitCodes.Success, run.ExitCode);
        using JsonDocument document = JsonDocument.Parse(run.Out);
        JsonElement root = document.RootElement;
        Assert.Equal("1/2 O2(g) + H2(g) -> H2O(l)", root.GetProperty("target").GetString());
        Assert.Equal("dH", root.GetProperty("property").GetString());
        Assert.Equal("kJ/mol", root.GetProperty("unit").GetString());
        Assert.True(root.GetProperty("complete").GetBoolean());
        Assert.Equal(1, root.GetProperty("independentRoutes").GetInt32());
        JsonElement route = Assert.Single(root.GetProperty("routes").EnumerateArray());

        // ΔfH°(H2O, l) = −285.830 ± 0.040 (CODATA 1989, from memory) from half of the two-mole reaction
        Assert.Equal(-285.83, route.GetProperty("value").GetDouble(), 1e-9);
        Assert.Equal(0.04, route.GetProperty("uncertainty").GetDouble(), 1e-12);
        JsonElement step = Assert.Single(route.GetProperty("steps").EnumerateArray());
        Assert.Equal("H1", step.GetProperty("id").GetString());
        Assert.Equal("1/2", step.GetProperty("factor").GetString());
    }

    [Fact]
    public void Routes_JsonOnTheDemo_ListsRoutesBestFirst_WithFractionFactors()
    {
        CliRun run = CliRun.Of("routes", RepoPaths.Demo("combustion-lab"), "--target", "CO(g)", "--json", "--top", "12");

        Assert.Equal(ExitCodes.Success, run.ExitCode);
        using JsonDocument document = JsonDocument.Parse(run.Out);
        JsonElement[] routes = document.RootElement.GetProperty("routes").EnumerateArray().ToArray();
        Assert.True(routes.Length > 3);
        for (int i = 1; i < routes.Length; i++)
        {
            double before = routes[i - 1].GetProperty("uncertainty").GetDouble();
            double after = routes[i].GetProperty("uncertainty").GetDouble();
            int stepsBefore = routes[i - 1].GetProperty("steps").GetArrayLength();
            int stepsAfter = routes[i].GetProperty("steps").GetArrayLength();
            Assert.True(before < after - 1e-12 || (Math.Abs(before - after) <= 1e-12 && stepsBefore <= stepsAfter), $"route {i} before route {i + 1}");
        }

        // Every factor is an exact fraction in text ("-1", "1/3", "-2/3"), never a decimal
        string[] factors = routes.SelectMany(route => route.GetProperty("steps").EnumerateArray()).Select(step => step.GetProperty("factor").GetString()!).ToArray();
        Assert.All(factors, factor => Assert.Matches("^-?[0-9]+(/[0-9]+)?$", factor));
        Assert.Contains(factors, factor => factor.Contains('/', StringComparison.Ordinal));

        // and each route's value is Σ factor × measured of its steps
        foreach (JsonElement route in routes)
        {
            double sum = route.GetProperty("steps").EnumerateArray().Sum(step => Fraction(step.GetProperty("factor").GetString()!) * step.GetProperty("measured").GetDouble());
            Assert.Equal(route.GetProperty("value").GetDouble(), sum, 1e-9);
        }
    }

    [Fact]
    public void Routes_MaxStepsCut_MarksTheResultIncomplete()
    {
        CliRun cut = CliRun.Of("routes", Handbook(), "--target", "CO(g)", "--max-steps", "1", "--json");
        CliRun full = CliRun.Of("routes", Handbook(), "--target", "CO(g)", "--max-steps", "2", "--json");

        // The only route needs two steps: with one step there is none and the search says it was cut
        Assert.Equal(ExitCodes.AnalysisProblem, cut.ExitCode);
        using JsonDocument cutJson = JsonDocument.Parse(cut.Out);
        Assert.False(cutJson.RootElement.GetProperty("complete").GetBoolean());
        Assert.Contains("--max-steps", cutJson.RootElement.GetProperty("incompleteReason").GetString(), StringComparison.Ordinal);
        Assert.Equal(["stepBound"], cutJson.RootElement.GetProperty("searchCut").EnumerateArray().Select(name => name.GetString()));
        Assert.Equal(1, cutJson.RootElement.GetProperty("completeUpToSteps").GetInt32());
        Assert.Contains("no route found", cut.Error, StringComparison.Ordinal);
        Assert.Equal(ExitCodes.Success, full.ExitCode);
        using JsonDocument fullJson = JsonDocument.Parse(full.Out);
        Assert.True(fullJson.RootElement.GetProperty("complete").GetBoolean());
        Assert.Equal(0, fullJson.RootElement.GetProperty("searchCut").GetArrayLength());
        Assert.Equal(2, fullJson.RootElement.GetProperty("completeUpToSteps").GetInt32());
    }

    [Theory]
    [InlineData("65")]
    [InlineData("30000")]
    [InlineData("0")]
    public void Routes_MaxStepsOutsideOneToAThousand_IsRefusedWithExitTwo(string maxSteps)
    {
        CliRun run = CliRun.Of("routes", Handbook(), "--target", "CO(g)", "--max-steps", maxSteps);

        Assert.Equal(ExitCodes.InvalidInput, run.ExitCode);
        Assert.Contains("--max-steps", run.Error, StringComparison.Ordinal);
        Assert.DoesNotContain("   at ", run.Error, StringComparison.Ordinal);
    }

    [Fact]
    public void Routes_MaxStepsAtTheLimit_IsAccepted()
    {
        CliRun run = CliRun.Of("routes", Handbook(), "--target", "CO(g)", "--max-steps", PathFinder.Cli.Commands.RoutesCommand.MaxStepsLimit.ToString(System.Globalization.CultureInfo.InvariantCulture), "--json");

        Assert.Equal(ExitCodes.Success, run.ExitCode);
        using JsonDocument json = JsonDocument.Parse(run.Out);
        Assert.True(json.RootElement.GetProperty("complete").GetBoolean());
        Assert.Equal(PathFinder.Cli.Commands.RoutesCommand.MaxStepsLimit, json.RootElement.GetProperty("maxSteps").GetInt32());
    }

    [Fact]
    public void Routes_UnreachableSpecies_IsNamed_AndExitsOne()
    {
        CliRun run = CliRun.Of("routes", RepoPaths.Demo("combustion-lab"), "--target", "NH3(g)");

        Assert.Equal(ExitCodes.AnalysisProblem, run.ExitCode);
        Assert.Contains("Unreachable: no measurement contains NH3(g)", run.Out, StringComparison.Ordinal);
        Assert.Contains("no route: no dH measurement contains NH3(g)", run.Error, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("CH4(g) + 2 O2(g) -> CO2(g)")]
    [InlineData("CH4(g) + 2 O2(g) CO2(g) + 2 H2O(l)")]
    [InlineData("Xy(g)")]
    public void Routes_BadTargetText_ExitsTwoWithACaretAndNoStackTrace(string target)
    {
        CliRun run = CliRun.Of("routes", RepoPaths.Demo("combustion-lab"), "--target", target);

        Assert.Equal(ExitCodes.InvalidInput, run.ExitCode);
        Assert.Contains($"error: target '{target}'", run.Error, StringComparison.Ordinal);
        Assert.Contains("^", run.Error, StringComparison.Ordinal);
        Assert.DoesNotContain("   at ", run.Error, StringComparison.Ordinal);
        Assert.DoesNotContain("Exception", run.Error, StringComparison.Ordinal);
        Assert.Equal("", run.Out);
    }

    [Fact]
    public void Routes_InternalEnergyProperty_ConvertsTheRouteWithTheTargetsGasChange()
    {
        // ΔU = ΔH − Δn(gas)·R·T; for CO formation Δn(gas) = 1 − 1/2 = +1/2, R·T/2 = 1.2395 kJ/mol (R from CODATA 2018)
        CliRun dh = CliRun.Of("routes", Handbook(), "--target", "CO(g)", "--json");
        CliRun du = CliRun.Of("routes", Handbook(), "--target", "CO(g)", "--json", "--property", "dU");

        using JsonDocument enthalpy = JsonDocument.Parse(dh.Out);
        using JsonDocument energy = JsonDocument.Parse(du.Out);
        double h = enthalpy.RootElement.GetProperty("routes")[0].GetProperty("value").GetDouble();
        double u = energy.RootElement.GetProperty("routes")[0].GetProperty("value").GetDouble();
        Assert.Equal(h - (0.5 * 8.314462618 * 298.15 / 1000.0), u, 1e-9);
        Assert.Equal("dU", energy.RootElement.GetProperty("property").GetString());
    }

    private static double Fraction(string text)
    {
        string[] parts = text.Split('/');
        double numerator = double.Parse(parts[0], CultureInfo.InvariantCulture);
        return parts.Length == 1 ? numerator : numerator / double.Parse(parts[1], CultureInfo.InvariantCulture);
    }
}
