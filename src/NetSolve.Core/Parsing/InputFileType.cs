using System.Runtime.InteropServices;

namespace NetSolve.Parsing;

/// <summary>
/// What kind of file system entry a path names, asked without opening it: opening a named pipe blocks until
/// something writes to it, and a device such as <c>/dev/zero</c> never ends, so both must be refused before reading.
/// </summary>
/// <remarks>
/// <para>
/// .NET 10 has no public call for the Unix file type (<see cref="FileSystemInfo.Attributes"/> says Normal for a pipe
/// and a device alike, and <see cref="File.GetUnixFileMode(string)"/> keeps only the permission bits), so this asks
/// the operating system's own documented C library call: <c>statx(2)</c> on Linux, whose record has the same layout on
/// every processor (the mode is the 16-bit word at byte 28), and <c>stat(2)</c> on macOS (the mode at byte 4 in both
/// of its layouts). Not the runtime's private helper library, which a Native AOT build links in and does not ship, so
/// the check works the same there. The arguments are numbers and byte arrays (pinned, not copied), so no text
/// marshalling is involved.
/// </para>
/// <para>
/// Where the call is not available (Windows, an older C library) the answer is <see cref="Unknown"/> and the size
/// limit, checked while reading, still bounds what is read.
/// </para>
/// </remarks>
internal static class InputFileType
{
    /// <summary>The type could not be asked; treated as a regular file.</summary>
    public const string? Unknown = null;

    private const int TypeMask = 0xF000;
    private const int Fifo = 0x1000;
    private const int CharacterDevice = 0x2000;
    private const int Directory = 0x4000;
    private const int BlockDevice = 0x6000;
    private const int RegularFile = 0x8000;
    private const int Socket = 0xC000;

    /// <summary>
    /// Null for a regular file (links followed) or when the type cannot be asked; otherwise what the path is,
    /// worded for a message ("a named pipe (FIFO)").
    /// </summary>
    public static string? NotRegular(string path) => Mode(path) is int mode ? Describe(mode) : Unknown;

    /// <summary>How a file type (the <c>S_IFMT</c> bits of a mode) is named in a message; null for a regular file.</summary>
    public static string? Describe(int mode) => (mode & TypeMask) switch
    {
        RegularFile => null,
        Directory => "a directory",
        Fifo => "a named pipe (FIFO)",
        CharacterDevice => "a character device",
        BlockDevice => "a block device",
        Socket => "a socket",
        _ => "not a regular file",
    };

    /// <summary>The POSIX mode word of <paramref name="path"/> (links followed), or null when it cannot be asked.</summary>
    private static int? Mode(string path)
    {
        // NUL-terminated UTF-8, as the C library takes a path; a NUL inside the name makes it a different (shorter) path.
        if (path.Contains('\0', StringComparison.Ordinal))
        {
            return null;
        }

        byte[] name = [.. System.Text.Encoding.UTF8.GetBytes(path), 0];
        try
        {
            if (OperatingSystem.IsLinux())
            {
                // Large enough for the 256-byte record of statx(2).
                byte[] record = new byte[256];
                return Linux.Statx(Linux.CurrentDirectory, name, 0, Linux.TypeField, record) == 0 ? BitConverter.ToUInt16(record, 28) : null;
            }

            if (OperatingSystem.IsMacOS())
            {
                // Large enough for either layout of struct stat (144 bytes).
                byte[] record = new byte[512];
                return MacOS.Stat(name, record) == 0 ? BitConverter.ToUInt16(record, 4) : null;
            }
        }
        catch (Exception exception) when (exception is DllNotFoundException or EntryPointNotFoundException)
        {
            return null;
        }

        return null;
    }

    /// <summary>The Linux C library: glibc by its versioned name (which a Native AOT build finds as the runtime does), else the system's <c>libc</c>.</summary>
    private static class Linux
    {
        /// <summary><c>AT_FDCWD</c>: a relative path is taken from the current directory.</summary>
        public const int CurrentDirectory = -100;

        /// <summary><c>STATX_TYPE</c>: only the type bits of the mode are needed.</summary>
        public const uint TypeField = 0x1;

        public static int Statx(int directory, byte[] path, int flags, uint mask, byte[] record)
        {
            try
            {
                return NativeMethods.StatxGlibc(directory, path, flags, mask, record);
            }
            catch (DllNotFoundException)
            {
                return NativeMethods.StatxLibc(directory, path, flags, mask, record);
            }
        }

        private static class NativeMethods
        {
            [DllImport("libc.so.6", EntryPoint = "statx", ExactSpelling = true)]
            [DefaultDllImportSearchPaths(DllImportSearchPath.SafeDirectories)]
            public static extern int StatxGlibc(int directory, byte[] path, int flags, uint mask, [Out] byte[] record);

            [DllImport("libc", EntryPoint = "statx", ExactSpelling = true)]
            [DefaultDllImportSearchPaths(DllImportSearchPath.SafeDirectories)]
            public static extern int StatxLibc(int directory, byte[] path, int flags, uint mask, [Out] byte[] record);
        }
    }

    /// <summary>The macOS C library.</summary>
    private static class MacOS
    {
        public static int Stat(byte[] path, byte[] record) => NativeMethods.Stat(path, record);

        private static class NativeMethods
        {
            [DllImport("libSystem.dylib", EntryPoint = "stat", ExactSpelling = true)]
            [DefaultDllImportSearchPaths(DllImportSearchPath.SafeDirectories)]
            public static extern int Stat(byte[] path, [Out] byte[] record);
        }
    }
}
