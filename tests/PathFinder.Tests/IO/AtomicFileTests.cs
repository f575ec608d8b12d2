using System.Runtime.Versioning;
using PathFinder.IO;
using PathFinder.Tests.TestSupport;

namespace PathFinder.Tests.IO;

[UnsupportedOSPlatform("windows")]
public sealed class AtomicFileTests : IDisposable
{
    private readonly TempFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    [UnixFact]
    public void Write_ThroughAChainOfSymbolicLinks_ReplacesTheFinalTargetAndKeepsTheLinks()
    {
        // Given out.svg -> middle.svg -> real/target.svg (relative links)
        Directory.CreateDirectory(Path.Combine(_folder.Path, "real"));
        string target = _folder.Write(Path.Combine("real", "target.svg"), "old");
        string middle = Path.Combine(_folder.Path, "middle.svg");
        string link = Path.Combine(_folder.Path, "out.svg");
        File.CreateSymbolicLink(middle, Path.Combine("real", "target.svg"));
        File.CreateSymbolicLink(link, "middle.svg");

        // When writing to the first link
        AtomicFile.WriteAllText(link, "new");

        // Then both links are still links and the final file holds the new text; no temporary file is left anywhere
        Assert.Equal("middle.svg", new FileInfo(link).LinkTarget);
        Assert.Equal(Path.Combine("real", "target.svg"), new FileInfo(middle).LinkTarget);
        Assert.Equal("new", File.ReadAllText(target));
        Assert.Empty(Directory.EnumerateFiles(_folder.Path, "*.tmp", SearchOption.AllDirectories));
    }

    [UnixFact]
    public void Write_ThroughADanglingLink_CreatesItsTarget()
    {
        // Given a link to a file that does not exist yet
        string link = Path.Combine(_folder.Path, "out.csv");
        File.CreateSymbolicLink(link, "later.csv");

        // When writing to it
        AtomicFile.WriteAllText(link, "x");

        // Then the target is created and the link kept
        Assert.Equal("x", File.ReadAllText(Path.Combine(_folder.Path, "later.csv")));
        Assert.Equal("later.csv", new FileInfo(link).LinkTarget);
    }

    [UnixFact]
    public void Write_ToAFifo_IsRefusedAndLeavesTheFifo()
    {
        // Given a FIFO, and a link to it
        string fifo = SpecialFiles.Fifo(Path.Combine(_folder.Path, "pipe.svg"));
        string link = Path.Combine(_folder.Path, "link.svg");
        File.CreateSymbolicLink(link, "pipe.svg");

        // When writing to either
        OutputFileException direct = Assert.Throws<OutputFileException>(() => AtomicFile.WriteAllText(fifo, "x"));
        OutputFileException linked = Assert.Throws<OutputFileException>(() => AtomicFile.WriteAllText(link, "x"));

        // Then both are refused as not regular files, naming what is there, and the FIFO is still a FIFO
        Assert.Equal(OutputRefusal.NotARegularFile, direct.Refusal);
        Assert.Contains("FIFO", direct.Message, StringComparison.Ordinal);
        Assert.Contains("a link to", linked.Message, StringComparison.Ordinal);
        Assert.Equal(FileEntryKind.Fifo, AtomicFile.Inspect(fifo).Kind);
        Assert.Empty(Directory.EnumerateFiles(_folder.Path, "*.tmp"));
    }

    [UnixFact]
    public void Check_DevNullAndAFolder_AreRefused()
    {
        // Given a character device and a folder
        // When checked as outputs
        OutputFileException device = Assert.Throws<OutputFileException>(() => AtomicFile.Check("/dev/null"));
        OutputFileException folder = Assert.Throws<OutputFileException>(() => AtomicFile.Check(_folder.Path));

        // Then both are refused and /dev/null is still a device
        Assert.Contains("character device", device.Message, StringComparison.Ordinal);
        Assert.Contains("a folder", folder.Message, StringComparison.Ordinal);
        Assert.Equal(FileEntryKind.CharacterDevice, AtomicFile.Inspect("/dev/null").Kind);
    }

    [Theory]
    [InlineData("")]
    [InlineData("  ")]
    public void Check_AnEmptyPath_IsRefused(string path)
    {
        OutputFileException refused = Assert.Throws<OutputFileException>(() => AtomicFile.Check(path));

        Assert.Equal(OutputRefusal.EmptyPath, refused.Refusal);
    }

    [UnixFact]
    public void Write_KeepsTheModeOfTheFileItReplaces()
    {
        // Given a file with mode 640
        string file = _folder.Write("out.csv", "old");
        UnixFileMode mode = UnixFileMode.UserRead | UnixFileMode.UserWrite | UnixFileMode.GroupRead;
        File.SetUnixFileMode(file, mode);

        // When it is replaced
        AtomicFile.WriteAllText(file, "new");

        // Then the new file has the same mode
        Assert.Equal("new", File.ReadAllText(file));
        Assert.Equal(mode, File.GetUnixFileMode(file));
    }

    [UnixFact]
    public void Write_AReadOnlyFile_IsRefusedUnlessAllowed_AndThenKeepsItsMode()
    {
        // Given a file with mode 444
        string file = _folder.Write("out.svg", "old");
        UnixFileMode readOnly = UnixFileMode.UserRead | UnixFileMode.GroupRead | UnixFileMode.OtherRead;
        File.SetUnixFileMode(file, readOnly);

        // When written without, then with permission to replace read-only files
        OutputFileException refused = Assert.Throws<OutputFileException>(() => AtomicFile.WriteAllText(file, "new"));
        string before = File.ReadAllText(file);
        AtomicFile.WriteAllText(file, "new", replaceReadOnly: true);

        // Then the first is refused without a change, the second replaces the content and keeps mode 444
        Assert.Equal(OutputRefusal.ReadOnly, refused.Refusal);
        Assert.Contains("read-only", refused.Message, StringComparison.Ordinal);
        Assert.Equal("old", before);
        Assert.Equal("new", File.ReadAllText(file));
        Assert.Equal(readOnly, File.GetUnixFileMode(file));
    }

    [UnixFact(root: true)]
    public void Write_AsRoot_KeepsTheOwnerOfTheFileItReplaces()
    {
        // Given a file owned by another user and group (65534, usually nobody/nogroup)
        string file = _folder.Write("out.csv", "old");
        Assert.Equal(0, Chown(file, 65534, 65534));

        // When root replaces it
        AtomicFile.WriteAllText(file, "new");

        // Then the new file has the same owner and group
        OutputTarget after = AtomicFile.Inspect(file);
        Assert.Equal("new", File.ReadAllText(file));
        Assert.Equal(65534u, after.Owner);
        Assert.Equal(65534u, after.Group);
    }

    [UnixFact(root: false)]
    public void Write_IntoAReadOnlyFolder_NamesTheOutputNotTheTemporaryFile()
    {
        // Given a folder without write permission
        string folder = Path.Combine(_folder.Path, "locked");
        Directory.CreateDirectory(folder);
        File.SetUnixFileMode(folder, UnixFileMode.UserRead | UnixFileMode.UserExecute);
        string output = Path.Combine(folder, "out.svg");

        try
        {
            // When writing into it
            UnauthorizedAccessException refused = Assert.Throws<UnauthorizedAccessException>(() => AtomicFile.WriteAllText(output, "x"));

            // Then the message names the output and never the hidden temporary file
            Assert.Contains(output, refused.Message, StringComparison.Ordinal);
            Assert.DoesNotContain(".tmp", refused.Message, StringComparison.Ordinal);
        }
        finally
        {
            File.SetUnixFileMode(folder, UnixFileMode.UserRead | UnixFileMode.UserWrite | UnixFileMode.UserExecute);
        }
    }

    [Fact]
    public void Rethrow_NamesTheOutputInsteadOfTheTemporaryFile()
    {
        // Given failures that name the temporary file (as a read-only folder or a full disk give)
        string output = Path.Combine(_folder.Path, "out.svg");
        string temporary = Path.Combine(_folder.Path, ".out.svg.0123456789abcdef0123456789abcdef.tmp");

        // When they pass through the atomic writer's translation
        UnauthorizedAccessException denied = Assert.Throws<UnauthorizedAccessException>(() =>
            AtomicFile.Rethrow(output, temporary, () => throw new UnauthorizedAccessException($"Access to the path '{temporary}' is denied.")));
        IOException full = Assert.Throws<IOException>(() =>
            AtomicFile.Rethrow(output, temporary, () => throw new IOException($"No space left on device : '{temporary}'")));

        // Then both name the output, not the temporary file
        Assert.Contains(output, denied.Message, StringComparison.Ordinal);
        Assert.DoesNotContain(".tmp", denied.Message, StringComparison.Ordinal);
        Assert.Contains(output, full.Message, StringComparison.Ordinal);
        Assert.DoesNotContain(".tmp", full.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Write_RemovesOurOwnStaleTemporaryFiles_AndNothingElse()
    {
        // Given an old leftover of ours, a fresh one (maybe another writer at work), and old files of other patterns
        string stale = _folder.Write(".out.svg.0123456789abcdef0123456789abcdef.tmp", "left by a kill");
        string fresh = _folder.Write(".out.svg.fedcba9876543210fedcba9876543210.tmp", "in progress");
        string other = _folder.Write(".notes.tmp", "someone else's");
        string almost = _folder.Write(".out.svg.0123.tmp", "not our pattern");
        DateTime old = DateTime.UtcNow - AtomicFile.StaleAfter - TimeSpan.FromMinutes(1);
        foreach (string file in new[] { stale, other, almost })
        {
            File.SetLastWriteTimeUtc(file, old);
        }

        // When a file is written into the folder
        AtomicFile.WriteAllText(Path.Combine(_folder.Path, "diagram.svg"), "x");

        // Then only the stale one of ours is gone
        Assert.False(File.Exists(stale));
        Assert.True(File.Exists(fresh));
        Assert.True(File.Exists(other));
        Assert.True(File.Exists(almost));
    }

    [Fact]
    public void RemoveStaleTemporaries_RemovesAStaleStagingFolderOfOurs()
    {
        // Given a staging folder a killed 'generate' left, old enough
        string stage = Path.Combine(_folder.Path, ".net.0123456789abcdef0123456789abcdef.tmp");
        Directory.CreateDirectory(stage);
        File.WriteAllText(Path.Combine(stage, "measurements.csv"), "partial");
        Directory.SetLastWriteTimeUtc(stage, DateTime.UtcNow - AtomicFile.StaleAfter - TimeSpan.FromMinutes(1));

        // When the folder is cleaned
        int removed = AtomicFile.RemoveStaleTemporaries(_folder.Path);

        // Then it is gone
        Assert.Equal(1, removed);
        Assert.False(Directory.Exists(stage));
    }

    [Fact]
    public void Write_WhenTheWriterFails_LeavesTheTargetAndNoTemporaryFile()
    {
        // Given an existing file
        string file = _folder.Write("out.csv", "old");

        // When the content writer throws halfway
        Assert.Throws<InvalidOperationException>(() => AtomicFile.Write(file, stream =>
        {
            stream.WriteByte((byte)'n');
            throw new InvalidOperationException("disk on fire");
        }));

        // Then the old content stays and no temporary file is left
        Assert.Equal("old", File.ReadAllText(file));
        Assert.Single(Directory.EnumerateFileSystemEntries(_folder.Path));
    }

    [System.Runtime.InteropServices.DllImport("libc", EntryPoint = "chown", ExactSpelling = true)]
    private static extern int Chown([System.Runtime.InteropServices.MarshalAs(System.Runtime.InteropServices.UnmanagedType.LPUTF8Str)] string path, uint owner, uint group);
}
