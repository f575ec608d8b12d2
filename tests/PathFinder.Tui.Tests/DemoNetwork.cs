namespace PathFinder.Tui.Tests;

/// <summary>A private copy of the demo network <c>networks-demo/combustion-lab</c> in a temporary folder (so saving never touches the repository).</summary>
internal sealed class DemoNetwork : IDisposable
{
    public DemoNetwork()
    {
        string source = Path.Combine(RepositoryRoot(), "networks-demo", "combustion-lab");
        Folder = Path.Combine(Path.GetTempPath(), "pf-tui-" + Guid.NewGuid().ToString("N"), "combustion-lab");
        Directory.CreateDirectory(Folder);
        foreach (string file in Directory.GetFiles(source))
        {
            File.Copy(file, Path.Combine(Folder, Path.GetFileName(file)));
        }
    }

    public string Folder { get; }

    public string CurationPath => Path.Combine(Folder, "curation.csv");

    public void Dispose() => Directory.Delete(Path.GetDirectoryName(Folder)!, recursive: true);

    /// <summary>The folder holding PathFinder.sln, found by walking up from the test binaries.</summary>
    public static string RepositoryRoot()
    {
        for (DirectoryInfo? folder = new(AppContext.BaseDirectory); folder is not null; folder = folder.Parent)
        {
            if (File.Exists(Path.Combine(folder.FullName, "PathFinder.sln")))
            {
                return folder.FullName;
            }
        }

        throw new InvalidOperationException("PathFinder.sln not found above " + AppContext.BaseDirectory);
    }
}
