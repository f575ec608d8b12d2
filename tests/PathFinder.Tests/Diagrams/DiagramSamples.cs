using PathFinder.Diagrams;

namespace PathFinder.Tests.Diagrams;

/// <summary>Inputs for the diagram tests. The numbers are illustrative drawing inputs (approximate values from memory);
/// no test checks chemistry against them.</summary>
internal static class DiagramSamples
{
    private const NetworkNodeFlags H = NetworkNodeFlags.Highlighted;

    public static NetworkDiagram Network() => new(
        "Network around the target C(gr) + ½O2(g) → CO(g)",
        [
            NetworkNode.Species("C(gr)", H), NetworkNode.Species("O2(g)", H), NetworkNode.Species("CO2(g)", H), NetworkNode.Species("CO(g)", H),
            NetworkNode.Species("H2(g)"), NetworkNode.Species("H2O(l)"), NetworkNode.Species("CH3OH(l)"),
            NetworkNode.Species("SO4^2-(aq)"), NetworkNode.Species("Fe^3+"), NetworkNode.Species("CuSO4·5H2O(cr)"),
            NetworkNode.Measurement("m1", "ΔH = −393.5 ± 0.1 kJ/mol", H),
            NetworkNode.Measurement("m2", "ΔH = −283.0 ± 0.3 kJ/mol", H),
            NetworkNode.Measurement("m3", "ΔH = −285.8 ± 0.1 kJ/mol"),
            NetworkNode.Measurement("m4", "ΔH = −726.1 ± 0.9 kJ/mol", NetworkNodeFlags.Suspect),
            NetworkNode.Measurement("m5", "ΔH = +12.0 ± 4.0 kJ/mol", NetworkNodeFlags.Excluded),
            NetworkNode.Target("t1", "ΔH = ?", H),
        ],
        [
            new("C(gr)", "m1"), new("O2(g)", "m1"), new("m1", "CO2(g)"),
            new("CO(g)", "m2"), new("O2(g)", "m2", "½"), new("m2", "CO2(g)"),
            new("H2(g)", "m3"), new("O2(g)", "m3", "½", false), new("m3", "H2O(l)"),
            new("CH3OH(l)", "m4"), new("O2(g)", "m4", "3/2", false), new("m4", "CO2(g)", "1", false), new("m4", "H2O(l)", "2"),
            new("Fe^3+", "m5"), new("SO4^2-(aq)", "m5", "3"), new("m5", "CuSO4·5H2O(cr)"),
            new("C(gr)", "t1"), new("O2(g)", "t1", "½"), new("t1", "CO(g)"),
        ]);

    public static EnthalpyRoute Route() => new(
        "Route for the target C(gr) + ½O2(g) → CO(g)",
        "C(gr) + ½O2(g) → CO(g)",
        "C(gr) + O2(g)",
        [new EnthalpyStep("+1 × m1", -393.5, "CO2(g)", 0.1), new EnthalpyStep("−1 × m2", 283.0, "CO(g) + ½O2(g)", 0.3)],
        0.32);

    public static CycleClosure FailingCycle() => new(
        "Cycle check: m7, m2, m1",
        "C(gr) + O2(g)",
        [
            new EnthalpyStep("+1 × m7", -113.7, "CO(g) + ½O2(g)", 0.4),
            new EnthalpyStep("+1 × m2", -283.0, "CO2(g)", 0.3),
            new EnthalpyStep("−1 × m1", 393.5, "C(gr) + O2(g)", 0.1),
        ],
        0.51);

    public static CycleClosure ClosingCycle() => FailingCycle() with
    {
        Title = "Cycle check that closes",
        Steps =
        [
            new EnthalpyStep("+1 × m7", -110.3, "CO(g) + ½O2(g)", 0.4),
            new EnthalpyStep("+1 × m2", -283.0, "CO2(g)", 0.3),
            new EnthalpyStep("−1 × m1", 393.5, "C(gr) + O2(g)", 0.1),
        ],
    };

    /// <summary>A bipartite network of <paramref name="reactions"/> reactions, each 2 reactants → 2 products.</summary>
    public static NetworkDiagram Chain(int reactions)
    {
        var nodes = new List<NetworkNode>();
        var edges = new List<NetworkEdge>();
        int species = reactions + 2;
        for (int s = 0; s < species; s++)
        {
            nodes.Add(NetworkNode.Species($"X{s}(g)"));
        }

        for (int r = 0; r < reactions; r++)
        {
            string id = $"m{r}";
            nodes.Add(NetworkNode.Measurement(id));
            edges.Add(new NetworkEdge($"X{r}(g)", id));
            edges.Add(new NetworkEdge($"X{(r * 7 + 1) % species}(g)", id, "2"));
            edges.Add(new NetworkEdge(id, $"X{r + 2}(g)"));
            edges.Add(new NetworkEdge(id, $"X{(r * 3 + 5) % species}(g)"));
        }

        return new NetworkDiagram("Chain", nodes, edges);
    }
}
