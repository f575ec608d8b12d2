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

    /// <summary>The measurement files of a network: the file itself, or every other <c>*.csv</c> in the folder, sorted.</summary>
    public static IReadOnlyList<string> MeasurementFiles(string path)
    {
        if (File.Exists(path))
        {
            return [path];
        }

        return Directory.EnumerateFiles(path, "*.csv", SearchOption.TopDirectoryOnly)
            .Where(file => !IsAuxiliary(Path.GetFileName(file)))
            .Order(StringComparer.Ordinal)
            .ToArray();
    }

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
