using System.Runtime.InteropServices;

namespace NetSolve.Parsing;

/// <summary>
/// What kind of file system entry a path names, asked without opening it: opening a named pipe blocks until
/// something writes to it, and a device such as <c>/dev/zero</c> never ends, so both must be refused before reading.
/// </summary>
/// <remarks>
/// .NET 10 has no public call for the Unix file type, so this asks the runtime's own native helper library
/// (<c>libSystem.Native</c>, shipped with every .NET runtime on Unix; its status record starts with a flags word and
/// the POSIX mode word). Where that is not available (Windows, an unusual runtime) the answer is
/// <see cref="Unknown"/> and the size limit, checked while reading, still bounds what is read.
/// </remarks>
internal static partial class InputFileType
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
    public static string? NotRegular(string path)
    {
        if (OperatingSystem.IsWindows())
        {
            return Unknown;
        }

        // The status record is about 120 bytes; a larger buffer leaves room for fields a later runtime adds.
        byte[] status = new byte[512];
        try
        {
            if (NativeMethods.Stat(path, status) != 0)
            {
                return Unknown;
            }
        }
        catch (Exception exception) when (exception is DllNotFoundException or EntryPointNotFoundException)
        {
            return Unknown;
        }

        int mode = BitConverter.ToInt32(status, 4) & TypeMask;
        return mode switch
        {
            RegularFile => null,
            Directory => "a directory",
            Fifo => "a named pipe (FIFO)",
            CharacterDevice => "a character device",
            BlockDevice => "a block device",
            Socket => "a socket",
            _ => "not a regular file",
        };
    }

    private static class NativeMethods
    {
        [DllImport("libSystem.Native", EntryPoint = "SystemNative_Stat", ExactSpelling = true)]
        [DefaultDllImportSearchPaths(DllImportSearchPath.SafeDirectories)]
        public static extern int Stat([MarshalAs(UnmanagedType.LPUTF8Str)] string path, [Out] byte[] status);
    }
}
