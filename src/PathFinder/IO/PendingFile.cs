namespace PathFinder.IO;

/// <summary>A complete new content written to a hidden temporary file beside its target, waiting to be renamed into place.</summary>
/// <remarks>
/// Made by <see cref="AtomicFile.Prepare"/>. <see cref="Commit"/> renames it over the target (one atomic step);
/// disposing without committing removes the temporary file and leaves the target untouched. Preparing several files
/// first and committing them one after the other keeps the window in which some are new and some old down to a few
/// renames (see <c>SyntheticNetworkGenerator.Write</c> for how that window is made harmless).
/// </remarks>
public sealed class PendingFile : IDisposable
{
    private readonly string _temporary;
    private bool _committed;

    internal PendingFile(OutputTarget target, string temporary)
    {
        Target = target;
        _temporary = temporary;
    }

    /// <summary>Where the content goes.</summary>
    public OutputTarget Target { get; }

    /// <summary>Renames the temporary file over the target.</summary>
    /// <exception cref="InvalidOperationException">When already committed.</exception>
    public void Commit()
    {
        if (_committed)
        {
            throw new InvalidOperationException("the file was already committed");
        }

        AtomicFile.Rethrow(Target.RequestedPath, _temporary, () => File.Move(_temporary, Target.FinalPath, overwrite: true));
        _committed = true;
    }

    /// <summary>Removes the temporary file unless it was committed.</summary>
    public void Dispose()
    {
        if (!_committed && File.Exists(_temporary))
        {
            File.Delete(_temporary);
        }
    }
}
