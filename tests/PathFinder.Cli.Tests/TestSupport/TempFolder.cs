using System.Text;

namespace PathFinder.Cli.Tests.TestSupport;

/// <summary>A fresh folder under the system temp path, deleted with everything in it on dispose.</summary>
public sealed class TempFolder : IDisposable
{
    /// <summary>Creates the folder.</summary>
    public TempFolder()
    {
        Path = System.IO.Path.Combine(System.IO.Path.GetTempPath(), "pathfinder-tests-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(Path);
    }

    /// <summary>The folder's full path.</summary>
    public string Path { get; }

    /// <summary>Writes a UTF-8 text file (no BOM) and returns its full path.</summary>
    public string Write(string name, string content)
    {
        string file = System.IO.Path.Combine(Path, name);
        File.WriteAllText(file, content, new UTF8Encoding(encoderShouldEmitUTF8Identifier: false));
        return file;
    }

    /// <summary>Writes raw bytes and returns the file's full path.</summary>
    public string WriteBytes(string name, byte[] content)
    {
        string file = System.IO.Path.Combine(Path, name);
        File.WriteAllBytes(file, content);
        return file;
    }

    /// <inheritdoc/>
    public void Dispose()
    {
        try
        {
            Directory.Delete(Path, recursive: true);
        }
        catch (IOException)
        {
            // A leftover temp folder is harmless; never fail a test on cleanup.
        }
    }
}
