using System.Text;

namespace PathFinder.IO;

/// <summary>Writes files so that readers see either the old content or the complete new content, never a part.</summary>
/// <remarks>Writes to a temporary file in the same folder, flushes it to disk, then renames it over the target.</remarks>
public static class AtomicFile
{
    private static readonly UTF8Encoding Utf8NoBom = new(encoderShouldEmitUTF8Identifier: false);

    /// <summary>Writes <paramref name="content"/> as UTF-8 (no BOM) to <paramref name="path"/> atomically.</summary>
    public static void WriteAllText(string path, string content) =>
        Write(path, stream =>
        {
            byte[] bytes = Utf8NoBom.GetBytes(content);
            stream.Write(bytes, 0, bytes.Length);
        });

    /// <summary>Writes through <paramref name="write"/> to a temporary file, then moves it onto <paramref name="path"/>.</summary>
    /// <remarks>If <paramref name="write"/> throws, the temporary file is removed and the target is untouched.</remarks>
    public static void Write(string path, Action<Stream> write)
    {
        ArgumentNullException.ThrowIfNull(path);
        ArgumentNullException.ThrowIfNull(write);
        string fullPath = Path.GetFullPath(path);
        string folder = Path.GetDirectoryName(fullPath) ?? ".";
        string temporary = Path.Combine(folder, $".{Path.GetFileName(fullPath)}.{Guid.NewGuid():N}.tmp");
        try
        {
            using (var stream = new FileStream(temporary, FileMode.CreateNew, FileAccess.Write, FileShare.None))
            {
                write(stream);
                stream.Flush(flushToDisk: true);
            }

            File.Move(temporary, fullPath, overwrite: true);
        }
        finally
        {
            if (File.Exists(temporary))
            {
                File.Delete(temporary);
            }
        }
    }
}
