namespace PathFinder.Tests.TestSupport;

/// <summary>A fact that needs Unix, and optionally root or not root; elsewhere it reports itself skipped, never passes silently.</summary>
public sealed class UnixFactAttribute : FactAttribute
{
    /// <summary>Creates the attribute; <paramref name="root"/> true needs root, false needs another user, null either.</summary>
    public UnixFactAttribute(object? root = null)
    {
        if (OperatingSystem.IsWindows())
        {
            Skip = "needs Unix file types and permissions";
        }
        else if (root is true && !Environment.IsPrivilegedProcess)
        {
            Skip = "needs root (changing a file's owner)";
        }
        else if (root is false && Environment.IsPrivilegedProcess)
        {
            Skip = "needs a user other than root (root may write into read-only folders)";
        }
    }
}
