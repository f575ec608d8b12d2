using System.Text;
using System.Text.RegularExpressions;

namespace PathFinder.IO;

/// <summary>Writes files so that readers see either the old content or the complete new content, never a part.</summary>
/// <remarks>
/// <para>Writes to a hidden temporary file (<c>.name.&lt;guid&gt;.tmp</c>) in the final file's folder, flushes it to
/// disk, gives it the mode (and, as root, the owner) of the file it replaces, then renames it over that file.</para>
/// <para>A symbolic link is written through: the chain is followed and its final target replaced, so the link stays a
/// link. Anything that is not a regular file (a folder, a FIFO, a device such as <c>/dev/null</c>, a socket) is
/// refused, because a rename would silently turn it into a regular file. A read-only file (no write permission bit,
/// or none for the calling user) is refused unless the caller allows replacing it; the new file keeps the old mode.</para>
/// <para>Owner: as root the new file gets the old owner and group. Any other user cannot give a file away, so a
/// replaced file that belonged to someone else becomes the caller's (its group is kept when the caller belongs to it);
/// writing in place would keep the owner but give up atomicity, which matters more here.</para>
/// <para>Temporary files a killed process left behind (our own pattern only, older than
/// <see cref="StaleAfter"/>) are removed on the next write into the same folder.</para>
/// <para>The checks and the rename are separate steps: something else that replaces the target in between wins the
/// race. That is the price of not locking a whole folder, and is the usual compromise of atomic-rename writers.</para>
/// </remarks>
public static partial class AtomicFile
{
    /// <summary>How old a leftover temporary file must be before a later write removes it (ten minutes).</summary>
    /// <remarks>Long enough that a slow writer still at work in the same folder is never disturbed.</remarks>
    public static readonly TimeSpan StaleAfter = TimeSpan.FromMinutes(10);

    private const UnixFileMode AnyWrite = UnixFileMode.UserWrite | UnixFileMode.GroupWrite | UnixFileMode.OtherWrite;
    private static readonly UTF8Encoding Utf8NoBom = new(encoderShouldEmitUTF8Identifier: false);

    /// <summary>Writes <paramref name="content"/> as UTF-8 (no BOM) to <paramref name="path"/> atomically.</summary>
    /// <param name="path">The output file (a symbolic link is written through).</param>
    /// <param name="content">The text.</param>
    /// <param name="replaceReadOnly">Whether a read-only file may be replaced (it keeps its mode).</param>
    /// <exception cref="OutputFileException">When the path is not a regular file, is read-only, or its folder is missing.</exception>
    public static void WriteAllText(string path, string content, bool replaceReadOnly = false) =>
        Write(
            path,
            stream =>
            {
                byte[] bytes = Utf8NoBom.GetBytes(content);
                stream.Write(bytes, 0, bytes.Length);
            },
            replaceReadOnly);

    /// <summary>Writes through <paramref name="write"/> to a temporary file, then moves it onto <paramref name="path"/>.</summary>
    /// <remarks>If <paramref name="write"/> throws, the temporary file is removed and the target is untouched.</remarks>
    /// <exception cref="OutputFileException">When the path is not a regular file, is read-only, or its folder is missing.</exception>
    public static void Write(string path, Action<Stream> write, bool replaceReadOnly = false)
    {
        using PendingFile pending = Prepare(path, write, replaceReadOnly);
        pending.Commit();
    }

    /// <summary>Checks the target, writes the complete content to a temporary file beside it and returns it, not yet renamed.</summary>
    /// <exception cref="OutputFileException">When the path is not a regular file, is read-only, or its folder is missing.</exception>
    public static PendingFile Prepare(string path, Action<Stream> write, bool replaceReadOnly = false)
    {
        ArgumentNullException.ThrowIfNull(write);
        OutputTarget target = Check(path, replaceReadOnly);
        RemoveStaleTemporaries(target.Folder);
        string temporary = Path.Combine(target.Folder, $".{Path.GetFileName(target.FinalPath)}.{Guid.NewGuid():N}.tmp");
        var pending = new PendingFile(target, temporary);
        try
        {
            Rethrow(path, temporary, () =>
            {
                using (var stream = new FileStream(temporary, FileMode.CreateNew, FileAccess.Write, FileShare.None))
                {
                    write(stream);
                    stream.Flush(flushToDisk: true);
                }

                KeepModeAndOwner(target, temporary);
            });
            return pending;
        }
        catch
        {
            pending.Dispose();
            throw;
        }
    }

    /// <summary>What <paramref name="path"/> leads to now: the final target of any symbolic links, its kind, mode and owner.</summary>
    /// <exception cref="IOException">When the links loop.</exception>
    public static OutputTarget Inspect(string path)
    {
        ArgumentNullException.ThrowIfNull(path);
        string fullPath = Path.GetFullPath(path);
        var info = new FileInfo(fullPath);
        string finalPath = info.LinkTarget is null ? fullPath : info.ResolveLinkTarget(returnFinalTarget: true)?.FullName ?? fullPath;
        if (OperatingSystem.IsWindows())
        {
            FileEntryKind windowsKind = Directory.Exists(finalPath) ? FileEntryKind.Directory : File.Exists(finalPath) ? FileEntryKind.RegularFile : FileEntryKind.Missing;
            bool windowsReadOnly = windowsKind == FileEntryKind.RegularFile && File.GetAttributes(finalPath).HasFlag(FileAttributes.ReadOnly);
            return new OutputTarget(path, finalPath, windowsKind, null, null, null, windowsReadOnly);
        }

        (FileEntryKind Kind, uint Owner, uint Group)? status = UnixNative.Stat(finalPath);
        if (status is null)
        {
            // Missing, or (should the runtime's shim ever be absent) a kind that .NET alone can tell apart.
            FileEntryKind fallback = Directory.Exists(finalPath) ? FileEntryKind.Directory : File.Exists(finalPath) ? FileEntryKind.RegularFile : FileEntryKind.Missing;
            return new OutputTarget(path, finalPath, fallback, null, null, null, false);
        }

        if (status.Value.Kind != FileEntryKind.RegularFile)
        {
            return new OutputTarget(path, finalPath, status.Value.Kind, null, status.Value.Owner, status.Value.Group, false);
        }

        UnixFileMode mode = File.GetUnixFileMode(finalPath);
        // Root may write anything, so the permission bits decide; any other user is asked about directly.
        bool readOnly = (mode & AnyWrite) == 0 || (!Environment.IsPrivilegedProcess && !UnixNative.MayWrite(finalPath));
        return new OutputTarget(path, finalPath, FileEntryKind.RegularFile, mode, status.Value.Owner, status.Value.Group, readOnly);
    }

    /// <summary>Inspects <paramref name="path"/> and refuses what may not be replaced, before any work is done.</summary>
    /// <returns>The target to write.</returns>
    /// <exception cref="OutputFileException">When the path is empty, not a regular file, read-only (unless allowed), or its folder is missing.</exception>
    public static OutputTarget Check(string path, bool replaceReadOnly = false)
    {
        ArgumentNullException.ThrowIfNull(path);
        if (string.IsNullOrWhiteSpace(path))
        {
            throw new OutputFileException("the output path is empty; name a file", OutputRefusal.EmptyPath, path);
        }

        OutputTarget target = Inspect(path);
        string shown = target.FinalPath == Path.GetFullPath(path) ? path : $"{path} (a link to {target.FinalPath})";
        if (target.Kind is not (FileEntryKind.Missing or FileEntryKind.RegularFile))
        {
            throw new OutputFileException($"{shown} is {Describe(target.Kind)}, not a regular file; write to a file path instead", OutputRefusal.NotARegularFile, path);
        }

        if (target.IsReadOnly && !replaceReadOnly)
        {
            throw new OutputFileException($"{shown} is read-only; make it writable or choose another file", OutputRefusal.ReadOnly, path);
        }

        if (!Directory.Exists(target.Folder))
        {
            throw new OutputFileException($"the folder of {shown} does not exist: {target.Folder}", OutputRefusal.FolderMissing, path);
        }

        return target;
    }

    /// <summary>Removes our own temporary files and folders (<c>.name.&lt;32 hex digits&gt;.tmp</c>) older than <see cref="StaleAfter"/> from <paramref name="folder"/>.</summary>
    /// <remarks>Best effort: anything that cannot be listed or removed is left alone, as it never blocks a write.</remarks>
    /// <returns>How many entries were removed.</returns>
    public static int RemoveStaleTemporaries(string folder)
    {
        ArgumentNullException.ThrowIfNull(folder);
        DateTime cutoff = DateTime.UtcNow - StaleAfter;
        int removed = 0;
        try
        {
            foreach (string entry in Directory.EnumerateFileSystemEntries(folder, ".*.tmp"))
            {
                if (!TemporaryName().IsMatch(Path.GetFileName(entry)))
                {
                    continue;
                }

                try
                {
                    var info = new FileInfo(entry);
                    if (info.LinkTarget is not null || info.LastWriteTimeUtc > cutoff)
                    {
                        continue;
                    }

                    if (info.Attributes.HasFlag(FileAttributes.Directory))
                    {
                        Directory.Delete(entry, recursive: true);
                    }
                    else
                    {
                        File.Delete(entry);
                    }

                    removed++;
                }
                catch (Exception exception) when (exception is IOException or UnauthorizedAccessException)
                {
                    // Someone else's, or in use: leave it.
                }
            }
        }
        catch (Exception exception) when (exception is IOException or UnauthorizedAccessException)
        {
            // An unlistable folder: the write itself will report what is wrong.
        }

        return removed;
    }

    /// <summary>Runs <paramref name="action"/>; an I/O failure is reported against the output path, never the temporary file's name.</summary>
    internal static void Rethrow(string path, string temporary, Action action)
    {
        try
        {
            action();
        }
        catch (UnauthorizedAccessException exception)
        {
            throw new UnauthorizedAccessException($"cannot write {path}: permission denied in {Path.GetDirectoryName(temporary)} (the folder must be writable)", exception);
        }
        catch (IOException exception) when (exception is not OutputFileException)
        {
            throw new IOException($"cannot write {path}: {exception.Message.Replace(temporary, path, StringComparison.Ordinal)}", exception);
        }
    }

    private static void KeepModeAndOwner(OutputTarget target, string temporary)
    {
        if (OperatingSystem.IsWindows() || !target.Exists || target.Mode is not { } mode)
        {
            return;
        }

        if (target.Owner is { } owner && target.Group is { } group)
        {
            (FileEntryKind Kind, uint Owner, uint Group)? created = UnixNative.Stat(temporary);
            if (created is { } mine && (mine.Owner != owner || mine.Group != group))
            {
                // Root can give the file to anyone; others can only choose one of their own groups (a failure keeps ours).
                _ = Environment.IsPrivilegedProcess
                    ? UnixNative.ChangeOwner(temporary, owner, group)
                    : UnixNative.ChangeOwner(temporary, uint.MaxValue, group);
            }
        }

        // After chown, which clears set-id bits.
        File.SetUnixFileMode(temporary, mode);
    }

    private static string Describe(FileEntryKind kind) => kind switch
    {
        FileEntryKind.Directory => "a folder",
        FileEntryKind.Fifo => "a FIFO (named pipe)",
        FileEntryKind.CharacterDevice => "a character device",
        FileEntryKind.BlockDevice => "a block device",
        FileEntryKind.Socket => "a socket",
        _ => "a special file",
    };

    [GeneratedRegex(@"^\..+\.[0-9a-f]{32}\.tmp$", RegexOptions.CultureInvariant)]
    private static partial Regex TemporaryName();
}
