using System.Xml.Linq;
using Fractions;
using PathFinder.Analysis;
using PathFinder.Chemistry;
using PathFinder.Diagrams;
using PathFinder.Figures;
using PathFinder.Graph;
using PathFinder.Tests.Analysis;
using PathFinder.Tests.TestSupport;

namespace PathFinder.Tests.Figures;

public sealed class FigureBuilderTests : IDisposable
{
    private readonly TempFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    private (ReactionNetwork Network, PropertyModel Model) Handbook(string? shiftedId = null, double sigmas = 0.0)
    {
        ReactionNetwork network = HandbookData.Read(_folder, HandbookData.ConsistentEnthalpyCsv(shiftedId, sigmas));
        return (network, PropertyModel.Build(network, PropertyFamily.Enthalpy));
    }

    private static RouteReport Routes(ReactionNetwork network, PropertyModel model, string target) =>
        RouteAnalysis.Find(model, TargetReaction.Parse(target, network).Value);

    [Theory]
    [InlineData("CO(g)")]
    [InlineData("H2O(l) -> H2O(g)")]
    [InlineData("CO(g) + H2O(l) -> CO2(g) + H2(g)")]
    public void RouteLevels_StepValuesSumToTheRouteValue_AndEveryStateIsPhysical(string target)
    {
        // Given every route to a target in the handbook network
        (ReactionNetwork network, PropertyModel model) = Handbook();
        RouteReport report = Routes(network, model, target);
        Assert.NotEmpty(report.Routes);
        ChemicalEquation equation = TargetReaction.Parse(target, network).Value;

        foreach (ExplainedRoute route in report.Routes)
        {
            // When drawn as a level ladder
            EnthalpyRoute levels = FigureBuilder.RouteLevels(report, route);

            // Then the levels add up to the route's value and uncertainty
            Assert.Equal(route.Value, levels.TargetValue, 1e-9);
            Assert.Equal(route.Uncertainty, levels.TargetUncertainty, 1e-12);
            Assert.Equal(route.Steps.Count, levels.Steps.Count);

            // and each state follows from the one before by exactly that step's equation (so no amount went negative
            // and was hidden), and the ladder as a whole performs the target reaction
            AssertLadderIsPhysical(levels.StartState, levels.Steps, route.Steps.ToDictionary(step => step.Measurement.Id, step => step.Equation));
            Assert.Equal(Amounts(equation), Difference(State(levels.Steps[^1].StateAfter), State(levels.StartState)));
        }
    }

    [Fact]
    public void RouteLevels_CombustionRoute_AddsTheOxygenSpectatorNeededByTheFirstStep()
    {
        // Given ΔfH°(CO) from the combustions of graphite and CO (values from CODATA 1989, from memory)
        ReactionNetwork network = HandbookData.ReadRows(
            _folder,
            "G1,C(graphite) + O2(g) -> CO2(g),dH,-393.51,0.13,kJ/mol,,bomb",
            "G2,CO(g) + 1/2 O2(g) -> CO2(g),dH,-282.98,0.20,kJ/mol,,bomb");
        PropertyModel model = PropertyModel.Build(network, PropertyFamily.Enthalpy);
        RouteReport report = Routes(network, model, "CO(g)");

        // When drawn
        EnthalpyRoute levels = FigureBuilder.RouteLevels(report, report.Routes[0]);

        // Then the ladder starts from graphite with a whole O2 (the target's ½ O2 plus a ½ O2 spectator), burns it to CO2,
        // and ends at CO with the spectator back
        Dictionary<string, Fraction> start = State(levels.StartState);
        Assert.Equal(Fraction.One, start[KeyOf("O2(g)")]);
        Assert.Equal(["G1", "G2 reversed"], levels.Steps.Select(step => step.Label));
        Assert.Equal(new Dictionary<string, Fraction> { [KeyOf("CO2(g)")] = Fraction.One }, State(levels.Steps[0].StateAfter));
        Assert.Equal(-110.53, levels.TargetValue, 1e-9);
    }

    [Fact]
    public void CycleLevels_ClosureResidualEqualsTheCycleResidual_AndTheLadderReturnsToItsStart()
    {
        // Given the handbook network with CO's formation moved by 12σ, so some cycles fail
        (ReactionNetwork network, PropertyModel _) = Handbook("F4", 12.0);
        ModelConsistency consistency = ConsistencyCheck.Analyse(ThermoModel.Build(network));
        Assert.NotEmpty(consistency.FlaggedCycles);

        foreach (CycleCheck cycle in consistency.Cycles)
        {
            // When each cycle is drawn as a closure ladder
            CycleClosure closure = FigureBuilder.CycleLevels(cycle);

            // Then the gap is the cycle's residual, with its uncertainty and z
            Assert.Equal(cycle.Residual, closure.Residual, 1e-9);
            Assert.Equal(cycle.Uncertainty, closure.ResidualUncertainty, 1e-12);
            Assert.Equal(cycle.Z, closure.EffectiveZ, 1e-9);

            // and the states are physical and come back to the start
            var equations = cycle.Members.ToDictionary(member => member.Measurement.Id, member => member.Measurement.Equation.Scale(member.Factor));
            AssertLadderIsPhysical(closure.StartState, closure.Steps, equations);
            Assert.Equal(State(closure.StartState), State(closure.Steps[^1].StateAfter));
        }
    }

    [Fact]
    public void NetworkDiagrams_OfRoutesCyclesAndNeighbourhoods_RenderAsXml()
    {
        // Given the handbook network with a shifted value, its routes to CO(g) and its cycles
        (ReactionNetwork network, PropertyModel model) = Handbook("F4", 12.0);
        RouteReport report = Routes(network, model, "CO(g)");
        ModelConsistency consistency = ConsistencyCheck.Analyse(ThermoModel.Build(network));
        var marks = new FigureMarks(consistency.Suspects.Select(suspect => suspect.Measurement.Id).ToHashSet(), new HashSet<string> { "R4" });
        Species carbonMonoxide = network.FindSpecies("CO(g)")!;

        NetworkDiagram[] diagrams =
        [
            FigureBuilder.RouteNetwork(report, report.Routes[1], "kJ/mol", marks),
            FigureBuilder.TargetNetwork(report, "kJ/mol", marks),
            FigureBuilder.CycleNetwork(consistency.Cycles[0], marks),
            FigureBuilder.Neighbourhood(NetworkGraph.Build(network), [carbonMonoxide], 2, PropertyFamily.Enthalpy, marks),
        ];

        foreach (NetworkDiagram diagram in diagrams)
        {
            // Then every edge joins existing nodes, node ids are unique, and the rendered SVG parses as XML
            var ids = diagram.Nodes.Select(node => node.Id).ToHashSet(StringComparer.Ordinal);
            Assert.Equal(diagram.Nodes.Count, ids.Count);
            Assert.All(diagram.Edges, edge => Assert.True(ids.Contains(edge.From) && ids.Contains(edge.To), $"{edge.From} -> {edge.To}"));
            NetworkDiagramResult result = NetworkDiagramRenderer.Render(diagram);
            Assert.True(result.IsRendered, result.RefusalMessage);
            XDocument svg = XDocument.Parse(result.Diagram!.Svg);
            Assert.Equal("svg", svg.Root!.Name.LocalName);
        }

        // and the suspect is marked wherever it is drawn
        Assert.Contains("F4", marks.Suspects);
        NetworkNode suspect = diagrams[2].Nodes.Single(node => node.Id == "m:F4");
        Assert.True(suspect.Has(NetworkNodeFlags.Suspect));
        Assert.True(diagrams[3].Nodes.Single(node => node.Id == "m:R4").Has(NetworkNodeFlags.Excluded));
        Assert.Contains(diagrams[1].Nodes, node => node.Kind == NetworkNodeKind.Target);
    }

    private static void AssertLadderIsPhysical(string startState, IReadOnlyList<EnthalpyStep> steps, IReadOnlyDictionary<string, ChemicalEquation> equationById)
    {
        Dictionary<string, Fraction> before = State(startState);
        foreach (EnthalpyStep step in steps)
        {
            string id = step.Label.Split(' ')[0];
            Dictionary<string, Fraction> after = State(step.StateAfter);
            Assert.Equal(Amounts(equationById[id]), Difference(after, before));
            before = after;
        }
    }

    /// <summary>"1/2" for "½" and the other one-character fractions the diagrams print.</summary>
    private static string FromVulgar(string text) => text switch
    {
        "½" => "1/2",
        "⅓" => "1/3",
        "⅔" => "2/3",
        "¼" => "1/4",
        "¾" => "3/4",
        "⅙" => "1/6",
        "⅚" => "5/6",
        _ => text,
    };

    /// <summary>Reads a state text such as <c>½ O2(g) + CO(g)</c> (positive amounts only, as drawn).</summary>
    private static Dictionary<string, Fraction> State(string text)
    {
        var state = new Dictionary<string, Fraction>(StringComparer.Ordinal);
        if (text == "0")
        {
            return state;
        }

        foreach (string part in text.Split(" + "))
        {
            string[] words = part.Split(' ', 2);
            if (words.Length == 2 && RationalText.TryParse(FromVulgar(words[0]), out Fraction amount))
            {
                state[KeyOf(words[1])] = amount;
            }
            else
            {
                state[KeyOf(part)] = Fraction.One;
            }
        }

        return state;
    }

    /// <summary>One species may be written two ways (C(graphite), C(cr,graphite)); states are compared by species key.</summary>
    private static string KeyOf(string name) => SpeciesParser.Parse(name).TryGetValue(out Species? species) ? species.Key : name;

    private static Dictionary<string, Fraction> Amounts(ChemicalEquation equation) =>
        equation.Terms.Where(term => !term.Coefficient.IsZero).ToDictionary(term => term.Species.Key, term => term.Coefficient, StringComparer.Ordinal);

    private static Dictionary<string, Fraction> Difference(Dictionary<string, Fraction> after, Dictionary<string, Fraction> before)
    {
        var difference = new Dictionary<string, Fraction>(StringComparer.Ordinal);
        foreach (string name in after.Keys.Union(before.Keys))
        {
            Fraction change = after.GetValueOrDefault(name, Fraction.Zero) - before.GetValueOrDefault(name, Fraction.Zero);
            if (!change.IsZero)
            {
                difference[name] = change;
            }
        }

        return difference;
    }
}
