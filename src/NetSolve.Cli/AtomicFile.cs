namespace NetSolve.Cli;

/// <summary>Writes an output file through a temporary sibling and a move, so a failure never leaves half a file.</summary>
internal static class AtomicFile
{
    /// <summary>Writes <paramref name="path"/> with <paramref name="write"/>; an unwritable path is an <see cref="InputException"/>.</summary>
    public static void Write(string path, Action<Stream> write)
    {
        string full = Path.GetFullPath(path);
        string folder = Path.GetDirectoryName(full) ?? ".";
        if (!Directory.Exists(folder))
        {
            throw new InputException(Messages.NoFolder(path, folder));
        }

        string temporary = Path.Combine(folder, "." + Path.GetFileName(full) + ".tmp");
        try
        {
            using (var stream = File.Create(temporary))
            {
                write(stream);
            }

            File.Move(temporary, full, overwrite: true);
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

    private static void TryDelete(string path)
    {
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
