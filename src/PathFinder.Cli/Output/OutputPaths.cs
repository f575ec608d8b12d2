using PathFinder.IO;

namespace PathFinder.Cli.Output;

/// <summary>Checks an output path before any work is done, so a long analysis never ends in an unwritable path.</summary>
public static class OutputPaths
{
    /// <summary>The description of every command's <c>--force</c> option that writes files.</summary>
    public const string ForceDescription = "Replace the output file even when it is read-only (it keeps its mode).";

    /// <summary>Throws a <see cref="UserInputException"/> (exit 2) when <paramref name="path"/> may not be written.</summary>
    /// <remarks>
    /// Refused: an empty path, a folder, a FIFO, a device or a socket (a rename would replace them with a regular file),
    /// a read-only file unless <paramref name="force"/>, and a missing folder. A symbolic link is fine: its final target
    /// is written (see <see cref="AtomicFile"/>).
    /// </remarks>
    /// <param name="path">The path given.</param>
    /// <param name="option">The option that gave it, for the message (e.g. <c>--covariance</c>).</param>
    /// <param name="force">Whether a read-only file may be replaced.</param>
    public static void Check(string path, string option, bool force = false)
    {
        ArgumentNullException.ThrowIfNull(path);
        try
        {
            AtomicFile.Check(path, force);
        }
        catch (OutputFileException exception)
        {
            throw new UserInputException(
                exception.Refusal switch
                {
                    OutputRefusal.EmptyPath => $"{option} is empty; name a file",
                    OutputRefusal.FolderMissing => $"the folder of {option} does not exist: {AtomicFile.Inspect(path).Folder}",
                    OutputRefusal.ReadOnly => $"{option}: {exception.Message} (or add --force to replace it; it keeps its mode)",
                    _ => $"{option}: {exception.Message}",
                },
                exception);
        }
        catch (IOException exception)
        {
            // A loop of symbolic links, or a path the system cannot follow.
            throw new UserInputException($"{option}: cannot use {path}: {exception.Message}", exception);
        }
    }
}
