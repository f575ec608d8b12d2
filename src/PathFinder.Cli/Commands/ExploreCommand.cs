using System.CommandLine;
using PathFinder.Tui;

namespace PathFinder.Cli.Commands;

/// <summary><c>pathfinder explore &lt;network&gt;</c>: the interactive terminal explorer (measurements, routes, consistency, curation).</summary>
public sealed class ExploreCommand
{
    private readonly Argument<string> _network = CommonOptions.Network();

    /// <summary>Builds the command bound to <paramref name="context"/>.</summary>
    public Command Build(CommandContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        var command = new Command("explore", "Open the network in an interactive terminal explorer: tables, routes to a target, consistency, and curation saved beside the data. Needs a terminal (F1 lists the keys).")
        {
            _network,
        };
        command.SetAction(parse => ExplorerApp.Run(parse.GetValue(_network)!, PathFinder.Tui.Analysis.SolvedAnalysis.Analyzer, context.Error));
        return command;
    }
}
