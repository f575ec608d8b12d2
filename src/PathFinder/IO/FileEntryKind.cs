namespace PathFinder.IO;

/// <summary>What a path names in the file system, after following symbolic links.</summary>
public enum FileEntryKind
{
    /// <summary>Nothing exists at the path.</summary>
    Missing,

    /// <summary>A regular file, the only kind an output may replace.</summary>
    RegularFile,

    /// <summary>A folder.</summary>
    Directory,

    /// <summary>A FIFO (named pipe).</summary>
    Fifo,

    /// <summary>A character device such as <c>/dev/null</c> or a terminal.</summary>
    CharacterDevice,

    /// <summary>A block device such as a disk.</summary>
    BlockDevice,

    /// <summary>A Unix domain socket.</summary>
    Socket,

    /// <summary>Anything else the system reports.</summary>
    Other,
}
