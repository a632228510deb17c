using System.Runtime.InteropServices;
using System.Text;

namespace Layers.Core.Files;

/// <summary>
/// What kind of file system entry a path names, asked of the operating system before the file is opened: opening a
/// FIFO blocks until something writes to it, and a device such as /dev/zero never ends, so only a regular file may be
/// opened for reading. .NET reports no file type beyond "directory", hence the one system call here.
/// </summary>
internal static class FileKind
{
    /// <summary>The kinds told apart.</summary>
    public enum Kind
    {
        /// <summary>Nothing at that path.</summary>
        Missing,

        /// <summary>A regular file (after following symbolic links).</summary>
        Regular,

        /// <summary>A directory.</summary>
        Directory,

        /// <summary>A FIFO (named pipe).</summary>
        Fifo,

        /// <summary>A character or block device.</summary>
        Device,

        /// <summary>A socket.</summary>
        Socket,

        /// <summary>The system could not say (a platform without the call); the caller treats it as regular and relies on its size limit.</summary>
        Unknown,
    }

    // statx(2), Linux 4.11 and glibc 2.28 on: unlike stat(2), its buffer has one layout on every architecture.
    private const int AtCurrentDirectory = -100;
    private const uint StatxType = 0x1;
    private const int ModeOffset = 28;
    private const int StatxBufferBytes = 256;

    /// <summary>The kind of entry at <paramref name="path"/>, following symbolic links.</summary>
    public static Kind Of(string path)
    {
        if (Directory.Exists(path))
        {
            return Kind.Directory;
        }

        if (!File.Exists(path))
        {
            return Kind.Missing;
        }

        return OperatingSystem.IsLinux() ? LinuxKind(path) : Kind.Unknown;
    }

    /// <summary>How to name a kind in a message.</summary>
    public static string Describe(Kind kind) => kind switch
    {
        Kind.Directory => "a folder",
        Kind.Fifo => "a FIFO (named pipe)",
        Kind.Device => "a device",
        Kind.Socket => "a socket",
        Kind.Missing => "missing",
        _ => "a regular file",
    };

    private static Kind LinuxKind(string path)
    {
        var buffer = new byte[StatxBufferBytes];
        var name = Encoding.UTF8.GetBytes(path + "\0");
        try
        {
            if (Statx(AtCurrentDirectory, name, 0, StatxType, buffer) != 0)
            {
                return Kind.Unknown;
            }
        }
        catch (Exception exception) when (exception is EntryPointNotFoundException or DllNotFoundException)
        {
            return Kind.Unknown; // a C library without statx: the size limit still bounds the read
        }

        var mode = BitConverter.ToUInt16(buffer, ModeOffset) & 0xF000;
        return mode switch
        {
            0x8000 => Kind.Regular,
            0x4000 => Kind.Directory,
            0x1000 => Kind.Fifo,
            0x2000 or 0x6000 => Kind.Device,
            0xC000 => Kind.Socket,
            _ => Kind.Unknown,
        };
    }

    [DllImport("libc", EntryPoint = "statx", SetLastError = true)]
    [DefaultDllImportSearchPaths(DllImportSearchPath.SafeDirectories)]
    private static extern int Statx(int directory, byte[] path, int flags, uint mask, byte[] buffer);
}
