using System.Runtime.InteropServices;

namespace CoefGen.Cli.Io;

/// <summary>What a path names, after following symbolic links.</summary>
internal enum FileKindValue
{
    Missing,
    Regular,
    Directory,
    Other,
}

/// <summary>
/// Tells a regular file from a directory, device, FIFO or socket before anything opens it (opening a FIFO
/// blocks; reading /dev/zero never ends). .NET reports all of these as "Normal", so on Linux this asks the
/// kernel with statx(2), whose layout is the same on every architecture; elsewhere it falls back to what .NET knows.
/// </summary>
internal static class FileKind
{
    private const int AtFdCwd = -100;
    private const uint StatxType = 0x1;
    private const int StatxModeOffset = 28;
    private const int TypeMask = 0xF000;
    private const int TypeRegular = 0x8000;
    private const int TypeDirectory = 0x4000;

    public static FileKindValue Of(string path)
    {
        if (OperatingSystem.IsLinux())
        {
            var buffer = new byte[256];
            try
            {
                if (Statx(AtFdCwd, path, 0, StatxType, buffer) == 0)
                {
                    var type = BitConverter.ToUInt16(buffer, StatxModeOffset) & TypeMask;
                    return type switch
                    {
                        TypeRegular => FileKindValue.Regular,
                        TypeDirectory => FileKindValue.Directory,
                        _ => FileKindValue.Other,
                    };
                }

                return FileKindValue.Missing;
            }
            catch (Exception ex) when (ex is EntryPointNotFoundException or DllNotFoundException)
            {
                // An old C library without statx: fall through to what .NET can tell.
            }
        }

        if (Directory.Exists(path))
        {
            return FileKindValue.Directory;
        }

        if (!File.Exists(path))
        {
            return FileKindValue.Missing;
        }

        return (File.GetAttributes(path) & FileAttributes.Device) != 0 ? FileKindValue.Other : FileKindValue.Regular;
    }

    [DllImport("libc", EntryPoint = "statx")]
    [DefaultDllImportSearchPaths(DllImportSearchPath.SafeDirectories)]
    private static extern int Statx(int dirFd, [MarshalAs(UnmanagedType.LPUTF8Str)] string path, int flags, uint mask, [Out] byte[] buffer);
}
