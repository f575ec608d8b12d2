using PathFinder.IO;

namespace PathFinder.Curation;

/// <summary>The recovery file of an explorer session: decisions made but not yet saved, written beside the curation file on every change.</summary>
/// <remarks>
/// <para>A session that ends without saving (the terminal closed, SIGHUP, a kill, a power cut) leaves this file behind;
/// the next session offers its decisions. It is written atomically after each decision, so no signal handler is needed
/// and nothing depends on the process ending cleanly. It is deleted when the decisions are saved or discarded.</para>
/// <para>Its format is that of the curation file (<see cref="CurationFile"/>), holding only the unsaved decisions; its name
/// starts with a dot and does not end in <c>.csv</c>, so it is never read as data.</para>
/// </remarks>
public static class CurationRecovery
{
    private const string Comment = "# Decisions of a PathFinder explorer session that were not saved; the explorer offers them on its next start.\n";

    /// <summary>The recovery file of <paramref name="curationPath"/>: <c>.curation.csv.recovery</c> in the same folder.</summary>
    public static string PathFor(string curationPath)
    {
        ArgumentNullException.ThrowIfNull(curationPath);
        string folder = Path.GetDirectoryName(Path.GetFullPath(curationPath)) ?? ".";
        return Path.Combine(folder, "." + Path.GetFileName(curationPath) + ".recovery");
    }

    /// <summary>Writes <paramref name="unsaved"/> to <paramref name="path"/> atomically; with no decisions, removes the file.</summary>
    public static void Write(string path, IReadOnlyList<CurationDecision> unsaved)
    {
        ArgumentNullException.ThrowIfNull(path);
        ArgumentNullException.ThrowIfNull(unsaved);
        if (unsaved.Count == 0)
        {
            Delete(path);
            return;
        }

        AtomicFile.WriteAllText(path, Comment + CurationFile.Format(new CurationSet(unsaved)));
    }

    /// <summary>The decisions in the recovery file that <paramref name="saved"/> does not already hold (a save may have finished before the file was removed).</summary>
    /// <returns>The decisions to offer, oldest first (empty when there is no file), and any problem reading it.</returns>
    public static CurationReadResult Read(string path, CurationSet saved)
    {
        ArgumentNullException.ThrowIfNull(path);
        ArgumentNullException.ThrowIfNull(saved);
        CurationReadResult read = CurationFile.Read(path);
        CurationDecision[] pending = read.Set.Decisions
            .Where(decision => !saved.Decisions.Any(decision.SaysTheSameAs))
            .ToArray();
        return read with { Set = new CurationSet(pending) };
    }

    /// <summary>Removes the recovery file, if there is one.</summary>
    public static void Delete(string path)
    {
        ArgumentNullException.ThrowIfNull(path);
        if (File.Exists(path))
        {
            File.Delete(path);
        }
    }
}
