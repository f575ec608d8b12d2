using System.Runtime.InteropServices;

namespace PathFinder.Data;

/// <summary>Tells a regular file from a FIFO, a device or a socket, which .NET reports alike as existing files.</summary>
/// <remarks>
/// Reading a FIFO named <c>x.csv</c> blocks until someone writes to it, and <c>/dev/zero</c> never ends, so the
/// reader must know before it opens a path. .NET has no public API for the file type on Unix (a FIFO and
/// <c>/dev/zero</c> both show <c>FileAttributes.Normal</c>), so this asks the runtime's own native shim
/// (<c>SystemNative_Stat</c> in libSystem.Native, shipped with every .NET runtime on Unix), whose status record
/// starts with two 32-bit fields, flags and mode, on every architecture; only the mode is read. An admitted
/// compromise: should the shim ever be missing, every existing path counts as regular, as before.
/// </remarks>
internal static class FileKinds
{
    private const int TypeMask = 0xF000;
    private const int RegularType = 0x8000;

    /// <summary>Whether <paramref name="path"/> is a regular file (following symbolic links).</summary>
    public static bool IsRegularFile(string path)
    {
        if (!File.Exists(path))
        {
            return false;
        }

        if (OperatingSystem.IsWindows())
        {
            return true;
        }

        try
        {
            // The status record is under 200 bytes in every runtime; the buffer leaves room to spare.
            var status = new byte[512];
            if (Stat(path, status) != 0)
            {
                return false;
            }

            int mode = BitConverter.ToInt32(status, 4);
            return (mode & TypeMask) == RegularType;
        }
        catch (Exception exception) when (exception is DllNotFoundException or EntryPointNotFoundException)
        {
            return true;
        }
    }

    [DllImport("libSystem.Native", EntryPoint = "SystemNative_Stat", ExactSpelling = true)]
    private static extern int Stat([MarshalAs(UnmanagedType.LPUTF8Str)] string path, [Out] byte[] status);
}
