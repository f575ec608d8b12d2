namespace PathFinder.IO;

/// <summary>Why an output file was not written.</summary>
public enum OutputRefusal
{
    /// <summary>The path names something other than a regular file: a folder, a FIFO, a device or a socket.</summary>
    NotARegularFile,

    /// <summary>The path names a read-only file and replacing read-only files was not allowed.</summary>
    ReadOnly,

    /// <summary>The folder of the output does not exist.</summary>
    FolderMissing,

    /// <summary>The path is empty or only white space.</summary>
    EmptyPath,
}
