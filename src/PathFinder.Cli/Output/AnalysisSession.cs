using PathFinder.Analysis;
using PathFinder.Chemistry;
using PathFinder.Curation;
using PathFinder.Data;
using PathFinder.Diagnostics;
using PathFinder.Thermodynamics;

namespace PathFinder.Cli.Output;

/// <summary>The network as every analysis command sees it: read, validated, with curation decisions applied.</summary>
/// <param name="Read">The read result.</param>
/// <param name="Network">The network after curation (excluded measurements removed).</param>
/// <param name="Excluded">Measurements excluded by the curation file, with the decisions.</param>
public sealed record AnalysisSession(NetworkReadResult Read, ReactionNetwork Network, IReadOnlyList<ExcludedMeasurement> Excluded)
{
    /// <summary>Loads the network and its curation file; null (with the exit code) when the command must stop.</summary>
    public static AnalysisSession? Open(string path, CommandContext context, bool skipInvalid, out int exitCode)
    {
        ArgumentNullException.ThrowIfNull(context);
        NetworkReadResult? read = NetworkLoading.Load(path, context, skipInvalid, out exitCode);
        if (read is null)
        {
            return null;
        }

        CurationLoading curation = CurationLoading.Of(path, read.Network);
        foreach (Diagnostic diagnostic in curation.Diagnostics)
        {
            context.Error.WriteLine(diagnostic.ToString());
        }

        if (curation.File.HasErrors)
        {
            context.Error.WriteLine("the curation file cannot be read: nothing was computed. Fix it, or move it away to analyse without curation.");
            exitCode = ExitCodes.InvalidInput;
            return null;
        }

        CurationResult applied = curation.Applied;
        if (applied.Excluded.Count > 0)
        {
            context.Error.WriteLine($"note: {applied.Excluded.Count} measurement(s) excluded by {curation.Path}: {string.Join(", ", applied.Excluded.Select(item => item.Measurement.Id))}");
        }

        return new AnalysisSession(read, applied.Network, applied.Excluded);
    }

    /// <summary>The route-search model of one family.</summary>
    public PropertyModel Model(PropertyFamily family) => PropertyModel.Build(Network, family, Read.HeatCapacities);

    /// <summary>Declared systematic uncertainties of sources (<c>sources.csv</c>).</summary>
    public IReadOnlyList<SourceSystematic> Systematics => Read.SourceSystematics;

    /// <summary>The joint model and solution of the network (solved on first use).</summary>
    /// <param name="adjust">Whether the suspect procedure runs before results are reported.</param>
    /// <param name="options">Its settings.</param>
    public NetworkSolutions Solutions(bool adjust, ConsistencyOptions? options = null) => new(Network, HeatCapacities, adjust, options, Systematics);

    /// <summary>Heat capacities by species.</summary>
    public IReadOnlyDictionary<Species, IHeatCapacity> HeatCapacities => Read.HeatCapacities;
}
