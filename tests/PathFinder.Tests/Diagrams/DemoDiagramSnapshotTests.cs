using PathFinder.Analysis;
using PathFinder.Chemistry;
using PathFinder.Data;
using PathFinder.Diagrams;
using PathFinder.Figures;
using PathFinder.Routes;
using PathFinder.Tests.TestSupport;

namespace PathFinder.Tests.Diagrams;

/// <summary>The diagrams of the combustion-lab demo, built as <c>pathfinder draw</c> builds them, against committed snapshots.</summary>
/// <remarks>
/// The snapshots are the reviewed pictures (render them with tests/render-demo-diagrams.sh). The network layout is
/// deterministic (MSAGL's layer ordering uses a fixed seed), which <see cref="RouteNetwork_IsTheSameOnEveryRender"/>
/// checks within a run and the snapshot checks across runs.
/// </remarks>
public sealed class DemoDiagramSnapshotTests
{
    private const double Tolerance = 1.5;

    [Fact]
    public void RouteLevels_OfTheBestRouteToCarbonMonoxide_MatchSnapshot()
    {
        // Given the best route to ΔfH(CO, g) in the combustion-lab demo; When its level diagram is drawn; Then it matches the snapshot.
        (RouteReport report, _) = Routes("CO(g)");

        LevelDiagram diagram = LevelDiagramRenderer.RenderRoute(FigureBuilder.RouteLevels(report, report.Routes[0]));

        SnapshotAssert.Matches(diagram.Diagram.Svg, "demo-combustion-route1-levels.svg");
    }

    [Fact]
    public void CycleClosure_OfTheWorstCycle_MatchesSnapshot()
    {
        // Given the worst cycle of the combustion-lab demo (it contains the slipped C03); When its closure is drawn; Then it matches the snapshot.
        CycleCheck worst = WorstCycle();

        LevelDiagram diagram = LevelDiagramRenderer.RenderCycle(FigureBuilder.CycleLevels(worst));

        SnapshotAssert.Matches(diagram.Diagram.Svg, "demo-combustion-cycle1-closure.svg");
        Assert.False(diagram.Closes);
    }

    [Fact]
    public void RouteNetwork_OfTheBestRouteToCarbonMonoxide_MatchesSnapshot()
    {
        (RouteReport report, PropertyModel model) = Routes("CO(g)");

        NetworkDiagramResult result = NetworkDiagramRenderer.Render(FigureBuilder.RouteNetwork(report, report.Routes[0], model.Unit.Symbol));

        SnapshotAssert.Matches(result.Diagram!.Svg, "demo-combustion-route1-network.svg");
    }

    [Fact]
    public void RouteNetwork_IsTheSameOnEveryRender()
    {
        // Given the network of all routes to CO(g) (the largest demo diagram); When drawn three times; Then the SVGs are identical.
        (RouteReport report, PropertyModel model) = Routes("CO(g)");
        NetworkDiagram diagram = FigureBuilder.TargetNetwork(report, model.Unit.Symbol);

        string[] svgs = Enumerable.Range(0, 3).Select(_ => NetworkDiagramRenderer.Render(diagram).Diagram!.Svg).ToArray();

        Assert.All(svgs, svg => Assert.Equal(svgs[0], svg));
    }

    [Fact]
    public void TargetNetwork_HasNoOverlappingNodesAndEveryEdgeJoinsItsNodes()
    {
        // Given all routes to CO(g); When laid out; Then node boxes are apart, and each edge starts at its source box and ends on its target box.
        (RouteReport report, PropertyModel model) = Routes("CO(g)");
        NetworkDiagramResult result = NetworkDiagramRenderer.Render(FigureBuilder.TargetNetwork(report, model.Unit.Symbol));
        NetworkLayout layout = result.Layout!;
        var boxes = layout.Nodes.ToDictionary(node => node.Id, node => node.Box);

        for (int i = 0; i < layout.Nodes.Count; i++)
        {
            for (int j = i + 1; j < layout.Nodes.Count; j++)
            {
                Assert.False(layout.Nodes[i].Box.Overlaps(layout.Nodes[j].Box), $"{layout.Nodes[i].Id} overlaps {layout.Nodes[j].Id}");
            }
        }

        // Rounded ends and hexagon tips lie inside the bounding box by up to 0.35 of the box height.
        foreach (PlacedEdge edge in layout.Edges)
        {
            DiagramRect from = boxes[edge.From];
            DiagramRect to = boxes[edge.To];
            Assert.True(from.Contains(edge.Start, Tolerance) && from.DistanceToOutline(edge.Start) <= (0.35 * from.Height) + Tolerance, $"edge {edge.From} → {edge.To} does not start on its source");
            Assert.True(to.Contains(edge.Tip, Tolerance) && to.DistanceToOutline(edge.Tip) <= (0.35 * to.Height) + Tolerance, $"edge {edge.From} → {edge.To} does not end on its target");
        }

        Assert.Contains(layout.Nodes, node => node.Kind == NetworkNodeKind.Target);
        Assert.Contains(layout.Edges, edge => edge.Highlighted);
    }

    [Fact]
    public void RouteLevels_LabelStepsAsTheTradeWritesThem()
    {
        // Given route 2 to CO(g), which uses measurements reversed and scaled (as 'pathfinder routes' lists it)
        (RouteReport report, _) = Routes("CO(g)");
        ExplainedRoute route = report.Routes[1];

        // When its ladder is built
        EnthalpyRoute levels = FigureBuilder.RouteLevels(report, route);

        // Then each step reads "id", "id reversed", "id × 1/3" or "id reversed, × 1/3", with the route's own operation text
        Assert.Equal(
            route.Steps.Select(step => step.Operation == "as measured" ? step.Measurement.Id : $"{step.Measurement.Id} {step.Operation}").Order(StringComparer.Ordinal),
            levels.Steps.Select(step => step.Label).Order(StringComparer.Ordinal));
        Assert.Contains(levels.Steps, step => step.Label.Contains("reversed, × ", StringComparison.Ordinal));
        Assert.DoesNotContain(levels.Steps, step => step.Label.Contains("-1", StringComparison.Ordinal));
    }

    [Fact]
    public void CycleClosure_ShowsSmallUncertaintiesWithTwoDecimals()
    {
        // Given the worst cycle, whose A02 and B04 steps have uncertainties of 0.04 kJ/mol (group-a.csv, group-b.csv)
        CycleClosure closure = FigureBuilder.CycleLevels(WorstCycle());

        // When drawn
        LevelDiagram diagram = LevelDiagramRenderer.RenderCycle(closure);

        // Then those steps print "± 0.04", never "± 0.0", and a reversed member reads "reversed"
        Assert.Contains(diagram.Arrows, arrow => arrow.Text.Contains("± 0.04 kJ/mol", StringComparison.Ordinal));
        Assert.DoesNotContain("± 0.0 ", diagram.Diagram.Svg, StringComparison.Ordinal);
        Assert.Contains(closure.Steps, step => step.Label.EndsWith(" reversed", StringComparison.Ordinal));
    }

    [Fact]
    public void Titles_WriteFormulasWithSubscriptsAndArrows()
    {
        (RouteReport report, PropertyModel model) = Routes("CO(g)");

        NetworkDiagram network = FigureBuilder.RouteNetwork(report, report.Routes[0], model.Unit.Symbol);

        Assert.Equal("Route 1 to C(cr,graphite) + ½ O₂(g) → CO(g)", network.Title);
    }

    private static PropertyModel Model(NetworkReadResult read) => PropertyModel.Build(read.Network, PropertyFamily.Enthalpy, read.HeatCapacities);

    private static (RouteReport Report, PropertyModel Model) Routes(string target)
    {
        NetworkReadResult read = NetworkReader.Read(RepoPaths.Demo("combustion-lab"));
        PropertyModel model = Model(read);
        Assert.True(TargetReaction.Parse(target, read.Network).TryGetValue(out ChemicalEquation? equation));
        RouteReport report = RouteAnalysis.Find(model, equation, new RouteSearchOptions { MaxSteps = 6, MaxRoutes = 10 });
        return (report, model);
    }

    private static CycleCheck WorstCycle()
    {
        NetworkReadResult read = NetworkReader.Read(RepoPaths.Demo("combustion-lab"));
        return ConsistencyCheck.Analyse(ThermoModel.Build(read.Network, read.HeatCapacities)).Cycles[0];
    }
}
