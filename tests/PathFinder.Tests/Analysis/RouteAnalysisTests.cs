using Fractions;
using PathFinder.Analysis;
using PathFinder.Chemistry;
using PathFinder.Routes;
using PathFinder.Tests.TestSupport;

namespace PathFinder.Tests.Analysis;

public sealed class RouteAnalysisTests : IDisposable
{
    private readonly TempFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    private static RouteReport Find(ReactionNetwork network, string target, int maxSteps = 6)
    {
        PropertyModel model = PropertyModel.Build(network, PropertyFamily.Enthalpy);
        ChemicalEquation equation = TargetReaction.Parse(target, network).Value;
        return RouteAnalysis.Find(model, equation, new RouteSearchOptions { MaxSteps = maxSteps });
    }

    [Fact]
    public void Find_CarbonMonoxideFromTwoCombustions_GivesTheTabulatedFormationEnthalpy()
    {
        // Given the combustion of graphite (= ΔfH°(CO2)) and of CO (ΔcH(CO) = ΔfH°(CO2) − ΔfH°(CO) = −282.98),
        // both from CODATA Key Values (Cox, Wagman, Medvedev 1989), from memory
        double combustionOfCo = HandbookData.CarbonDioxide.Value - HandbookData.CarbonMonoxide.Value;
        ReactionNetwork network = HandbookData.ReadRows(
            _folder,
            $"G1,C(graphite) + O2(g) -> CO2(g),dH,{HandbookData.CarbonDioxide.Value:R},0.13,kJ/mol,,bomb",
            $"G2,CO(g) + 1/2 O2(g) -> CO2(g),dH,{combustionOfCo:R},0.20,kJ/mol,,bomb");

        // When the routes to the formation of CO(g) are found
        RouteReport report = Find(network, "CO(g)");

        // Then the one route is G1 − G2, with exact factors, and gives ΔfH°(CO, g) = −110.53 (CODATA 1989, from memory)
        ExplainedRoute route = Assert.Single(report.Routes);
        Assert.Equal([("G1", Fraction.One), ("G2", Fraction.MinusOne)], route.Steps.Select(step => (step.Measurement.Id, step.Factor)));
        double propagated = Math.Sqrt((0.13 * 0.13) + (0.20 * 0.20));
        Assert.Equal(propagated, route.Uncertainty, 1e-12);
        Assert.InRange(route.Value, HandbookData.CarbonMonoxide.Value - propagated, HandbookData.CarbonMonoxide.Value + propagated);
        Assert.Equal(HandbookData.CarbonMonoxide.Value, route.Value, 1e-9);
        Assert.True(report.Complete);
        Assert.Equal(["CO2(g)"], route.Cancelled.Select(species => species.Name));
        Assert.Equal("reversed", route.Steps[1].Operation);
    }

    [Fact]
    public void Find_VaporizationOfWater_IsTheDifferenceOfTheTwoFormationEnthalpies()
    {
        // Given ΔfH° of H2O(l) and H2O(g) (CODATA Key Values 1989, from memory)
        ReactionNetwork network = HandbookData.ReadRows(
            _folder,
            $"W1,H2O(l),dH,{HandbookData.LiquidWater.Value:R},{HandbookData.LiquidWater.Uncertainty:R},kJ/mol,,table",
            $"W2,H2O(g),dH,{HandbookData.WaterVapour.Value:R},{HandbookData.WaterVapour.Uncertainty:R},kJ/mol,,table");

        // When the route to H2O(l) -> H2O(g) is found
        RouteReport report = Find(network, "H2O(l) -> H2O(g)");

        // Then ΔvapH°(H2O, 298.15 K) = 44.004 kJ/mol (CODATA 1989 difference, from memory), u = √(0.04² + 0.04²)
        ExplainedRoute route = Assert.Single(report.Routes);
        Assert.Equal(44.004, route.Value, 1e-9);
        Assert.Equal(Math.Sqrt(2) * 0.040, route.Uncertainty, 1e-12);
        Assert.Equal(["-1", "1"], route.Steps.OrderBy(step => step.Measurement.Id, StringComparer.Ordinal).Select(step => RationalText.Format(step.Factor)));
    }

    [Fact]
    public void Find_HalfAReaction_UsesTheExactFactorOneHalf()
    {
        // Given 2 H2 + O2 -> 2 H2O(l) with twice the tabulated ΔfH°(H2O, l) (CODATA 1989, from memory)
        ReactionNetwork network = HandbookData.ReadRows(_folder, "H1,2 H2(g) + O2(g) -> 2 H2O(l),dH,-571.66,0.08,kJ/mol,,table");

        // When the formation of one H2O(l) is the target
        RouteReport report = Find(network, "H2O(l)");

        // Then the factor is exactly 1/2 and value and uncertainty are halved
        RouteStep step = Assert.Single(Assert.Single(report.Routes).Steps);
        Assert.Equal(new Fraction(1, 2), step.Factor);
        Assert.Equal("1/2", RationalText.Format(step.Factor));
        Assert.Equal("× 1/2", step.Operation);
        Assert.Equal(HandbookData.LiquidWater.Value, step.Value, 1e-9);
        Assert.Equal(0.04, step.Uncertainty, 1e-12);
    }

    [Fact]
    public void Find_SeveralRoutes_AreSortedByUncertaintyThenSteps_AndAllAgreeWithTheTable()
    {
        // Given the consistent handbook network (CODATA 1989 values, from memory), with several routes to CO(g)
        ReactionNetwork network = HandbookData.Read(_folder, HandbookData.ConsistentEnthalpyCsv());

        // When the routes to the formation of CO(g) are found
        RouteReport report = Find(network, "CO(g)");

        // Then there are several, best first: by uncertainty, then by fewer steps
        Assert.True(report.Routes.Count >= 4, $"only {report.Routes.Count} routes");
        for (int i = 1; i < report.Routes.Count; i++)
        {
            ExplainedRoute before = report.Routes[i - 1];
            ExplainedRoute after = report.Routes[i];
            Assert.True(
                before.Uncertainty < after.Uncertainty - 1e-12 || (Math.Abs(before.Uncertainty - after.Uncertainty) <= 1e-12 && before.Steps.Count <= after.Steps.Count),
                $"route {before.Number} (u {before.Uncertainty}, {before.Steps.Count} steps) before route {after.Number} (u {after.Uncertainty}, {after.Steps.Count} steps)");
            Assert.Equal(i + 1, after.Number);
        }

        // and the best is the direct measurement; every route's value is the tabulated −110.53 within its uncertainty
        Assert.Equal("F4", Assert.Single(report.Routes[0].Steps).Measurement.Id);
        Assert.All(report.Routes, route => Assert.InRange(route.Value, HandbookData.CarbonMonoxide.Value - route.Uncertainty, HandbookData.CarbonMonoxide.Value + route.Uncertainty));

        // and every route's steps sum to the target, with value and uncertainty propagated from its steps
        ChemicalEquation target = TargetReaction.Parse("CO(g)", network).Value;
        Assert.All(report.Routes, route =>
        {
            Assert.Equal(route.Steps.Sum(step => step.Value), route.Value, 1e-9);
            Assert.Equal(Math.Sqrt(route.Steps.Sum(step => step.Uncertainty * step.Uncertainty)), route.Uncertainty, 1e-12);
            Assert.True(route.Sum.Add(target.Scale(Fraction.MinusOne)).Terms.All(term => term.Coefficient.IsZero || ReferenceStates.HasZeroFormationProperties(term.Species)));
        });
    }

    [Fact]
    public void Find_StepBoundBelowTheOnlyRoute_IsIncomplete_AndComplete_WhenTheBoundAllowsIt()
    {
        // Given a two-step route only (graphite and CO combustions)
        ReactionNetwork network = HandbookData.ReadRows(
            _folder,
            "G1,C(graphite) + O2(g) -> CO2(g),dH,-393.51,0.13,kJ/mol,,bomb",
            "G2,CO(g) + 1/2 O2(g) -> CO2(g),dH,-282.98,0.20,kJ/mol,,bomb");

        // When searched with one step, then with two
        RouteReport cut = Find(network, "CO(g)", maxSteps: 1);
        RouteReport full = Find(network, "CO(g)", maxSteps: 2);

        // Then the one-step search is flagged incomplete (the step bound cut it), the two-step search is complete
        Assert.Empty(cut.Routes);
        Assert.False(cut.Complete);
        Assert.True(cut.Cut.HasFlag(SearchCut.StepBound));
        Assert.Contains("--max-steps", cut.IncompleteReason, StringComparison.Ordinal);
        Assert.True(full.Complete);
        Assert.Equal("", full.IncompleteReason);
        Assert.Single(full.Routes);
    }

    [Theory]
    [InlineData(SearchCut.WorkBudget, 3, "all routes up to 3 steps were found; the work budget ran out while searching 4-step routes")]
    [InlineData(SearchCut.TimeBudget, 1, "all routes up to 1 step were found; the time budget ran out while searching 2-step routes")]
    [InlineData(SearchCut.StoppedEarly, 0, "the search stopped after the requested number of routes while searching 1-step routes")]
    [InlineData(SearchCut.StepBound, 6, "longer routes than 6 steps may exist (raise --max-steps)")]
    [InlineData(SearchCut.None, 6, "")]
    public void IncompleteReason_SaysWhatCutTheSearch_AndUpToWhichSizeItIsComplete(SearchCut cut, int completeUpTo, string expected)
    {
        // Given a report of a 6-step search cut as stated
        var report = new RouteReport(ChemicalEquation.FromTerms([]), PropertyFamily.Enthalpy, [], 0, cut, 0, [], null, 6, completeUpTo);

        // Then the reason names the cut and the size up to which every route was found
        Assert.Equal(expected, report.IncompleteReason);
    }

    [Fact]
    public void Find_WithAWorkBudget_ReportsTheBudgetAndTheSizeReached()
    {
        // Given the graphite and CO combustions (one route of two steps)
        ReactionNetwork network = HandbookData.ReadRows(
            _folder,
            "G1,C(graphite) + O2(g) -> CO2(g),dH,-393.51,0.13,kJ/mol,,bomb",
            "G2,CO(g) + 1/2 O2(g) -> CO2(g),dH,-282.98,0.20,kJ/mol,,bomb");
        PropertyModel model = PropertyModel.Build(network, PropertyFamily.Enthalpy);
        ChemicalEquation target = TargetReaction.Parse("CO(g)", network).Value;

        // When the search may take a single step of work
        RouteReport report = RouteAnalysis.Find(model, target, new RouteSearchOptions { WorkBudget = 1 });

        // Then it is cut by the work budget before any route, and says so
        Assert.Equal(SearchCut.WorkBudget, report.Cut);
        Assert.Empty(report.Routes);
        Assert.Contains("the work budget ran out", report.IncompleteReason, StringComparison.Ordinal);
    }

    [Fact]
    public void Find_SpeciesNoMeasurementContains_IsReportedUnreachable()
    {
        // Given a network without sulfur
        ReactionNetwork network = HandbookData.Read(_folder, HandbookData.ConsistentEnthalpyCsv());

        // When SO2(g) is the target
        RouteReport report = Find(network, "SO2(g)");

        // Then there is no route and SO2(g) is named as unreachable
        Assert.Empty(report.Routes);
        Assert.Equal(["SO2(g)"], report.UnreachableSpecies.Select(species => species.Name));
        Assert.Null(report.NetworkEstimate);
    }

    [Fact]
    public void Find_WithSolution_GivesTheNetworkEstimateBesideTheRoutes()
    {
        // Given the consistent handbook network and its least-squares solution
        ReactionNetwork network = HandbookData.Read(_folder, HandbookData.ConsistentEnthalpyCsv());
        PropertyModel model = PropertyModel.Build(network, PropertyFamily.Enthalpy);
        var solutions = new NetworkSolutions(network, adjust: false);
        SolveReport solved = solutions.Report(PropertyFamily.Enthalpy)!;
        ChemicalEquation target = TargetReaction.Parse("CO(g)", network).Value;

        // When the routes to CO(g) are found with the joint solution's estimate
        RouteReport report = RouteAnalysis.Find(model, target, null, solutions.DerivedEstimate(PropertyFamily.Enthalpy, target));

        // Then the estimate is the solved ΔfH°(CO), within the tabulated uncertainty of −110.53 (CODATA 1989, from memory)
        Assert.NotNull(report.NetworkEstimate);
        Assert.Equal(solved.Species.Single(estimate => estimate.Species.Name == "CO(g)").Value, report.NetworkEstimate.Value.Value, 1e-9);
        Assert.InRange(report.NetworkEstimate.Value.Value, -110.53 - 0.17, -110.53 + 0.17);
        Assert.True(report.NetworkEstimate.Value.StandardUncertainty < report.Routes[0].Uncertainty);
    }
}
