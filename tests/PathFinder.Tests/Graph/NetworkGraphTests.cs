using PathFinder.Chemistry;
using PathFinder.Data;
using PathFinder.Graph;
using PathFinder.Tests.TestSupport;

namespace PathFinder.Tests.Graph;

public sealed class NetworkGraphTests : IDisposable
{
    private const string Header = "id,equation,property,value,uncertainty,unit,temperature,source";

    private readonly TempFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    /// <summary>Two chemically separate groups that share only the O2/H2 hubs, plus an isomer pair linked only to each other (invented values).</summary>
    private NetworkGraph Build()
    {
        _folder.Write("species.csv", "key,formula,state,name\nnBu(g),C4H10,g,butane(g)\niBu(g),C4H10,g,isobutane(g)\n");
        _folder.Write(
            "network.csv",
            Header + "\n"
            + "m1,CO2(g),dH,-393.51,0.13,kJ/mol,,a\n"
            + "m2,CO(g) + 1/2 O2(g) -> CO2(g),dH,-282.98,0.2,kJ/mol,,a\n"
            + "m3,CH4(g) + H2O(g) -> CO(g) + 3 H2(g),dH,206.1,0.5,kJ/mol,,a\n"
            + "m4,H2O(g),dH,-241.826,0.04,kJ/mol,,a\n"
            + "m5,HCl(g),dH,-92.31,0.1,kJ/mol,,b\n"
            + "m6,H2(g) + Cl2(g) -> 2 HCl(g),dH,-184.62,0.2,kJ/mol,,b\n"
            + "m7,nBu(g) -> iBu(g),dH,-8.0,0.5,kJ/mol,,c\n");
        NetworkReadResult read = NetworkReader.Read(_folder.Path);
        Assert.Empty(read.Errors);
        return NetworkGraph.Build(read.Network);
    }

    private static Species Find(NetworkGraph graph, string name) => graph.Network.FindSpecies(name)!;

    [Fact]
    public void Build_HasOneVertexPerSpeciesAndMeasurement_AndOneEdgePerTerm()
    {
        NetworkGraph graph = Build();

        Assert.Equal(graph.Network.Species.Count + graph.Network.Measurements.Count, graph.Graph.VertexCount);
        Assert.Equal(graph.Network.Measurements.Sum(measurement => measurement.Equation.Terms.Count), graph.Graph.EdgeCount);

        // Reactants point into the measurement, products out of it, with positive coefficients
        StoichiometricEdge[] edges = graph.Graph.Edges.Where(edge => edge.Source.Key == "m:m3" || edge.Target.Key == "m:m3").ToArray();
        Assert.Contains(edges, edge => edge.IsReactant && edge.Source.Species!.Name == "CH4(g)");
        Assert.Contains(edges, edge => !edge.IsReactant && edge.Target.Species!.Name == "H2(g)" && edge.Coefficient == new Fractions.Fraction(3));
    }

    [Fact]
    public void NeighboursOf_LeavesOutReferenceStates()
    {
        NetworkGraph graph = Build();

        // CO(g) shares m2 with CO2 (and O2) and m3 with CH4, H2O(g) (and H2)
        Assert.Equal(["CH4(g)", "CO2(g)", "H2O(g)"], graph.NeighboursOf(Find(graph, "CO(g)")).Select(species => species.Name).Order(StringComparer.Ordinal));
        Assert.Equal(["m2", "m3"], graph.MeasurementsOf(Find(graph, "CO(g)")).Select(measurement => measurement.Id).Order(StringComparer.Ordinal));
        Assert.Empty(graph.NeighboursOf(Find(graph, "HCl(g)")));
    }

    [Fact]
    public void Components_DoNotJoinThroughReferenceStates()
    {
        NetworkGraph graph = Build();

        IReadOnlyDictionary<Species, int> components = graph.Components();

        // The carbon group, the chlorine group and the isomer pair are three components, although H2 and O2 touch all
        Assert.DoesNotContain(components.Keys, ReferenceStates.HasZeroFormationProperties);
        int carbon = components[Find(graph, "CO(g)")];
        Assert.Equal(carbon, components[Find(graph, "CH4(g)")]);
        Assert.Equal(carbon, components[Find(graph, "H2O(g)")]);
        Assert.Equal(carbon, components[Find(graph, "CO2(g)")]);
        Assert.NotEqual(carbon, components[Find(graph, "HCl(g)")]);
        Assert.Equal(components[Find(graph, "nBu(g)")], components[Find(graph, "iBu(g)")]);
        Assert.Equal(3, components.Values.Distinct().Count());
    }

    [Fact]
    public void Neighbourhood_GrowsWithDepth_AndDoesNotWalkThroughReferenceStates()
    {
        NetworkGraph graph = Build();
        Species methane = Find(graph, "CH4(g)");

        IReadOnlyList<NetworkVertex> depth0 = graph.Neighbourhood([methane], 0);
        IReadOnlyList<NetworkVertex> depth1 = graph.Neighbourhood([methane], 1);
        IReadOnlyList<NetworkVertex> depth2 = graph.Neighbourhood([methane], 2);
        IReadOnlyList<NetworkVertex> depth9 = graph.Neighbourhood([methane], 9);

        Assert.Equal(["s:" + methane.Key], depth0.Select(vertex => vertex.Key));

        // Depth 1: CH4's measurement m3 and its species (H2 is shown but not expanded)
        Assert.Equal(["CH4(g)", "CO(g)", "H2(g)", "H2O(g)", "m3"], Names(depth1));

        // Depth 2 adds the measurements of CO and H2O(g) and their species, not HCl through H2
        Assert.Equal(["CH4(g)", "CO(g)", "CO2(g)", "H2(g)", "H2O(g)", "O2(g)", "m2", "m3", "m4"], Names(depth2));

        // However deep, nothing of the chlorine group or the isomers is reached
        Assert.Superset(depth2.ToHashSet(), depth9.ToHashSet());
        Assert.DoesNotContain(depth9, vertex => vertex.Species?.Name == "HCl(g)" || vertex.Species?.Name == "nBu(g)" || vertex.Measurement?.Id == "m6");
    }

    [Fact]
    public void SpeciesWithoutPathToElements_AreTheIsomerPairOnly()
    {
        NetworkGraph graph = Build();

        Assert.Equal(["iBu(g)", "nBu(g)"], graph.SpeciesWithoutPathToElements().Select(species => species.Name));
    }

    [Fact]
    public void SpeciesWithoutPathToElements_IsEmptyForTheDemo()
    {
        NetworkGraph graph = NetworkGraph.Build(NetworkReader.Read(RepoPaths.Demo("combustion-lab")).Network);

        Assert.Empty(graph.SpeciesWithoutPathToElements());
    }

    private static string[] Names(IEnumerable<NetworkVertex> vertices) =>
        vertices.Select(vertex => vertex.ToString()).Order(StringComparer.Ordinal).ToArray();
}
