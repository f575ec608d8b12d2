namespace PathFinder.IO;

/// <summary>What an output path leads to: the file finally written after following symbolic links, and what is there now.</summary>
/// <param name="RequestedPath">The path as given.</param>
/// <param name="FinalPath">The full path written: the end of the symbolic-link chain, or the requested path when it is not a link.</param>
/// <param name="Kind">What is at <paramref name="FinalPath"/> now.</param>
/// <param name="Mode">The permission bits of the existing file (null when missing or not on Unix).</param>
/// <param name="Owner">The owner's user id of the existing file (null when missing or not on Unix).</param>
/// <param name="Group">The group id of the existing file (null when missing or not on Unix).</param>
/// <param name="IsReadOnly">Whether the existing file is read-only: no write permission bit at all, or none for the calling user.</param>
public sealed record OutputTarget(string RequestedPath, string FinalPath, FileEntryKind Kind, UnixFileMode? Mode, uint? Owner, uint? Group, bool IsReadOnly)
{
    /// <summary>The folder the temporary file goes into: the final file's own folder, so the rename never crosses file systems.</summary>
    public string Folder => Path.GetDirectoryName(FinalPath) ?? ".";

    /// <summary>Whether the path names an existing regular file (which the write replaces).</summary>
    public bool Exists => Kind == FileEntryKind.RegularFile;
}
