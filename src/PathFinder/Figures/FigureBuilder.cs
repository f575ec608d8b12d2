using System.Globalization;
using System.Text;
using System.Text.RegularExpressions;
using Fractions;
using PathFinder.Analysis;
using PathFinder.Chemistry;
using PathFinder.Diagrams;
using PathFinder.Graph;
using PathFinder.Quantities;

namespace PathFinder.Figures;

/// <summary>Turns analysis results (routes, cycles, neighbourhoods) into diagram models for <see cref="PathFinder.Diagrams"/>.</summary>
/// <remarks>The CLI's <c>draw</c> command and the terminal explorer's export both use these, so both draw the same pictures.</remarks>
public static partial class FigureBuilder
{
    /// <summary>The network diagram of one route: its measurements highlighted, joined to the target through the species.</summary>
    public static NetworkDiagram RouteNetwork(RouteReport report, ExplainedRoute route, string unit, FigureMarks? marks = null)
    {
        ArgumentNullException.ThrowIfNull(report);
        ArgumentNullException.ThrowIfNull(route);
        var builder = new Builder(marks ?? FigureMarks.None, unit, report.Family.ResultProperty().Symbol());
        builder.AddTarget(report.Target, route.Value, route.Uncertainty);
        foreach (RouteStep step in route.Steps)
        {
            builder.AddMeasurement(step.Measurement, highlighted: true, includeReferences: true);
        }

        return builder.Build($"Route {route.Number} to {TitleText(report.Target)}");
    }

    /// <summary>The network diagram of all listed routes to a target, the best one highlighted.</summary>
    public static NetworkDiagram TargetNetwork(RouteReport report, string unit, FigureMarks? marks = null)
    {
        ArgumentNullException.ThrowIfNull(report);
        var builder = new Builder(marks ?? FigureMarks.None, unit, report.Family.ResultProperty().Symbol());
        ExplainedRoute? best = report.Routes.FirstOrDefault();
        builder.AddTarget(report.Target, best?.Value ?? double.NaN, best?.Uncertainty ?? double.NaN);
        var bestIds = new HashSet<string>(best?.Steps.Select(step => step.Measurement.Id) ?? [], StringComparer.Ordinal);
        foreach (RouteStep step in report.Routes.SelectMany(route => route.Steps).DistinctBy(step => step.Measurement.Id))
        {
            builder.AddMeasurement(step.Measurement, bestIds.Contains(step.Measurement.Id), includeReferences: false);
        }

        return builder.Build($"Routes to {TitleText(report.Target)} (best route highlighted)");
    }

    /// <summary>The network diagram of one cycle, its measurements highlighted.</summary>
    public static NetworkDiagram CycleNetwork(CycleCheck cycle, FigureMarks? marks = null)
    {
        ArgumentNullException.ThrowIfNull(cycle);
        var builder = new Builder(marks ?? FigureMarks.None, cycle.Unit, cycle.Symbol);
        foreach ((PreparedMeasurement measurement, Fraction _) in cycle.Members)
        {
            builder.AddMeasurement(measurement, highlighted: true, includeReferences: true);
        }

        string verdict = cycle.Flagged ? "does not close" : "closes";
        return builder.Build($"Cycle {cycle.Number}: {CombinationText(cycle)} {verdict} (z = {DiagramText.Signed(cycle.Z, 1)})");
    }

    /// <summary>The sub-network within <paramref name="depth"/> steps of some species.</summary>
    public static NetworkDiagram Neighbourhood(NetworkGraph graph, IReadOnlyList<Species> centres, int depth, PropertyFamily family, FigureMarks? marks = null)
    {
        ArgumentNullException.ThrowIfNull(graph);
        ArgumentNullException.ThrowIfNull(centres);
        var builder = new Builder(marks ?? FigureMarks.None, family.Unit().Symbol, family.ResultProperty().Symbol());
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
                builder.AddMeasurement(measurement, measurement.Property.Symbol(), measurement.Value, measurement.Uncertainty, highlighted: false, includeReferences: false);
            }
        }

        return builder.Build($"Within {depth} step{(depth == 1 ? "" : "s")} of {string.Join(", ", centres.Select(species => FormulaMarkup.ToUnicodeText(species.Name)))}");
    }

    /// <summary>The enthalpy-level (Hess ladder) diagram of a route.</summary>
    public static EnthalpyRoute RouteLevels(RouteReport report, ExplainedRoute route)
    {
        ArgumentNullException.ThrowIfNull(report);
        ArgumentNullException.ThrowIfNull(route);
        var start = report.Target.Terms.Where(term => term.Coefficient < Fraction.Zero).ToDictionary(term => term.Species, term => -term.Coefficient);
        (string startState, List<EnthalpyStep> steps) = Ladder(start, route.Steps.Select(step => (Label(step), step.Equation, step.Value, step.Uncertainty)).ToList());
        string symbol = report.Family.ResultProperty().Symbol();
        return new EnthalpyRoute($"Route {route.Number}: {TitleText(report.Target)}", EquationText(report.Target), startState, steps, route.Uncertainty, symbol, report.Family.Unit().Symbol);
    }

    /// <summary>The closure ladder of a cycle: the same picture, ending in the gap where it fails to close.</summary>
    /// <remarks>
    /// A cycle that mixes properties (<see cref="CycleCheck.IsMixed"/>, a G = H − TS closure) passes through no chemical
    /// states: its ladder adds the terms cᵢ·vᵢ in the cycle's order, each level named by the datum it adds.
    /// </remarks>
    public static CycleClosure CycleLevels(CycleCheck cycle)
    {
        ArgumentNullException.ThrowIfNull(cycle);
        if (cycle.IsMixed)
        {
            var terms = cycle.Members.Select(member =>
            {
                double c = member.Factor.ToDouble();
                string state = member.Measurement.Measurement.Property == ThermoProperty.AbsoluteEntropy
                    ? $"S°({FormulaMarkup.ToUnicodeText(member.Measurement.Equation.Terms[0].Species.Name)})"
                    : $"{member.Measurement.Symbol} of {TitleText(member.Measurement.Equation)}";
                return new EnthalpyStep(Usage(member.Measurement.Id, member.Factor), c * member.Measurement.Value, state, Math.Abs(c) * member.Measurement.Uncertainty);
            }).ToList();
            return new CycleClosure($"Cycle {cycle.Number}: {CombinationText(cycle)} (G = H − TS)", "0", terms, cycle.Uncertainty, cycle.Z, cycle.Symbol, cycle.Unit);
        }

        var members = cycle.Members.Select(member =>
        {
            ChemicalEquation scaled = member.Measurement.Equation.Scale(member.Factor);
            double c = member.Factor.ToDouble();
            string label = Usage(member.Measurement.Id, member.Factor);
            return (label, scaled, c * member.Measurement.Value, Math.Abs(c) * member.Measurement.Uncertainty);
        }).ToList();
        ChemicalEquation first = members[0].scaled;
        var start = first.Terms.Where(term => term.Coefficient < Fraction.Zero).ToDictionary(term => term.Species, term => -term.Coefficient);
        (string startState, List<EnthalpyStep> steps) = Ladder(start, members);
        return new CycleClosure($"Cycle {cycle.Number}: {CombinationText(cycle)}", startState, steps, cycle.Uncertainty, cycle.Z, cycle.Symbol, cycle.Unit);
    }

    /// <summary>A step as the trade writes it: "A08", "B04 reversed", "A03 reversed, × 1/3" (the wording of <see cref="RouteStep.Operation"/>).</summary>
    private static string Label(RouteStep step) => step.Factor == Fraction.One ? step.Measurement.Id : $"{step.Measurement.Id} {step.Operation}";

    /// <summary>The same wording for a cycle member, which has a factor but no <see cref="RouteStep"/>.</summary>
    private static string Usage(string id, Fraction factor)
    {
        Fraction magnitude = factor < Fraction.Zero ? -factor : factor;
        string scale = magnitude == Fraction.One ? "" : $"× {RationalText.Format(magnitude)}";
        return (factor < Fraction.Zero, scale.Length > 0) switch
        {
            (false, false) => id,
            (true, false) => $"{id} reversed",
            (false, true) => $"{id} {scale}",
            _ => $"{id} reversed, {scale}",
        };
    }

    /// <summary>A cycle as a signed combination of its measurements, e.g. "A02 + B04 − A08 + 3 C03".</summary>
    private static string CombinationText(CycleCheck cycle)
    {
        var text = new StringBuilder();
        foreach ((PreparedMeasurement measurement, Fraction factor) in cycle.Members)
        {
            bool negative = factor < Fraction.Zero;
            Fraction magnitude = negative ? -factor : factor;
            text.Append(text.Length == 0 ? (negative ? DiagramText.Minus.ToString() : "") : (negative ? $" {DiagramText.Minus} " : " + "));
            if (magnitude != Fraction.One)
            {
                text.Append(Vulgar(RationalText.Format(magnitude))).Append(' ');
            }

            text.Append(measurement.Id);
        }

        return text.ToString();
    }

    /// <summary>An equation in diagram markup: arrow "→" and common fractions as "½", subscripts left to the renderer.</summary>
    private static string EquationText(ChemicalEquation equation) =>
        Coefficients().Replace(equation.ToString().Replace(" -> ", " → ", StringComparison.Ordinal), match => Vulgar(match.Value));

    /// <summary>An equation for one-line titles: as <see cref="EquationText"/>, with Unicode sub- and superscripts ("O₂", "Cl⁻").</summary>
    private static string TitleText(ChemicalEquation equation) => FormulaMarkup.ToUnicodeText(EquationText(equation));

    /// <summary>"½" for "1/2" and the other fractions with a single-character form; anything else unchanged.</summary>
    private static string Vulgar(string fraction) => fraction switch
    {
        "1/2" => "½",
        "1/3" => "⅓",
        "2/3" => "⅔",
        "1/4" => "¼",
        "3/4" => "¾",
        "1/6" => "⅙",
        "5/6" => "⅚",
        _ => fraction,
    };

    [GeneratedRegex(@"(?<![\w/])\d+/\d+(?= )")]
    private static partial Regex Coefficients();

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
                text.Append(Vulgar(RationalText.Format(amount))).Append(' ');
            }

            text.Append(species.Name);
        }

        return text.Length > 0 ? text.ToString() : "0";
    }

    private sealed class Builder(FigureMarks marks, string unit, string targetSymbol)
    {
        private readonly List<NetworkNode> _nodes = [];
        private readonly List<NetworkEdge> _edges = [];
        private readonly HashSet<string> _ids = new(StringComparer.Ordinal);
        private readonly HashSet<string> _highlightedSpecies = new(StringComparer.Ordinal);

        public void AddTarget(ChemicalEquation target, double value, double uncertainty)
        {
            string sub = double.IsFinite(value)
                ? $"{targetSymbol} = {DiagramText.WithUncertainty(value, uncertainty, 2)} {unit}"
                : $"{targetSymbol} = ?";
            _ids.Add("target");
            _nodes.Add(NetworkNode.Target("target", sub, NetworkNodeFlags.Highlighted));
            foreach (EquationTerm term in target.Terms)
            {
                string id = AddSpecies(term.Species, highlighted: true);
                Fraction amount = term.Coefficient < Fraction.Zero ? -term.Coefficient : term.Coefficient;
                _edges.Add(term.Coefficient < Fraction.Zero
                    ? new NetworkEdge(id, "target", Vulgar(RationalText.Format(amount)))
                    : new NetworkEdge("target", id, Vulgar(RationalText.Format(amount))));
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

        /// <summary>Adds a measurement as analysed: its value converted to the property used (ΔU → ΔH, ln K → ΔG), said so in the label.</summary>
        public void AddMeasurement(PreparedMeasurement prepared, bool highlighted, bool includeReferences)
        {
            string used = prepared.Symbol;
            string given = prepared.Measurement.Property.Symbol();
            AddMeasurement(prepared.Measurement, given == used ? used : $"{used} (from {given})", prepared.Value, prepared.Uncertainty, highlighted, includeReferences);
        }

        public void AddMeasurement(Measurement measurement, string symbol, double value, double uncertainty, bool highlighted, bool includeReferences)
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

            string sub = $"{symbol} = {DiagramText.WithUncertainty(value, uncertainty, 2)}";
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
                    ? new NetworkEdge(species, id, Vulgar(RationalText.Format(amount)))
                    : new NetworkEdge(id, species, Vulgar(RationalText.Format(amount))));
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
