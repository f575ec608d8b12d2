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
        // Given the worst cycle of the combustion-lab demo: a G = H − TS closure through E04, the ΔfG°(CO) copied from a
        // kcal/mol column (group-e.csv), which no ΔH-only cycle can see
        CycleCheck worst = WorstCycle();
        Assert.True(worst.IsMixed);
        Assert.Equal(["A01", "A08", "D02", "D03", "D04", "E04"], worst.Members.Select(member => member.Measurement.Id).Order(StringComparer.Ordinal));

        // When its closure is drawn
        CycleClosure closure = FigureBuilder.CycleLevels(worst);
        LevelDiagram diagram = LevelDiagramRenderer.RenderCycle(closure);

        // Then it matches the snapshot
        SnapshotAssert.Matches(diagram.Diagram.Svg, "demo-combustion-cycle1-closure.svg");

        // And, independently of the golden file: the ladder adds the terms cᵢ·vᵢ from the CSV values,
        // ΔfH°(CO2) − ΔfH°(CO) + T·(½ S°(O2) + S°(C) − S°(CO)) − ΔfG°(CO) with T = 298.15 K and S° in kJ/(mol·K):
        // −393.51 + 283.0 + 0.149075 × 205.2 + 0.29815 × 5.74 − 0.29815 × 197.7 + 32.78 = −104.37 kJ/mol,
        // which is E04's slip: 32.78 kcal/mol is 137.15 kJ/mol
        double residual = -393.51 + 283.0 + (0.149075 * 205.2) + (0.29815 * 5.74) - (0.29815 * 197.7) + 32.78;
        Assert.Equal(residual, closure.Residual, 1e-9);
        Assert.Equal(residual, worst.Residual, 1e-9);
        Assert.False(diagram.Closes);
        Assert.Equal(6, diagram.Arrows.Count(arrow => arrow.Kind == LevelArrowKind.Step));
        Assert.Equal(7, diagram.Levels.Count);
        Assert.Equal(0.0, diagram.Levels[0].Value, 1e-12);
        Assert.Equal(residual, diagram.Levels[^1].Value, 1e-9);
        PlacedArrow gap = Assert.Single(diagram.Arrows, arrow => arrow.Kind == LevelArrowKind.Gap);
        Assert.Equal(diagram.Levels[0].Y, gap.Start.Y, 1e-9);
        Assert.Equal(diagram.Levels[^1].Y, gap.End.Y, 1e-9);
        Assert.True(gap.End.Y > gap.Start.Y, "a negative residual ends below zero (y grows downwards)");
        string svg = diagram.Diagram.Svg;
        Assert.All(["A01", "A08", "D02", "D03", "D04", "E04"], id => Assert.Contains($">{id}", svg, StringComparison.Ordinal));
        Assert.Contains("E04 reversed", svg, StringComparison.Ordinal);
        Assert.Contains("(G = H − TS)", svg, StringComparison.Ordinal);
        Assert.Contains("does not close", svg, StringComparison.Ordinal);
        Assert.Contains("residual −104.4 ± 0.3 kJ/mol", svg, StringComparison.Ordinal);
        Assert.Contains("Σ / (kJ/mol)", svg, StringComparison.Ordinal);
    }

    [Fact]
    public void CycleClosure_OfTheC03Cycle_MatchesSnapshot()
    {
        // Given the ΔH-only cycle A02 − A08 + B04 + C03 (the demo's worst before group E; still the worst through C03),
        // chosen by its members, not its rank
        CycleCheck cycle = CycleThrough("A02", "A08", "B04", "C03");
        Assert.False(cycle.IsMixed);

        // When its closure is drawn
        LevelDiagram diagram = LevelDiagramRenderer.RenderCycle(FigureBuilder.CycleLevels(cycle));

        // Then it matches the snapshot, and independently: −285.83 + 283.0 + 44.01 − 47.6 = −6.42 kJ/mol does not close
        SnapshotAssert.Matches(diagram.Diagram.Svg, "demo-combustion-c03-cycle-closure.svg");
        Assert.False(diagram.Closes);
        Assert.Equal(-285.83 + 283.0 + 44.01 - 47.6, diagram.Levels[^1].Value, 1e-9);
        Assert.Equal(4, diagram.Arrows.Count(arrow => arrow.Kind == LevelArrowKind.Step));
        Assert.All(["A02", "A08", "B04", "C03"], id => Assert.Contains($">{id}", diagram.Diagram.Svg, StringComparison.Ordinal));
        Assert.Contains("does not close", diagram.Diagram.Svg, StringComparison.Ordinal);
        Assert.Contains("residual −6.4 ± 0.4 kJ/mol", diagram.Diagram.Svg, StringComparison.Ordinal);
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
        // Given the cycle A02 − A08 + B04 + C03 (chosen by its members: it is no longer the worst, which now runs
        // through E04), whose A02 and B04 steps have uncertainties of 0.04 kJ/mol (group-a.csv, group-b.csv)
        CycleClosure closure = FigureBuilder.CycleLevels(CycleThrough("A02", "A08", "B04", "C03"));

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

    private static IReadOnlyList<CycleCheck> Cycles()
    {
        NetworkReadResult read = NetworkReader.Read(RepoPaths.Demo("combustion-lab"));
        return ConsistencyCheck.Analyse(ThermoModel.Build(read.Network, read.HeatCapacities)).Cycles;
    }

    private static CycleCheck WorstCycle() => Cycles()[0];

    // The one cycle made of exactly these measurements, wherever it ranks.
    private static CycleCheck CycleThrough(params string[] ids) =>
        Assert.Single(Cycles(), cycle => cycle.Members.Select(member => member.Measurement.Id).Order(StringComparer.Ordinal).SequenceEqual(ids.Order(StringComparer.Ordinal)));
}
