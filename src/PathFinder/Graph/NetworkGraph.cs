using Fractions;
using PathFinder.Chemistry;
using QuikGraph;
using QuikGraph.Algorithms;

namespace PathFinder.Graph;

/// <summary>The network as a bipartite directed graph (QuikGraph): species and measurement vertices, stoichiometric edges.</summary>
/// <remarks>
/// Reactants point into their measurement and the measurement points to its products. Most queries skip species
/// fixed by convention (O2, H2, graphite, …) when walking the graph, because those hubs join everything to everything
/// and carry no information about which data bear on which species.
/// </remarks>
public sealed class NetworkGraph
{
    private readonly BidirectionalGraph<NetworkVertex, StoichiometricEdge> _graph;

    private NetworkGraph(ReactionNetwork network, BidirectionalGraph<NetworkVertex, StoichiometricEdge> graph)
    {
        Network = network;
        _graph = graph;
    }

    /// <summary>The network drawn.</summary>
    public ReactionNetwork Network { get; }

    /// <summary>The underlying QuikGraph graph.</summary>
    public IBidirectionalGraph<NetworkVertex, StoichiometricEdge> Graph => _graph;

    /// <summary>Builds the graph of <paramref name="network"/>.</summary>
    public static NetworkGraph Build(ReactionNetwork network)
    {
        ArgumentNullException.ThrowIfNull(network);
        var graph = new BidirectionalGraph<NetworkVertex, StoichiometricEdge>(allowParallelEdges: true);
        foreach (Species species in network.Species)
        {
            graph.AddVertex(NetworkVertex.Of(species));
        }

        foreach (Measurement measurement in network.Measurements)
        {
            NetworkVertex reaction = NetworkVertex.Of(measurement);
            graph.AddVertex(reaction);
            foreach (EquationTerm term in measurement.Equation.Terms)
            {
                NetworkVertex species = NetworkVertex.Of(term.Species);
                graph.AddEdge(term.Coefficient < Fraction.Zero
                    ? new StoichiometricEdge(species, reaction, -term.Coefficient)
                    : new StoichiometricEdge(reaction, species, term.Coefficient));
            }
        }

        return new NetworkGraph(network, graph);
    }

    /// <summary>The measurements that involve <paramref name="species"/>.</summary>
    public IEnumerable<Measurement> MeasurementsOf(Species species)
    {
        NetworkVertex vertex = NetworkVertex.Of(species);
        if (!_graph.ContainsVertex(vertex))
        {
            return [];
        }

        return _graph.InEdges(vertex).Select(edge => edge.Source).Concat(_graph.OutEdges(vertex).Select(edge => edge.Target))
            .Select(reaction => reaction.Measurement!)
            .Distinct();
    }

    /// <summary>The species that share a measurement with <paramref name="species"/> (reference states left out).</summary>
    public IEnumerable<Species> NeighboursOf(Species species) =>
        MeasurementsOf(species)
            .SelectMany(measurement => measurement.Equation.Terms.Select(term => term.Species))
            .Where(other => !other.Equals(species) && !ReferenceStates.HasZeroFormationProperties(other))
            .Distinct();

    /// <summary>The vertices within <paramref name="depth"/> measurement steps of the given species (breadth first, not through reference states).</summary>
    /// <remarks>Depth 1 is the species' measurements and their species; depth 2 adds their measurements, and so on.</remarks>
    public IReadOnlyList<NetworkVertex> Neighbourhood(IEnumerable<Species> centres, int depth)
    {
        ArgumentNullException.ThrowIfNull(centres);
        var seen = new HashSet<NetworkVertex>();
        var frontier = new List<NetworkVertex>();
        foreach (Species centre in centres)
        {
            NetworkVertex vertex = NetworkVertex.Of(centre);
            if (_graph.ContainsVertex(vertex) && seen.Add(vertex))
            {
                frontier.Add(vertex);
            }
        }

        for (int level = 0; level < depth && frontier.Count > 0; level++)
        {
            var next = new List<NetworkVertex>();
            foreach (NetworkVertex species in frontier)
            {
                foreach (Measurement measurement in MeasurementsOf(species.Species!))
                {
                    NetworkVertex reaction = NetworkVertex.Of(measurement);
                    if (!seen.Add(reaction))
                    {
                        continue;
                    }

                    foreach (EquationTerm term in measurement.Equation.Terms)
                    {
                        NetworkVertex other = NetworkVertex.Of(term.Species);
                        if (seen.Add(other) && !ReferenceStates.HasZeroFormationProperties(term.Species))
                        {
                            next.Add(other);
                        }
                    }
                }
            }

            frontier = next;
        }

        return seen.ToArray();
    }

    /// <summary>Groups species into connected components (linked through measurements, not through reference states).</summary>
    /// <returns>Component number per species; species fixed by convention are left out.</returns>
    public IReadOnlyDictionary<Species, int> Components()
    {
        var undirected = new UndirectedGraph<NetworkVertex, StoichiometricEdge>(allowParallelEdges: true);
        foreach (NetworkVertex vertex in _graph.Vertices)
        {
            if (vertex.Species is null || !ReferenceStates.HasZeroFormationProperties(vertex.Species))
            {
                undirected.AddVertex(vertex);
            }
        }

        foreach (StoichiometricEdge edge in _graph.Edges)
        {
            if (undirected.ContainsVertex(edge.Source) && undirected.ContainsVertex(edge.Target))
            {
                undirected.AddEdge(edge);
            }
        }

        var components = new Dictionary<NetworkVertex, int>();
        undirected.ConnectedComponents(components);
        return components.Where(pair => pair.Key.Species is not null).ToDictionary(pair => pair.Key.Species!, pair => pair.Value);
    }

    /// <summary>Species with no path through measurements to any element in its reference state (or other conventional zero).</summary>
    /// <remarks>Their values can only ever be known relative to each other; they are found by weakly connected components of the whole graph.</remarks>
    public IReadOnlyList<Species> SpeciesWithoutPathToElements()
    {
        var components = new Dictionary<NetworkVertex, int>();
        _graph.WeaklyConnectedComponents(components);
        var anchored = new HashSet<int>(components
            .Where(pair => pair.Key.Species is not null && ReferenceStates.HasZeroFormationProperties(pair.Key.Species))
            .Select(pair => pair.Value));
        return components
            .Where(pair => pair.Key.Species is not null && !anchored.Contains(pair.Value))
            .Select(pair => pair.Key.Species!)
            .OrderBy(species => species.Name, StringComparer.Ordinal)
            .ToArray();
    }
}
