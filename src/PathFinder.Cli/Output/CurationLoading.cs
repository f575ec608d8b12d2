using PathFinder.Curation;
using PathFinder.Diagnostics;

namespace PathFinder.Cli.Output;

/// <summary>The curation file of a network as every command reads it: the decisions, what they do to the data, and every problem, located.</summary>
/// <param name="Path">The curation file (it may not exist).</param>
/// <param name="File">What reading it gave.</param>
/// <param name="Applied">The decisions applied to the network.</param>
/// <param name="Diagnostics">The file's problems plus a warning for each decision naming an id the data lack.</param>
public sealed record CurationLoading(string Path, CurationReadResult File, CurationResult Applied, IReadOnlyList<Diagnostic> Diagnostics)
{
    /// <summary>Reads the curation file beside <paramref name="networkPath"/> and applies it to <paramref name="network"/>.</summary>
    public static CurationLoading Of(string networkPath, ReactionNetwork network)
    {
        ArgumentNullException.ThrowIfNull(networkPath);
        ArgumentNullException.ThrowIfNull(network);
        string path = CurationFile.PathFor(networkPath);
        CurationReadResult file = CurationFile.Read(path);
        CurationResult applied = file.Set.Apply(network);
        var diagnostics = new List<Diagnostic>(file.Diagnostics);
        foreach (string id in applied.UnknownIds)
        {
            SourceLocation at = file.Set.CurrentDecision(id)?.Location ?? new SourceLocation(path);
            diagnostics.Add(Diagnostic.Warning("unknown-id", at, $"the decision names measurement '{id}', which is not in the data", "correct the id, or leave the row as a record of data since removed"));
        }

        return new CurationLoading(path, file, applied, diagnostics);
    }

    /// <summary>Whether the file exists.</summary>
    public bool Exists => System.IO.File.Exists(Path);

    /// <summary>One line for summaries: decisions, exclusions in force, rows not applied.</summary>
    public string Summary
    {
        get
        {
            string unapplied = File.Unapplied.Count == 0 ? "" : $", {File.Unapplied.Count} row(s) not applied (kept as written)";
            return $"{File.Set.Decisions.Count} decision(s), {Applied.Excluded.Count} measurement(s) excluded now{unapplied}";
        }
    }
}
