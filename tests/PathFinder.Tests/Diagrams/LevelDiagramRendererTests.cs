using System.Xml.Linq;
using PathFinder.Diagrams;

namespace PathFinder.Tests.Diagrams;

public class LevelDiagramRendererTests
{
    private const double Tolerance = 0.01;

    public static TheoryData<string> Kinds => ["route", "failing cycle", "closing cycle"];

    private static LevelDiagram Render(string kind) => kind switch
    {
        "route" => LevelDiagramRenderer.RenderRoute(DiagramSamples.Route()),
        "failing cycle" => LevelDiagramRenderer.RenderCycle(DiagramSamples.FailingCycle()),
        _ => LevelDiagramRenderer.RenderCycle(DiagramSamples.ClosingCycle()),
    };

    [Theory]
    [MemberData(nameof(Kinds))]
    public void Render_ProducesValidSvgWithAllTextOnCanvas(string kind)
    {
        LevelDiagram diagram = Render(kind);

        XDocument doc = SvgChecks.ParseValid(diagram.Diagram);
        SvgChecks.AllTextInsideCanvas(doc, diagram.Diagram);
    }

    [Theory]
    [MemberData(nameof(Kinds))]
    public void Render_PlacesLevelsByValue(string kind)
    {
        // Then a larger cumulative value is drawn higher (smaller y), with heights proportional to the values.
        IReadOnlyList<PlacedLevel> levels = Render(kind).Levels;
        PlacedLevel zero = levels[0];
        PlacedLevel extreme = levels.MaxBy(l => Math.Abs(l.Value))!;
        double pixelsPerUnit = (zero.Y - extreme.Y) / extreme.Value;

        Assert.Equal(0.0, zero.Value, Tolerance);
        foreach (PlacedLevel a in levels)
        {
            Assert.Equal(zero.Y - (a.Value * pixelsPerUnit), a.Y, 0.05);
            foreach (PlacedLevel b in levels.Where(b => b.Value > a.Value + Tolerance))
            {
                Assert.True(b.Y < a.Y, $"{b.State} ({b.Value}) should be above {a.State} ({a.Value})");
            }
        }
    }

    [Theory]
    [MemberData(nameof(Kinds))]
    public void Render_StepArrowsJoinSuccessiveLevelsAndLevelsDoNotOverlap(string kind)
    {
        LevelDiagram diagram = Render(kind);
        List<PlacedArrow> steps = diagram.Arrows.Where(a => a.Kind == LevelArrowKind.Step).ToList();

        Assert.Equal(diagram.Levels.Count - 1, steps.Count);
        for (int i = 0; i < steps.Count; i++)
        {
            Assert.Equal(diagram.Levels[i].Y, steps[i].Start.Y, Tolerance);
            Assert.Equal(diagram.Levels[i + 1].Y, steps[i].End.Y, Tolerance);
            Assert.Equal(diagram.Levels[i + 1].Left, steps[i].End.X, Tolerance);
            Assert.True(diagram.Levels[i].Right < diagram.Levels[i + 1].Left);
        }
    }

    [Fact]
    public void RenderRoute_OverallArrowRunsFromZeroToTheTargetLevel()
    {
        EnthalpyRoute route = DiagramSamples.Route();
        LevelDiagram diagram = LevelDiagramRenderer.RenderRoute(route);

        PlacedArrow overall = Assert.Single(diagram.Arrows, a => a.Kind == LevelArrowKind.Overall);
        Assert.Equal(diagram.Levels[0].Y, overall.Start.Y, Tolerance);
        Assert.Equal(diagram.Levels[^1].Y, overall.End.Y, Tolerance);
        Assert.Contains("−110.5 ± 0.3 kJ/mol", overall.Text, StringComparison.Ordinal);
        Assert.Null(diagram.Closes);
    }

    [Fact]
    public void RenderCycle_MarksAFailingClosure()
    {
        LevelDiagram diagram = LevelDiagramRenderer.RenderCycle(DiagramSamples.FailingCycle());

        Assert.False(diagram.Closes);
        PlacedArrow gap = Assert.Single(diagram.Arrows, a => a.Kind == LevelArrowKind.Gap);
        Assert.Contains("does not close", gap.Text, StringComparison.Ordinal);
        Assert.Contains("residual −3.2 ± 0.5 kJ/mol", gap.Text, StringComparison.Ordinal);
        Assert.Contains("z = −6.3", gap.Text, StringComparison.Ordinal);
        Assert.Contains(">!</text>", diagram.Diagram.Svg, StringComparison.Ordinal);
    }

    [Fact]
    public void RenderCycle_AcceptsAClosureWithinTheThreshold()
    {
        LevelDiagram diagram = LevelDiagramRenderer.RenderCycle(DiagramSamples.ClosingCycle());

        Assert.True(diagram.Closes);
        Assert.Contains("closes within uncertainty", diagram.Arrows[^1].Text, StringComparison.Ordinal);
        Assert.DoesNotContain(">!</text>", diagram.Diagram.Svg, StringComparison.Ordinal);
    }

    [Fact]
    public void RenderCycle_UsesAGivenZScoreAndThreshold()
    {
        CycleClosure cycle = DiagramSamples.FailingCycle() with { ZScore = -1.5 };

        Assert.True(LevelDiagramRenderer.RenderCycle(cycle).Closes);
        Assert.False(LevelDiagramRenderer.RenderCycle(cycle, new LevelDiagramOptions { ZThreshold = 1.0 }).Closes);
    }

    [Fact]
    public void RenderRoute_HandlesAZeroStepAndASingleLevel()
    {
        var flat = new EnthalpyRoute("Flat", "A → A", "A(g)", [new EnthalpyStep("+1 × m1", 0.0, "A(g)")], 0.0);
        var empty = new EnthalpyRoute("Empty", "A → A", "A(g)", [], 0.0);

        SvgChecks.ParseValid(LevelDiagramRenderer.RenderRoute(flat).Diagram);
        SvgChecks.ParseValid(LevelDiagramRenderer.RenderRoute(empty).Diagram);
    }

    [Fact]
    public void RenderRoute_MatchesSnapshot()
    {
        SnapshotAssert.Matches(LevelDiagramRenderer.RenderRoute(DiagramSamples.Route()).Diagram.Svg, "route-sample.svg");
    }

    [Fact]
    public void RenderCycle_MatchesSnapshot()
    {
        SnapshotAssert.Matches(LevelDiagramRenderer.RenderCycle(DiagramSamples.FailingCycle()).Diagram.Svg, "cycle-failing-sample.svg");
    }
}
