using System.Runtime.InteropServices;

namespace NetSolve.Tests.Hardening;

/// <summary>Makes a named pipe (FIFO) on Unix, the kind of file that blocks a reader until something writes to it.</summary>
internal static class NamedPipe
{
    public static void Create(string path)
    {
        if (NativeMethods.MakeFifo([.. System.Text.Encoding.UTF8.GetBytes(path), 0], Convert.ToUInt32("600", 8)) != 0)
        {
            throw new IOException("mkfifo failed for " + path);
        }
    }

    private static class NativeMethods
    {
        [DllImport("libc", EntryPoint = "mkfifo", ExactSpelling = true)]
        [DefaultDllImportSearchPaths(DllImportSearchPath.SafeDirectories)]
        public static extern int MakeFifo(byte[] path, uint mode);
    }
}
