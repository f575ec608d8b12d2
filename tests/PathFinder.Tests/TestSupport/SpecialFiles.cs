using System.Runtime.InteropServices;

namespace PathFinder.Tests.TestSupport;

/// <summary>Makes file-system entries that are not regular files (Unix only, as CI runs).</summary>
public static class SpecialFiles
{
    /// <summary>Creates a FIFO (named pipe) at <paramref name="path"/>; reading it blocks until a writer opens it.</summary>
    public static string Fifo(string path)
    {
        if (MakeFifo(path, Convert.ToUInt32("644", 8)) != 0)
        {
            throw new IOException($"mkfifo {path} failed (errno {Marshal.GetLastPInvokeError()})");
        }

        return path;
    }

    [DllImport("libc", EntryPoint = "mkfifo", ExactSpelling = true, SetLastError = true)]
    private static extern int MakeFifo([MarshalAs(UnmanagedType.LPUTF8Str)] string path, uint mode);
}
