namespace PathFinder.Tests.TestSupport;

/// <summary>Finds files of the repository from the test's base directory.</summary>
public static class RepoPaths
{
    /// <summary>The folder that holds PathFinder.sln, found by walking up from the test binaries.</summary>
    public static string Root { get; } = FindRoot();

    /// <summary>A path inside <c>networks-demo/</c>.</summary>
    public static string Demo(string relative) => Path.Combine(Root, "networks-demo", relative);

    private static string FindRoot()
    {
        for (DirectoryInfo? folder = new(AppContext.BaseDirectory); folder is not null; folder = folder.Parent)
        {
            if (File.Exists(Path.Combine(folder.FullName, "PathFinder.sln")))
            {
                return folder.FullName;
            }
        }

        throw new InvalidOperationException($"no folder above {AppContext.BaseDirectory} contains PathFinder.sln");
    }
}
