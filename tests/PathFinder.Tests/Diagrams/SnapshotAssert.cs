using System.Runtime.CompilerServices;

namespace PathFinder.Tests.Diagrams;

/// <summary>Compares text output with a committed file under <c>Snapshots/</c>; set PATHFINDER_UPDATE_SNAPSHOTS=1 to rewrite them.</summary>
internal static class SnapshotAssert
{
    public static void Matches(string actual, string fileName, [CallerFilePath] string callerPath = "")
    {
        string folder = Path.Combine(Path.GetDirectoryName(callerPath)!, "Snapshots");
        string path = Path.Combine(folder, fileName);
        string normalised = actual.Replace("\r\n", "\n", StringComparison.Ordinal);
        if (Environment.GetEnvironmentVariable("PATHFINDER_UPDATE_SNAPSHOTS") == "1")
        {
            Directory.CreateDirectory(folder);
            File.WriteAllText(path, normalised);
            return;
        }

        Assert.True(File.Exists(path), $"Snapshot {path} is missing; run the tests once with PATHFINDER_UPDATE_SNAPSHOTS=1 and review the file.");
        string expected = File.ReadAllText(path).Replace("\r\n", "\n", StringComparison.Ordinal);
        if (expected != normalised)
        {
            string received = path + ".received";
            File.WriteAllText(received, normalised);
            Assert.Fail($"Output differs from snapshot {fileName}; the new output is in {received}. If the change is intended, rerun with PATHFINDER_UPDATE_SNAPSHOTS=1.");
        }
    }
}
