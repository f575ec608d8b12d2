namespace PathFinder.Cli.Tests.TestSupport;

/// <summary>Copies of the demo networks in a temp folder, so tests may add files (curation, outputs) beside them.</summary>
public static class DemoCopy
{
    /// <summary>Copies <c>networks-demo/combustion-lab</c> into <paramref name="folder"/> and returns the copy's path.</summary>
    public static string CombustionLab(TempFolder folder)
    {
        ArgumentNullException.ThrowIfNull(folder);
        string source = RepoPaths.Demo("combustion-lab");
        string target = Path.Combine(folder.Path, "combustion-lab");
        Directory.CreateDirectory(target);
        foreach (string file in Directory.EnumerateFiles(source))
        {
            File.Copy(file, Path.Combine(target, Path.GetFileName(file)));
        }

        return target;
    }
}
