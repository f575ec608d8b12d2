using System.CommandLine;
using PathFinder.Analysis;
using PathFinder.Chemistry;
using PathFinder.Cli.Output;
using PathFinder.Diagrams;
using PathFinder.Figures;
using PathFinder.Graph;
using PathFinder.Routes;

namespace PathFinder.Cli.Commands;

/// <summary><c>pathfinder draw &lt;network&gt; --kind … -o file.svg</c>: SVG diagrams of routes, cycles and neighbourhoods for reports.</summary>
public sealed class DrawCommand
{
    private readonly Argument<string> _network = CommonOptions.Network();
    private readonly Option<string> _kind = new("--kind", "-k") { Description = "network (species and measurements), levels (enthalpy ladder of a route) or closure (ladder of a cycle).", DefaultValueFactory = _ => "network" };
    private readonly Option<string?> _target = new("--target", "-t") { Description = "Focus on the routes to this target (equation or species)." };
    private readonly Option<int> _route = new("--route", "-r") { Description = "Which route to draw, 1 = best (default 1; 0 with --kind network draws all listed routes).", DefaultValueFactory = _ => 1 };
    private readonly Option<int?> _cycle = new("--cycle", "-c") { Description = "Focus on this cycle from 'pathfinder check' (1 = worst), 1 to 100000." };
    private readonly Option<string?> _species = new("--species", "-s") { Description = "Focus on the neighbourhood of this species." };
    private readonly Option<int> _depth = new("--depth", "-d") { Description = "Neighbourhood depth, 1 to 100 measurement steps (default 1).", DefaultValueFactory = _ => 1 };
    private readonly Option<string> _property = CommonOptions.Property();
    private readonly Option<int> _maxSteps = new("--max-steps") { Description = "Longest route searched, 1 to 64 measurements (default 6).", DefaultValueFactory = _ => 6 };
    private readonly Option<int> _maxNodes = new("--max-nodes") { Description = $"Refuse network diagrams with more nodes than this, 1 to 10000 (default {NetworkDiagramOptions.DefaultMaxNodes}; larger layouts are slow and unreadable).", DefaultValueFactory = _ => NetworkDiagramOptions.DefaultMaxNodes };
    private readonly Option<string> _output = new("--output", "-o") { Description = "The SVG file to write.", Required = true };
    private readonly Option<bool> _force = new("--force") { Description = OutputPaths.ForceDescription };
    private readonly Option<bool> _skipInvalid = CommonOptions.SkipInvalid();

    /// <summary>Builds the command bound to <paramref name="context"/>.</summary>
    public Command Build(CommandContext context)
    {
        var command = new Command("draw", "Write an SVG diagram: the network around a target, a route, a cycle or a species; or the enthalpy-level ladder of a route or cycle.")
        {
            _network, _kind, _target, _route, _cycle, _species, _depth, _property, _maxSteps, _maxNodes, _output, _force, _skipInvalid,
        };
        _kind.AcceptOnlyFromAmong("network", "levels", "closure");
        command.SetAction(parse => Run(
            new DrawRequest(
                parse.GetValue(_network)!,
                parse.GetValue(_kind)!,
                parse.GetValue(_target),
                parse.GetValue(_route),
                parse.GetValue(_cycle),
                parse.GetValue(_species),
                parse.GetValue(_depth),
                parse.GetValue(_property)!,
                parse.GetValue(_maxSteps),
                parse.GetValue(_maxNodes),
                parse.GetValue(_output)!,
                parse.GetValue(_skipInvalid))
            {
                Force = parse.GetValue(_force),
            },
            context));
        return command;
    }

    /// <summary>Draws; exit 0 when written, 1 when the focus has nothing to draw (no route, no such cycle), 2 for bad input.</summary>
    public static int Run(DrawRequest request, CommandContext context)
    {
        ArgumentNullException.ThrowIfNull(request);
        ArgumentNullException.ThrowIfNull(context);
        int foci = (request.Target is null ? 0 : 1) + (request.Cycle is null ? 0 : 1) + (request.Species is null ? 0 : 1);
        if (foci != 1)
        {
            throw new UserInputException("give exactly one focus: --target, --cycle or --species");
        }

        if ((request.Kind == "levels" && request.Target is null) || (request.Kind == "closure" && request.Cycle is null))
        {
            throw new UserInputException(request.Kind == "levels" ? "--kind levels draws a route: give --target (and --route)" : "--kind closure draws a cycle: give --cycle");
        }

        OptionParsing.InRange(request.Depth, 1, OptionRanges.MaxDepth, "--depth", "measurement steps");
        OptionParsing.InRange(request.MaxNodes, 1, OptionRanges.MaxNodes, "--max-nodes", "larger layouts are slow and unreadable");
        OptionParsing.InRange(request.MaxSteps, 1, OptionRanges.MaxSteps, "--max-steps", "measurements per route");
        OptionParsing.InRange(request.Route, 0, OptionRanges.MaxListed, "--route", "1 = best; 0 draws all listed routes");
        if (request.Cycle is { } cycleNumber)
        {
            OptionParsing.InRange(cycleNumber, 1, OptionRanges.MaxListed, "--cycle", "1 = worst, as 'pathfinder check' lists them");
        }
        OutputPaths.Check(request.Output, "--output", request.Force);

        AnalysisSession? session = AnalysisSession.Open(request.Network, context, request.SkipInvalid, out int exitCode);
        if (session is null)
        {
            return exitCode;
        }

        PropertyFamily family = PropertyFamilies.FamilyOf(OptionParsing.Property(request.Property));
        PropertyModel model = session.Model(family);

        // Cycles are numbered as 'check' lists them, which needs the whole consistency analysis; other foci need only the suspects.
        ModelConsistency? consistency = request.Cycle is null ? null : ConsistencyCheck.Run(session.Network, session.HeatCapacities, systematics: session.Systematics).Analysis;
        IEnumerable<string> suspects = consistency is not null
            ? consistency.Suspects.Select(suspect => suspect.Measurement.Id)
            : session.Solutions(adjust: true).Report(family)?.SuspectIds ?? [];
        var marks = new FigureMarks(suspects.ToHashSet(StringComparer.Ordinal), new HashSet<string>(StringComparer.Ordinal));
        SvgDiagram? diagram;
        if (request.Target is not null)
        {
            ChemicalEquation target = OptionParsing.Target(request.Target, session.Network);
            RouteReport report = RouteAnalysis.Find(model, target, new RouteSearchOptions { MaxSteps = request.MaxSteps, MaxRoutes = Math.Max(10, request.Route) });
            if (request.Route == 0 && request.Kind == "network")
            {
                if (report.Routes.Count == 0)
                {
                    return NothingToDraw(context, "no route to the target");
                }

                diagram = RenderNetwork(FigureBuilder.TargetNetwork(report, model.Unit.Symbol, marks), request.MaxNodes, context);
            }
            else
            {
                OptionParsing.Positive(request.Route, "--route");
                if (request.Route > report.Routes.Count)
                {
                    return NothingToDraw(context, report.Routes.Count == 0 ? "no route to the target" : $"there are only {report.Routes.Count} routes");
                }

                ExplainedRoute route = report.Routes[request.Route - 1];
                diagram = request.Kind == "levels"
                    ? LevelDiagramRenderer.RenderRoute(FigureBuilder.RouteLevels(report, route)).Diagram
                    : RenderNetwork(FigureBuilder.RouteNetwork(report, route, model.Unit.Symbol, marks), request.MaxNodes, context);
            }
        }
        else if (request.Cycle is { } number && consistency is not null)
        {
            if (number < 1 || number > consistency.Cycles.Count)
            {
                return NothingToDraw(context, consistency.Cycles.Count == 0 ? "the network has no cycles" : $"cycles are numbered 1 to {consistency.Cycles.Count} (worst first, as 'pathfinder check' lists them)");
            }

            CycleCheck cycle = consistency.Cycles[number - 1];
            diagram = request.Kind == "closure"
                ? LevelDiagramRenderer.RenderCycle(FigureBuilder.CycleLevels(cycle)).Diagram
                : RenderNetwork(FigureBuilder.CycleNetwork(cycle, marks), request.MaxNodes, context);
        }
        else
        {
            if (request.Kind != "network")
            {
                throw new UserInputException("--species draws a neighbourhood: use --kind network");
            }

            Species species = session.Network.FindSpecies(request.Species!) ?? throw new UserInputException($"species '{request.Species}' is not in the network");
            NetworkDiagram neighbourhood = FigureBuilder.Neighbourhood(NetworkGraph.Build(session.Network), [species], request.Depth, family, marks);
            diagram = RenderNetwork(neighbourhood, request.MaxNodes, context);
        }

        if (diagram is null)
        {
            return ExitCodes.InvalidInput;
        }

        diagram.Save(request.Output, request.Force);
        context.Out.WriteLine($"wrote {request.Output} ({diagram.Width:0} × {diagram.Height:0})");
        return ExitCodes.Success;
    }

    private static SvgDiagram? RenderNetwork(NetworkDiagram diagram, int maxNodes, CommandContext context)
    {
        NetworkDiagramResult result = NetworkDiagramRenderer.Render(diagram, new NetworkDiagramOptions { MaxNodes = maxNodes });
        if (!result.IsRendered)
        {
            context.Error.WriteLine($"error: {result.RefusalMessage}");
            return null;
        }

        return result.Diagram;
    }

    private static int NothingToDraw(CommandContext context, string why)
    {
        context.Error.WriteLine($"nothing to draw: {why}; no file was written");
        return ExitCodes.AnalysisProblem;
    }
}

/// <summary>What <see cref="DrawCommand"/> was asked to draw.</summary>
/// <param name="Network">The network path.</param>
/// <param name="Kind">network, levels or closure.</param>
/// <param name="Target">The target focus, if any.</param>
/// <param name="Route">The route number (1 = best; 0 = all, for network diagrams).</param>
/// <param name="Cycle">The cycle focus, if any.</param>
/// <param name="Species">The species focus, if any.</param>
/// <param name="Depth">Neighbourhood depth.</param>
/// <param name="Property">Property code.</param>
/// <param name="MaxSteps">Route search bound.</param>
/// <param name="MaxNodes">Node limit of network diagrams.</param>
/// <param name="Output">The SVG path.</param>
/// <param name="SkipInvalid">Whether to skip invalid rows.</param>
public sealed record DrawRequest(string Network, string Kind, string? Target, int Route, int? Cycle, string? Species, int Depth, string Property, int MaxSteps, int MaxNodes, string Output, bool SkipInvalid)
{
    /// <summary>Whether a read-only output file may be replaced (<c>--force</c>).</summary>
    public bool Force { get; init; }
}
