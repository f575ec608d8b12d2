using PathFinder.Analysis;
using PathFinder.Chemistry;
using PathFinder.Data;

namespace PathFinder.Cli.Output;

/// <summary>The network as every analysis command sees it: read, validated, with curation decisions applied.</summary>
/// <param name="Read">The read result.</param>
/// <param name="Network">The network after curation (excluded measurements removed).</param>
/// <param name="Excluded">Measurements excluded by curation, with reasons.</param>
public sealed record AnalysisSession(NetworkReadResult Read, ReactionNetwork Network, IReadOnlyList<string> Excluded)
{
    /// <summary>Loads the network; null (with the exit code) when the command must stop.</summary>
    public static AnalysisSession? Open(string path, CommandContext context, bool skipInvalid, out int exitCode)
    {
        NetworkReadResult? read = NetworkLoading.Load(path, context, skipInvalid, out exitCode);
        if (read is null)
        {
            return null;
        }

        return new AnalysisSession(read, read.Network, []);
    }

    /// <summary>The model of one family.</summary>
    public PropertyModel Model(PropertyFamily family) => PropertyModel.Build(Network, family, Read.HeatCapacities);

    /// <summary>Heat capacities by species.</summary>
    public IReadOnlyDictionary<Species, Thermodynamics.IHeatCapacity> HeatCapacities => Read.HeatCapacities;
}
