using System.Globalization;
using System.Text;
using Fractions;
using PathFinder.Analysis;
using PathFinder.Chemistry;
using PathFinder.Diagrams;
using PathFinder.Graph;
using PathFinder.Quantities;

namespace PathFinder.Figures;

/// <summary>Turns analysis results (routes, cycles, neighbourhoods) into diagram models for <see cref="PathFinder.Diagrams"/>.</summary>
/// <remarks>The CLI's <c>draw</c> command and the terminal explorer's export both use these, so both draw the same pictures.</remarks>
public static class FigureBuilder
{
    /// <summary>The network diagram of one route: its measurements highlighted, joined to the target through the species.</summary>
    public static NetworkDiagram RouteNetwork(RouteReport report, ExplainedRoute route, string unit, FigureMarks? marks = null)
    {
        ArgumentNullException.ThrowIfNull(report);
        ArgumentNullException.ThrowIfNull(route);
        var builder = new Builder(marks ?? FigureMarks.None, unit, report.Family);
        builder.AddTarget(report.Target, route.Value, route.Uncertainty);
        foreach (RouteStep step in route.Steps)
        {
            builder.AddMeasurement(step.Measurement.Measurement, step.Measurement.Value, highlighted: true, includeReferences: true);
        }

        return builder.Build($"Route {route.Number} to {report.Target}");
    }

    /// <summary>The network diagram of all listed routes to a target, the best one highlighted.</summary>
    public static NetworkDiagram TargetNetwork(RouteReport report, string unit, FigureMarks? marks = null)
    {
        ArgumentNullException.ThrowIfNull(report);
        var builder = new Builder(marks ?? FigureMarks.None, unit, report.Family);
        ExplainedRoute? best = report.Routes.FirstOrDefault();
        builder.AddTarget(report.Target, best?.Value ?? double.NaN, best?.Uncertainty ?? double.NaN);
        var bestIds = new HashSet<string>(best?.Steps.Select(step => step.Measurement.Id) ?? [], StringComparer.Ordinal);
        foreach (RouteStep step in report.Routes.SelectMany(route => route.Steps).DistinctBy(step => step.Measurement.Id))
        {
            builder.AddMeasurement(step.Measurement.Measurement, step.Measurement.Value, bestIds.Contains(step.Measurement.Id), includeReferences: false);
        }

        return builder.Build($"Routes to {report.Target} (best route highlighted)");
    }

    /// <summary>The network diagram of one cycle, its measurements highlighted.</summary>
    public static NetworkDiagram CycleNetwork(CycleCheck cycle, PropertyFamily family, FigureMarks? marks = null)
    {
        ArgumentNullException.ThrowIfNull(cycle);
        var builder = new Builder(marks ?? FigureMarks.None, family.Unit().Symbol, family);
        foreach ((PreparedMeasurement measurement, Fraction _) in cycle.Members)
        {
            builder.AddMeasurement(measurement.Measurement, measurement.Value, highlighted: true, includeReferences: true);
        }

        string verdict = cycle.Flagged ? "does not close" : "closes";
        return builder.Build(string.Create(CultureInfo.InvariantCulture, $"Cycle {cycle.Number}: {verdict} (z = {cycle.Z:+0.0;-0.0})"));
    }

    /// <summary>The sub-network within <paramref name="depth"/> steps of some species.</summary>
    public static NetworkDiagram Neighbourhood(NetworkGraph graph, IReadOnlyList<Species> centres, int depth, PropertyFamily family, FigureMarks? marks = null)
    {
        ArgumentNullException.ThrowIfNull(graph);
        ArgumentNullException.ThrowIfNull(centres);
        var builder = new Builder(marks ?? FigureMarks.None, family.Unit().Symbol, family);
        IReadOnlyList<NetworkVertex> vertices = graph.Neighbourhood(centres, depth);
        foreach (Species centre in centres)
        {
            builder.AddSpecies(centre, highlighted: true);
        }

        foreach (NetworkVertex vertex in vertices.Where(vertex => vertex.Measurement is not null))
        {
            Measurement measurement = vertex.Measurement!;
            if (PropertyFamilies.FamilyOf(measurement.Property) == family)
            {
                builder.AddMeasurement(measurement, measurement.Value, highlighted: false, includeReferences: false);
            }
        }

        return builder.Build($"Within {depth} step{(depth == 1 ? "" : "s")} of {string.Join(", ", centres.Select(species => species.Name))}");
    }

    /// <summary>The enthalpy-level (Hess ladder) diagram of a route.</summary>
    public static EnthalpyRoute RouteLevels(RouteReport report, ExplainedRoute route)
    {
        ArgumentNullException.ThrowIfNull(report);
        ArgumentNullException.ThrowIfNull(route);
        var start = report.Target.Terms.Where(term => term.Coefficient < Fraction.Zero).ToDictionary(term => term.Species, term => -term.Coefficient);
        (string startState, List<EnthalpyStep> steps) = Ladder(start, route.Steps.Select(step => (Label(step), step.Equation, step.Value, step.Uncertainty)).ToList());
        string symbol = report.Family.ResultProperty().Symbol();
        return new EnthalpyRoute($"Route {route.Number}: {report.Target}", report.Target.ToString(), startState, steps, route.Uncertainty, symbol, report.Family.Unit().Symbol);
    }

    /// <summary>The closure ladder of a cycle: the same picture, ending in the gap where it fails to close.</summary>
    public static CycleClosure CycleLevels(CycleCheck cycle, PropertyFamily family)
    {
        ArgumentNullException.ThrowIfNull(cycle);
        var members = cycle.Members.Select(member =>
        {
            ChemicalEquation scaled = member.Measurement.Equation.Scale(member.Factor);
            double c = member.Factor.ToDouble();
            string label = $"{RationalText.Format(member.Factor)} × {member.Measurement.Id}";
            return (label, scaled, c * member.Measurement.Value, Math.Abs(c) * member.Measurement.Uncertainty);
        }).ToList();
        ChemicalEquation first = members[0].scaled;
        var start = first.Terms.Where(term => term.Coefficient < Fraction.Zero).ToDictionary(term => term.Species, term => -term.Coefficient);
        (string startState, List<EnthalpyStep> steps) = Ladder(start, members);
        return new CycleClosure($"Cycle {cycle.Number}", startState, steps, cycle.Uncertainty, cycle.Z, family.ResultProperty().Symbol(), family.Unit().Symbol);
    }

    private static string Label(RouteStep step) =>
        step.Factor == Fraction.One ? step.Measurement.Id : $"{RationalText.Format(step.Factor)} × {step.Measurement.Id}";

    /// <summary>Orders the steps so intermediate states are physical, adding spectators (such as O2) that must be present from the start.</summary>
    private static (string Start, List<EnthalpyStep> Steps) Ladder(Dictionary<Species, Fraction> start, List<(string Label, ChemicalEquation Equation, double Value, double Uncertainty)> items)
    {
        var remaining = new List<(string Label, ChemicalEquation Equation, double Value, double Uncertainty)>(items);
        var ordered = new List<(string Label, ChemicalEquation Equation, double Value, double Uncertainty)>();
        var state = new Dictionary<Species, Fraction>(start);
        while (remaining.Count > 0)
        {
            // Greedy: take the step that leaves the smallest total deficit; ties keep the route's order.
            int best = 0;
            Fraction bestDeficit = Deficit(state, remaining[0].Equation);
            for (int i = 1; i < remaining.Count; i++)
            {
                Fraction deficit = Deficit(state, remaining[i].Equation);
                if (deficit < bestDeficit)
                {
                    best = i;
                    bestDeficit = deficit;
                }
            }

            ordered.Add(remaining[best]);
            Apply(state, remaining[best].Equation);
            remaining.RemoveAt(best);
        }

        // Spectators: the least amount of each species that keeps every intermediate state non-negative.
        var spectators = new Dictionary<Species, Fraction>();
        var running = new Dictionary<Species, Fraction>(start);
        foreach (var item in ordered)
        {
            Apply(running, item.Equation);
            foreach ((Species species, Fraction amount) in running)
            {
                if (amount < Fraction.Zero && (!spectators.TryGetValue(species, out Fraction need) || -amount > need))
                {
                    spectators[species] = -amount;
                }
            }
        }

        var current = new Dictionary<Species, Fraction>(start);
        foreach ((Species species, Fraction amount) in spectators)
        {
            current[species] = current.GetValueOrDefault(species, Fraction.Zero) + amount;
        }

        string startState = StateText(current);
        var steps = new List<EnthalpyStep>();
        foreach (var item in ordered)
        {
            Apply(current, item.Equation);
            steps.Add(new EnthalpyStep(item.Label, item.Value, StateText(current), item.Uncertainty));
        }

        return (startState, steps);
    }

    private static Fraction Deficit(Dictionary<Species, Fraction> state, ChemicalEquation equation)
    {
        Fraction deficit = Fraction.Zero;
        foreach (EquationTerm term in equation.Terms)
        {
            Fraction after = state.GetValueOrDefault(term.Species, Fraction.Zero) + term.Coefficient;
            if (after < Fraction.Zero)
            {
                deficit -= after;
            }
        }

        return deficit;
    }

    private static void Apply(Dictionary<Species, Fraction> state, ChemicalEquation equation)
    {
        foreach (EquationTerm term in equation.Terms)
        {
            state[term.Species] = state.GetValueOrDefault(term.Species, Fraction.Zero) + term.Coefficient;
        }
    }

    private static string StateText(Dictionary<Species, Fraction> state)
    {
        var text = new StringBuilder();
        foreach ((Species species, Fraction amount) in state.Where(pair => pair.Value > Fraction.Zero))
        {
            if (text.Length > 0)
            {
                text.Append(" + ");
            }

            if (amount != Fraction.One)
            {
                text.Append(RationalText.Format(amount)).Append(' ');
            }

            text.Append(species.Name);
        }

        return text.Length > 0 ? text.ToString() : "0";
    }

    private sealed class Builder(FigureMarks marks, string unit, PropertyFamily family)
    {
        private readonly List<NetworkNode> _nodes = [];
        private readonly List<NetworkEdge> _edges = [];
        private readonly HashSet<string> _ids = new(StringComparer.Ordinal);
        private readonly HashSet<string> _highlightedSpecies = new(StringComparer.Ordinal);

        public void AddTarget(ChemicalEquation target, double value, double uncertainty)
        {
            string symbol = family.ResultProperty().Symbol();
            string sub = double.IsFinite(value)
                ? string.Create(CultureInfo.InvariantCulture, $"{symbol} = {value:0.##} ± {uncertainty:0.##} {unit}")
                : $"{symbol} = ?";
            _ids.Add("target");
            _nodes.Add(NetworkNode.Target("target", sub, NetworkNodeFlags.Highlighted));
            foreach (EquationTerm term in target.Terms)
            {
                string id = AddSpecies(term.Species, highlighted: true);
                Fraction amount = term.Coefficient < Fraction.Zero ? -term.Coefficient : term.Coefficient;
                _edges.Add(term.Coefficient < Fraction.Zero
                    ? new NetworkEdge(id, "target", RationalText.Format(amount))
                    : new NetworkEdge("target", id, RationalText.Format(amount)));
            }
        }

        public string AddSpecies(Species species, bool highlighted)
        {
            string id = "s:" + species.Key;
            if (highlighted)
            {
                _highlightedSpecies.Add(id);
            }

            if (_ids.Add(id))
            {
                _nodes.Add(NetworkNode.Species(species.Name));
                _nodes[^1] = _nodes[^1] with { Id = id };
            }

            return id;
        }

        public void AddMeasurement(Measurement measurement, double value, bool highlighted, bool includeReferences)
        {
            string id = "m:" + measurement.Id;
            if (!_ids.Add(id))
            {
                return;
            }

            NetworkNodeFlags flags = highlighted ? NetworkNodeFlags.Highlighted : NetworkNodeFlags.None;
            if (marks.Suspects.Contains(measurement.Id))
            {
                flags |= NetworkNodeFlags.Suspect;
            }

            if (marks.Excluded.Contains(measurement.Id))
            {
                flags |= NetworkNodeFlags.Excluded;
            }

            string symbol = measurement.Property.Symbol();
            string sub = string.Create(CultureInfo.InvariantCulture, $"{symbol} = {value:0.##} ± {measurement.Uncertainty:0.##}");
            _nodes.Add(NetworkNode.Measurement(measurement.Id, sub, flags) with { Id = id });
            foreach (EquationTerm term in measurement.Equation.Terms)
            {
                if (!includeReferences && ReferenceStates.HasZeroFormationProperties(term.Species))
                {
                    continue;
                }

                string species = AddSpecies(term.Species, highlighted);
                Fraction amount = term.Coefficient < Fraction.Zero ? -term.Coefficient : term.Coefficient;
                _edges.Add(term.Coefficient < Fraction.Zero
                    ? new NetworkEdge(species, id, RationalText.Format(amount))
                    : new NetworkEdge(id, species, RationalText.Format(amount)));
            }
        }

        public NetworkDiagram Build(string title)
        {
            NetworkNode[] nodes = _nodes
                .Select(node => _highlightedSpecies.Contains(node.Id) && node.Kind == NetworkNodeKind.Species ? node with { Flags = node.Flags | NetworkNodeFlags.Highlighted } : node)
                .ToArray();
            return new NetworkDiagram(title, nodes, _edges);
        }
    }
}
