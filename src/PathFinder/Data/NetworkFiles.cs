using System.Text.RegularExpressions;

namespace PathFinder.Data;

/// <summary>The file names a network folder may hold besides measurement files.</summary>
public static class NetworkFiles
{
    /// <summary>Species declarations: <c>key,formula,state,name</c>.</summary>
    public const string SpeciesFileName = "species.csv";

    /// <summary>Heat-capacity polynomials of species.</summary>
    public const string HeatCapacityFileName = "heat-capacity.csv";

    /// <summary>Curation decisions (exclusions with reasons) in a folder network.</summary>
    public const string CurationFileName = "curation.csv";

    /// <summary>Declared systematic uncertainties per source: <c>source,systematic,unit[,note]</c>.</summary>
    public const string SourcesFileName = "sources.csv";

    /// <summary>A folder network's list of entries not to read: one glob per line (<c>*</c>, <c>?</c>), <c>#</c> starts a comment.</summary>
    public const string IgnoreFileName = ".pathfinderignore";

    /// <summary>The measurement files of a network: the file itself, or every other <c>*.csv</c> in the folder, sorted.</summary>
    public static IReadOnlyList<string> MeasurementFiles(string path) => MeasurementFiles(path, out _);

    /// <summary>The measurement files of a network, and every other entry of a folder network with the reason it is not read.</summary>
    /// <remarks>
    /// In a folder, measurement files are the regular files whose name ends in <c>.csv</c> in any letter case
    /// (<c>data.CSV</c> too), except the auxiliary tables. Named as skipped: subfolders (a network is not read
    /// recursively), other files, editors' lock files (<c>~$x.csv</c>, <c>.~lock.x.csv#</c>, <c>.#x.csv</c>), FIFOs,
    /// devices and sockets (reading them would block or never end), an auxiliary table in the wrong letter case,
    /// and a single-file network's companions (<c>lab.species.csv</c>), which a folder network does not read.
    /// The curation file is read by the commands and is not listed. Entries whose names match a line of
    /// <see cref="IgnoreFileName"/> (globs with <c>*</c> and <c>?</c>, any letter case, like <c>*.csv</c>) are named
    /// as skipped with the line that matched; the ignore file itself is read, not listed.
    /// </remarks>
    /// <param name="path">A file or a folder.</param>
    /// <param name="skipped">The entries of a folder that are not read; empty for a file.</param>
    public static IReadOnlyList<string> MeasurementFiles(string path, out IReadOnlyList<SkippedEntry> skipped)
    {
        if (File.Exists(path))
        {
            skipped = [];
            return [path];
        }

        var files = new List<string>();
        var notRead = new List<SkippedEntry>();
        IReadOnlyList<(string Pattern, int Line, Regex Glob)> ignored = ReadIgnoreList(Path.Combine(path, IgnoreFileName));
        foreach (string entry in Directory.EnumerateFileSystemEntries(path, "*", SearchOption.TopDirectoryOnly).Order(StringComparer.Ordinal))
        {
            string name = Path.GetFileName(entry);
            (string Pattern, int Line, Regex Glob) match = ignored.FirstOrDefault(rule => rule.Glob.IsMatch(name));
            if (name == IgnoreFileName && FileKinds.IsRegularFile(entry))
            {
                continue;
            }

            if (match.Glob is not null)
            {
                notRead.Add(new SkippedEntry(entry, $"matched by '{match.Pattern}' ({IgnoreFileName} line {match.Line})", $"remove that line from {IgnoreFileName} to have it read"));
            }
            else if (Directory.Exists(entry))
            {
                notRead.Add(new SkippedEntry(entry, "a subfolder: a network folder is not read recursively", "move its CSV files into the network folder, or give the subfolder as a network of its own"));
            }
            else if (IsLockFile(name))
            {
                notRead.Add(new SkippedEntry(entry, "an editor's lock file (the data are open in a spreadsheet or editor)"));
            }
            else if (!name.EndsWith(".csv", StringComparison.OrdinalIgnoreCase))
            {
                notRead.Add(new SkippedEntry(entry, "not a .csv file"));
            }
            else if (!FileKinds.IsRegularFile(entry))
            {
                notRead.Add(new SkippedEntry(entry, "not a regular file (a FIFO, a device or a socket)", "replace it with a CSV file"));
            }
            else if (AuxiliaryNames.FirstOrDefault(auxiliary => name.Equals(auxiliary, StringComparison.OrdinalIgnoreCase)) is { } auxiliaryName)
            {
                if (!name.Equals(auxiliaryName, StringComparison.Ordinal))
                {
                    notRead.Add(new SkippedEntry(entry, $"named like {auxiliaryName} in other letter case", $"rename it to {auxiliaryName} to have it read"));
                }
            }
            else if (IsAuxiliary(name))
            {
                notRead.Add(new SkippedEntry(entry, "a companion table of a single-file network; a folder network reads species.csv, heat-capacity.csv, sources.csv and curation.csv", "rename it to the folder's table name to have it read with the folder"));
            }
            else
            {
                files.Add(entry);
            }
        }

        skipped = notRead;
        return files;
    }

    /// <summary>The globs of an ignore file, with their line numbers; none when the file is absent or not a regular file.</summary>
    private static IReadOnlyList<(string Pattern, int Line, Regex Glob)> ReadIgnoreList(string file)
    {
        if (!File.Exists(file) || !FileKinds.IsRegularFile(file))
        {
            return [];
        }

        var rules = new List<(string Pattern, int Line, Regex Glob)>();
        int line = 0;
        foreach (string text in File.ReadLines(file))
        {
            line++;
            string pattern = text.Trim();
            if (pattern.Length == 0 || pattern.StartsWith('#'))
            {
                continue;
            }

            string expression = "^" + Regex.Escape(pattern).Replace(@"\*", ".*", StringComparison.Ordinal).Replace(@"\?", ".", StringComparison.Ordinal) + "$";
            rules.Add((pattern, line, new Regex(expression, RegexOptions.IgnoreCase | RegexOptions.CultureInvariant)));
        }

        return rules;
    }

    /// <summary>Whether a file name is an editor's lock file: <c>~$x.csv</c> (Office), <c>.~lock.x.csv#</c> (LibreOffice), <c>.#x.csv</c> (Emacs).</summary>
    public static bool IsLockFile(string fileName) =>
        fileName.StartsWith("~$", StringComparison.Ordinal)
        || fileName.StartsWith(".~lock.", StringComparison.Ordinal)
        || fileName.StartsWith(".#", StringComparison.Ordinal);

    private static readonly string[] AuxiliaryNames = [SpeciesFileName, HeatCapacityFileName, CurationFileName, SourcesFileName];

    /// <summary>A file beside the network: inside a folder network, or next to a single-file network with its stem as prefix.</summary>
    /// <remarks>For <c>lab.csv</c> the curation file is <c>lab.curation.csv</c>; for a folder it is <c>folder/curation.csv</c>.</remarks>
    public static string Companion(string networkPath, string fileName)
    {
        if (Directory.Exists(networkPath))
        {
            return Path.Combine(networkPath, fileName);
        }

        string folder = Path.GetDirectoryName(Path.GetFullPath(networkPath)) ?? ".";
        string stem = Path.GetFileNameWithoutExtension(networkPath);
        return Path.Combine(folder, $"{stem}.{fileName}");
    }

    /// <summary>Whether a file name is one of the auxiliary tables rather than measurements.</summary>
    public static bool IsAuxiliary(string fileName) =>
        fileName.Equals(SpeciesFileName, StringComparison.OrdinalIgnoreCase)
        || fileName.Equals(HeatCapacityFileName, StringComparison.OrdinalIgnoreCase)
        || fileName.Equals(CurationFileName, StringComparison.OrdinalIgnoreCase)
        || fileName.Equals(SourcesFileName, StringComparison.OrdinalIgnoreCase)
        || fileName.EndsWith("." + SpeciesFileName, StringComparison.OrdinalIgnoreCase)
        || fileName.EndsWith("." + HeatCapacityFileName, StringComparison.OrdinalIgnoreCase)
        || fileName.EndsWith("." + CurationFileName, StringComparison.OrdinalIgnoreCase)
        || fileName.EndsWith("." + SourcesFileName, StringComparison.OrdinalIgnoreCase);
}
