using System.Security.Cryptography;

namespace NetSolve.Cli;

/// <summary>Writes an output file through a temporary sibling and a move, so a failure never leaves half a file.</summary>
/// <remarks>
/// Output folders may be shared. The temporary file therefore has a name nobody can guess
/// (<c>.NAME.RANDOM.tmp</c>, <see cref="RandomPartLength"/> hex digits from the operating system's cryptographic source)
/// and is created only if nothing exists at that name (<see cref="FileMode.CreateNew"/>: an existing file or a planted
/// link there makes the create fail, it is never followed). The move to the target is a rename within the folder, which
/// is atomic: readers see the old file or the new one, and of two runs writing the same output the last to finish wins,
/// both succeeding. A run killed before its move leaves its temporary file behind; later writes of the same output
/// delete such files once they are more than <see cref="StaleAfter"/> old.
/// </remarks>
internal static class AtomicFile
{
    /// <summary>Hex digits of randomness in a temporary name: 64 bits, far beyond guessing.</summary>
    internal const int RandomPartLength = 16;

    /// <summary>How old a leftover temporary file must be before it is deleted: no write of ours runs that long.</summary>
    internal static readonly TimeSpan StaleAfter = TimeSpan.FromHours(1);

    private const string Suffix = ".tmp";

    private static readonly System.Buffers.SearchValues<char> LowerHexDigits = System.Buffers.SearchValues.Create("0123456789abcdef");

    private const int Attempts = 4;

    /// <summary>Writes <paramref name="path"/> with <paramref name="write"/>; an unwritable path is an <see cref="InputException"/>.</summary>
    public static void Write(string path, Action<Stream> write)
    {
        ArgumentNullException.ThrowIfNull(write);
        string full = Path.GetFullPath(path);
        string folder = Path.GetDirectoryName(full) ?? ".";
        if (!Directory.Exists(folder))
        {
            throw new InputException(Messages.NoFolder(path, folder));
        }

        string? temporary = null;
        try
        {
            var (stream, name) = CreateTemporary(full);
            temporary = name;
            using (stream)
            {
                write(stream);
            }

            DeleteStale(full, temporary);
            File.Move(temporary, full, overwrite: true);
            temporary = null;
        }
        catch (Exception exception) when (exception is IOException or UnauthorizedAccessException)
        {
            TryDelete(temporary);
            throw new InputException(Messages.CannotWrite(path, exception.Message), exception);
        }
        catch
        {
            TryDelete(temporary);
            throw;
        }
    }

    /// <summary>The prefix of every temporary name for <paramref name="fullPath"/>: <c>.NAME.</c>.</summary>
    internal static string TemporaryPrefix(string fullPath) => "." + Path.GetFileName(fullPath) + ".";

    /// <summary>True when <paramref name="fileName"/> is one of our temporary names for the output <paramref name="fullPath"/>.</summary>
    internal static bool IsTemporaryName(string fileName, string fullPath)
    {
        string prefix = TemporaryPrefix(fullPath);
        if (fileName.Length != prefix.Length + RandomPartLength + Suffix.Length
            || !fileName.StartsWith(prefix, StringComparison.Ordinal)
            || !fileName.EndsWith(Suffix, StringComparison.Ordinal))
        {
            return false;
        }

        return !fileName.AsSpan(prefix.Length, RandomPartLength).ContainsAnyExcept(LowerHexDigits);
    }

    /// <summary>Creates a new temporary sibling of <paramref name="full"/>; a name already taken is never opened nor deleted.</summary>
    private static (FileStream Stream, string Name) CreateTemporary(string full)
    {
        string folder = Path.GetDirectoryName(full) ?? ".";
        for (int attempt = 1; ; attempt++)
        {
            // A cryptographic source, not System.Random: the name must be unpredictable, not reproducible; no result
            // depends on it.
            string temporary = Path.Combine(folder, TemporaryPrefix(full) + RandomNumberGenerator.GetHexString(RandomPartLength, lowercase: true) + Suffix);
            try
            {
                return (new FileStream(temporary, FileMode.CreateNew, FileAccess.Write, FileShare.None), temporary);
            }
            catch (IOException) when (attempt < Attempts && Path.Exists(temporary))
            {
                // Someone holds this name already (a one in 2^64 chance, or a planted file): never touch it, pick another.
            }
        }
    }

    /// <summary>
    /// Deletes our leftover temporary files for the same output that are older than <see cref="StaleAfter"/>, measured
    /// against the file system's own time stamp of <paramref name="ours"/>, so no wall clock is read. Links are left alone.
    /// </summary>
    private static void DeleteStale(string full, string ours)
    {
        try
        {
            string folder = Path.GetDirectoryName(full) ?? ".";
            DateTime now = File.GetLastWriteTimeUtc(ours);
            foreach (var file in new DirectoryInfo(folder).EnumerateFiles(TemporaryPrefix(full) + "*" + Suffix))
            {
                if (IsTemporaryName(file.Name, full)
                    && !string.Equals(file.FullName, ours, StringComparison.Ordinal)
                    && file.LinkTarget is null
                    && now - file.LastWriteTimeUtc > StaleAfter)
                {
                    TryDelete(file.FullName);
                }
            }
        }
        catch (Exception exception) when (exception is IOException or UnauthorizedAccessException)
        {
            // Tidying is a courtesy: a folder we cannot list is no reason to fail the write.
        }
    }

    private static void TryDelete(string? path)
    {
        if (path is null)
        {
            return;
        }

        try
        {
            File.Delete(path);
        }
        catch (Exception exception) when (exception is IOException or UnauthorizedAccessException)
        {
            // Best effort: the original error is the one worth reporting.
        }
    }
}
