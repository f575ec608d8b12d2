using System.Runtime.Versioning;
using PathFinder.Cli.Tests.TestSupport;

namespace PathFinder.Cli.Tests.Output;

/// <summary>Output files of <c>draw -o</c> and <c>solve --covariance</c>: what is refused before any work, and what is kept.</summary>
[UnsupportedOSPlatform("windows")]
public sealed class OutputPathsTests : IDisposable
{
    private static readonly string Demo = RepoPaths.Demo("combustion-lab");
    private readonly TempFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    [UnixFact]
    public void Draw_ToAFifo_ExitsTwoAndLeavesTheFifo()
    {
        // Given a FIFO where the diagram should go
        string fifo = SpecialFiles.Fifo(Path.Combine(_folder.Path, "out.svg"));

        // When drawing to it
        CliRun run = CliRun.Of("draw", Demo, "--species", "CO(g)", "-o", fifo);

        // Then exit 2 with a message naming the FIFO, and it is still a FIFO
        Assert.Equal(ExitCodes.InvalidInput, run.ExitCode);
        Assert.Contains("--output", run.Error, StringComparison.Ordinal);
        Assert.Contains("FIFO", run.Error, StringComparison.Ordinal);
        Assert.Equal(PathFinder.IO.FileEntryKind.Fifo, PathFinder.IO.AtomicFile.Inspect(fifo).Kind);
    }

    [UnixFact]
    public void Draw_ToDevNull_ExitsTwo()
    {
        // When drawing to a device (as root, a rename would have replaced /dev/null with a regular file)
        CliRun run = CliRun.Of("draw", Demo, "--species", "CO(g)", "-o", "/dev/null");

        // Then it is refused and /dev/null is still a device
        Assert.Equal(ExitCodes.InvalidInput, run.ExitCode);
        Assert.Contains("character device", run.Error, StringComparison.Ordinal);
        Assert.Equal(PathFinder.IO.FileEntryKind.CharacterDevice, PathFinder.IO.AtomicFile.Inspect("/dev/null").Kind);
    }

    [UnixFact]
    public void Draw_ToASymbolicLink_WritesItsTargetAndKeepsTheLink()
    {
        // Given a link to an existing file
        string target = _folder.Write("real.svg", "old");
        string link = Path.Combine(_folder.Path, "link.svg");
        File.CreateSymbolicLink(link, "real.svg");

        // When drawing to the link
        CliRun run = CliRun.Of("draw", Demo, "--species", "CO(g)", "-o", link);

        // Then the target holds the SVG and the link is still a link
        Assert.Equal(ExitCodes.Success, run.ExitCode);
        Assert.StartsWith("<?xml", File.ReadAllText(target), StringComparison.Ordinal);
        Assert.Equal("real.svg", new FileInfo(link).LinkTarget);
    }

    [UnixFact]
    public void SolveCovariance_ToAReadOnlyFile_ExitsTwoUnlessForced_AndKeepsTheMode()
    {
        // Given a read-only file (mode 444)
        string file = _folder.Write("cov.csv", "old");
        UnixFileMode readOnly = UnixFileMode.UserRead | UnixFileMode.GroupRead | UnixFileMode.OtherRead;
        File.SetUnixFileMode(file, readOnly);

        // When solving with --covariance to it, without and then with --force
        CliRun refused = CliRun.Of("solve", Demo, "--covariance", file);
        string before = File.ReadAllText(file);
        CliRun forced = CliRun.Of("solve", Demo, "--covariance", file, "--force");

        // Then the first exits 2 before any work, says how to proceed and leaves the file; the second writes it, mode kept
        Assert.Equal(ExitCodes.InvalidInput, refused.ExitCode);
        Assert.Contains("read-only", refused.Error, StringComparison.Ordinal);
        Assert.Contains("--force", refused.Error, StringComparison.Ordinal);
        Assert.Equal("", refused.Out);
        Assert.Equal("old", before);
        Assert.Equal(ExitCodes.Success, forced.ExitCode);
        Assert.StartsWith("row,column,covariance", File.ReadAllText(file), StringComparison.Ordinal);
        Assert.Equal(readOnly, File.GetUnixFileMode(file));
    }

    [Theory]
    [InlineData("draw")]
    [InlineData("solve")]
    public void EmptyOutputPath_ExitsTwo(string command)
    {
        // When the output option is given an empty path
        CliRun run = command == "draw"
            ? CliRun.Of("draw", Demo, "--species", "CO(g)", "-o", "")
            : CliRun.Of("solve", Demo, "--covariance", "");

        // Then it is refused with a message saying so
        Assert.Equal(ExitCodes.InvalidInput, run.ExitCode);
        Assert.Contains("is empty", run.Error, StringComparison.Ordinal);
    }
}
