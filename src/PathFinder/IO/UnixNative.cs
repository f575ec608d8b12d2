using System.Runtime.InteropServices;

namespace PathFinder.IO;

/// <summary>The few Unix calls that .NET has no public API for: file type and owner, changing the owner, and access checks.</summary>
/// <remarks>
/// The file status comes from the runtime's own native shim (<c>SystemNative_Stat</c> in libSystem.Native, shipped
/// with every .NET runtime on Unix), whose status record starts with four 32-bit fields on every architecture:
/// flags, mode, owner id and group id. <c>Data/FileKinds</c> reads the same record for input files; it only needs the
/// type, this also needs the owner, and the two could share this class.
/// </remarks>
internal static class UnixNative
{
    private const int TypeMask = 0xF000;
    private const int WriteAccess = 2;

    /// <summary>Stats <paramref name="path"/> (following symbolic links); null when it does not exist, on Windows, or when the shim is missing.</summary>
    public static (FileEntryKind Kind, uint Owner, uint Group)? Stat(string path)
    {
        if (OperatingSystem.IsWindows())
        {
            return null;
        }

        try
        {
            // The status record is under 200 bytes in every runtime; the buffer leaves room to spare.
            var status = new byte[512];
            if (SystemNativeStat(path, status) != 0)
            {
                return null;
            }

            int mode = BitConverter.ToInt32(status, 4);
            FileEntryKind kind = (mode & TypeMask) switch
            {
                0x8000 => FileEntryKind.RegularFile,
                0x4000 => FileEntryKind.Directory,
                0x1000 => FileEntryKind.Fifo,
                0x2000 => FileEntryKind.CharacterDevice,
                0x6000 => FileEntryKind.BlockDevice,
                0xC000 => FileEntryKind.Socket,
                _ => FileEntryKind.Other,
            };
            return (kind, BitConverter.ToUInt32(status, 8), BitConverter.ToUInt32(status, 12));
        }
        catch (Exception exception) when (exception is DllNotFoundException or EntryPointNotFoundException)
        {
            return null;
        }
    }

    /// <summary>Whether the calling user may write <paramref name="path"/> (libc <c>access(W_OK)</c>; true when it cannot be asked).</summary>
    public static bool MayWrite(string path)
    {
        try
        {
            return Access(path, WriteAccess) == 0;
        }
        catch (Exception exception) when (exception is DllNotFoundException or EntryPointNotFoundException)
        {
            return true;
        }
    }

    /// <summary>Gives <paramref name="path"/> an owner and group (libc <c>chown</c>; <c>uint.MaxValue</c> keeps one); false when refused.</summary>
    public static bool ChangeOwner(string path, uint owner, uint group)
    {
        try
        {
            return Chown(path, owner, group) == 0;
        }
        catch (Exception exception) when (exception is DllNotFoundException or EntryPointNotFoundException)
        {
            return false;
        }
    }

    [DllImport("libSystem.Native", EntryPoint = "SystemNative_Stat", ExactSpelling = true)]
    private static extern int SystemNativeStat([MarshalAs(UnmanagedType.LPUTF8Str)] string path, [Out] byte[] status);

    [DllImport("libc", EntryPoint = "access", ExactSpelling = true)]
    private static extern int Access([MarshalAs(UnmanagedType.LPUTF8Str)] string path, int mode);

    [DllImport("libc", EntryPoint = "chown", ExactSpelling = true)]
    private static extern int Chown([MarshalAs(UnmanagedType.LPUTF8Str)] string path, uint owner, uint group);
}
