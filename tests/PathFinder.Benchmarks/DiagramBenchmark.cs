using System.Diagnostics;
using System.Globalization;
using PathFinder.Analysis;
using PathFinder.Chemistry;
using PathFinder.Diagrams;
using PathFinder.Figures;
using PathFinder.Graph;
using PathFinder.Synthetic;

namespace PathFinder.Benchmarks;

/// <summary>Times the layered layout and SVG drawing of network diagrams of realistic neighbourhoods of a generated network.</summary>
public static class DiagramBenchmark
{
    private const int Samples = 3;
    private const int Runs = 3;

    /// <summary>Draws three neighbourhoods of about <paramref name="nodes"/> nodes in a 2,000-species, 30,000-measurement network and prints their size, layout time and SVG size.</summary>
    /// <param name="output">Where the figures go.</param>
    /// <param name="nodes">The wanted diagram size in nodes (species plus measurements).</param>
    /// <param name="seed">Generator seed; also picks the neighbourhoods' starting species.</param>
    /// <remarks>
    /// A neighbourhood of depth 2 in such a network already has thousands of nodes, so the size is approached by
    /// growing a depth-1 neighbourhood one centre at a time, the centres taken breadth first from a starting species
    /// (a compact region of the network, as a user asking for "the species around X" would get). Each diagram is drawn
    /// three times with the node limit lifted; the least and largest wall-clock and process CPU times are printed (on a
    /// shared machine the least is the honest figure; the first run may include JIT warm-up of code paths the warm-up
    /// diagram did not reach). The default limit is <see cref="NetworkDiagramOptions.DefaultMaxNodes"/>.
    /// </remarks>
    public static void Run(TextWriter output, int nodes, int seed)
    {
        ArgumentNullException.ThrowIfNull(output);
        CultureInfo inv = CultureInfo.InvariantCulture;
        SyntheticNetwork synthetic = SyntheticNetworkGenerator.Generate(new SyntheticNetworkOptions
        {
            SpeciesCount = 2000,
            MeasurementCount = 30000,
            Seed = seed,
        });
        NetworkGraph graph = NetworkGraph.Build(synthetic.Network);
        output.WriteLine(string.Create(inv, $"diagram: neighbourhoods of about {nodes} nodes in a 2000-species, 30000-measurement network, seed {seed}; default limit {NetworkDiagramOptions.DefaultMaxNodes} nodes"));

        var unlimited = new NetworkDiagramOptions { MaxNodes = int.MaxValue };
        NetworkDiagramRenderer.Render(Grow(graph, synthetic.Network.Species[0], 40), unlimited);

        var random = new Random(seed);
        List<Species> candidates = synthetic.Network.Species.Where(species => !ReferenceStates.HasZeroFormationProperties(species)).ToList();
        for (int sample = 0; sample < Samples; sample++)
        {
            Species start = candidates[random.Next(candidates.Count)];
            NetworkDiagram diagram = Grow(graph, start, nodes);
            var wall = new double[Runs];
            var cpu = new double[Runs];
            SvgDiagram? svg = null;
            for (int run = 0; run < Runs; run++)
            {
                GC.Collect();
                TimeSpan cpuBefore = Process.GetCurrentProcess().TotalProcessorTime;
                var watch = Stopwatch.StartNew();
                NetworkDiagramResult result = NetworkDiagramRenderer.Render(diagram, unlimited);
                wall[run] = watch.Elapsed.TotalMilliseconds;
                cpu[run] = (Process.GetCurrentProcess().TotalProcessorTime - cpuBefore).TotalMilliseconds;
                svg = result.Diagram;
            }

            string verdict = diagram.Nodes.Count > NetworkDiagramOptions.DefaultMaxNodes ? "refused by default" : "within limit";
            output.WriteLine(string.Create(
                inv,
                $"  {diagram.Nodes.Count,4} nodes {diagram.Edges.Count,5} edges  around {start.Name,-14}  wall {wall.Min(),6:F0} ms (max {wall.Max(),6:F0}), CPU {cpu.Min(),6:F0} ms (max {cpu.Max(),6:F0})  SVG {svg!.Svg.Length / 1024.0,7:F1} KiB, {svg.Width:F0} × {svg.Height:F0}  ({verdict})"));
        }
    }

    /// <summary>The depth-1 neighbourhood of the first few species met breadth first from <paramref name="start"/>, grown until it has at least <paramref name="nodes"/> nodes.</summary>
    private static NetworkDiagram Grow(NetworkGraph graph, Species start, int nodes)
    {
        var centres = new List<Species>();
        var queue = new Queue<Species>([start]);
        var seen = new HashSet<Species> { start };
        NetworkDiagram diagram = FigureBuilder.Neighbourhood(graph, [start], 1, PropertyFamily.Enthalpy);
        while (queue.Count > 0)
        {
            Species next = queue.Dequeue();
            centres.Add(next);
            diagram = FigureBuilder.Neighbourhood(graph, centres, 1, PropertyFamily.Enthalpy);
            if (diagram.Nodes.Count >= nodes)
            {
                break;
            }

            foreach (Species neighbour in graph.NeighboursOf(next))
            {
                if (seen.Add(neighbour))
                {
                    queue.Enqueue(neighbour);
                }
            }
        }

        return diagram;
    }
}
