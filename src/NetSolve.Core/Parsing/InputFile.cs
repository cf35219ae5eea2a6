using System.Buffers;
using System.Globalization;
using System.Text;
using System.Text.Unicode;
using NetSolve.Diagnostics;

namespace NetSolve.Parsing;

/// <summary>
/// Reads an input file's text: only a regular file (a link to one is fine), no larger than a documented limit
/// checked before reading, and strict UTF-8 (a leading byte order mark is skipped). Every refusal is a diagnostic.
/// </summary>
public static class InputFile
{
    /// <summary>Largest network or scenario file read: 256 MiB, far above a 100,000-unit network (about 20 MB).</summary>
    public const long MaxNetworkBytes = 256L * 1024 * 1024;

    private static readonly byte[] ByteOrderMark = [0xEF, 0xBB, 0xBF];

    /// <summary>
    /// The text of <paramref name="path"/> (at most <see cref="MaxNetworkBytes"/>), or null with <paramref name="problem"/>
    /// set. <paramref name="kind"/> names what was expected, as in "is a directory, not a network file".
    /// </summary>
    public static string? TryRead(string path, string kind, out Diagnostic? problem) =>
        TryRead(path, kind, MaxNetworkBytes, out problem);

    /// <summary>The text of <paramref name="path"/> when it is at most <paramref name="maxBytes"/> long; otherwise as above.</summary>
    public static string? TryRead(string path, string kind, long maxBytes, out Diagnostic? problem)
    {
        ArgumentNullException.ThrowIfNull(path);
        ArgumentOutOfRangeException.ThrowIfNegative(maxBytes);
        var location = new SourceLocation(path, 0, 0);
        problem = NotARegularFile(path, kind, location);
        if (problem is not null)
        {
            return null;
        }

        try
        {
            if (ReadBounded(path, maxBytes) is not ArraySegment<byte> bytes)
            {
                problem = Unreadable(location, $"is larger than {Size(maxBytes)}, the most read for {kind}");
                return null;
            }

            return Decode(bytes, location, out problem);
        }
        catch (Exception exception) when (exception is IOException or UnauthorizedAccessException)
        {
            problem = Unreadable(location, "cannot be read: " + exception.Message);
            return null;
        }
    }

    /// <summary>
    /// <paramref name="path"/> opened for one sequential read of any size (a movement log is streamed, never held as
    /// one text), after the same refusals as <see cref="TryRead(string, string, out Diagnostic?)"/>; null with
    /// <paramref name="problem"/> set otherwise. The caller disposes the stream.
    /// </summary>
    public static Stream? TryOpen(string path, string kind, out Diagnostic? problem)
    {
        ArgumentNullException.ThrowIfNull(path);
        var location = new SourceLocation(path, 0, 0);
        problem = NotARegularFile(path, kind, location);
        if (problem is not null)
        {
            return null;
        }

        try
        {
            return new FileStream(path, FileMode.Open, FileAccess.Read, FileShare.Read, bufferSize: 1 << 16, FileOptions.SequentialScan);
        }
        catch (Exception exception) when (exception is IOException or UnauthorizedAccessException)
        {
            problem = Unreadable(location, "cannot be read: " + exception.Message);
            return null;
        }
    }

    /// <summary>Why <paramref name="path"/> is not a regular file to read (a folder, missing, a device or pipe), or null.</summary>
    private static Diagnostic? NotARegularFile(string path, string kind, SourceLocation location)
    {
        if (path.Length == 0)
        {
            return Unreadable(location, "an empty path names no file");
        }

        if (Directory.Exists(path))
        {
            return Unreadable(location, $"is a directory, not {kind}");
        }

        if (!File.Exists(path))
        {
            return Unreadable(location, "no such file");
        }

        return InputFileType.NotRegular(path) is string what
            ? Unreadable(location, $"is {what}, not {kind}; only regular files are read")
            : null;
    }

    /// <summary>The bytes of the file, or null when it holds more than <paramref name="maxBytes"/>.</summary>
    /// <remarks>The length is checked before reading, and the read stops one byte past the limit in case the file grows.</remarks>
    private static ArraySegment<byte>? ReadBounded(string path, long maxBytes)
    {
        using var stream = new FileStream(path, FileMode.Open, FileAccess.Read, FileShare.Read, bufferSize: 1, FileOptions.SequentialScan);
        if (stream.CanSeek && stream.Length > maxBytes)
        {
            return null;
        }

        using var buffer = new MemoryStream(stream.CanSeek ? (int)Math.Min(stream.Length, int.MaxValue) : 0);
        byte[] chunk = ArrayPool<byte>.Shared.Rent(1 << 16);
        try
        {
            int read;
            while ((read = stream.Read(chunk, 0, (int)Math.Min(chunk.Length, maxBytes + 1 - buffer.Length))) > 0)
            {
                buffer.Write(chunk, 0, read);
                if (buffer.Length > maxBytes)
                {
                    return null;
                }
            }
        }
        finally
        {
            ArrayPool<byte>.Shared.Return(chunk);
        }

        // The stream's own buffer, not a copy: for a 13 MB network the copy was 13 MB more at the read's peak.
        return new ArraySegment<byte>(buffer.GetBuffer(), 0, (int)buffer.Length);
    }

    /// <summary>Strict UTF-8: the first invalid byte is an error at its line and column.</summary>
    /// <remarks>
    /// Valid text is decoded straight into its string, with no array of characters first: for a 13 MB network that
    /// array and its copy into the string were 54 MB on the large object heap.
    /// </remarks>
    private static string? Decode(ReadOnlySpan<byte> data, SourceLocation file, out Diagnostic? problem)
    {
        problem = null;
        if (data.StartsWith(ByteOrderMark))
        {
            data = data[ByteOrderMark.Length..];
        }

        if (Utf8.IsValid(data))
        {
            return Encoding.UTF8.GetString(data);
        }

        char[] chars = new char[data.Length];
        var status = Utf8.ToUtf16(data, chars, out int bytesRead, out int charsWritten, replaceInvalidSequences: false);
        if (status == OperationStatus.Done)
        {
            return new string(chars, 0, charsWritten);
        }

        var valid = data[..bytesRead];
        int lineStart = valid.LastIndexOf((byte)'\n') + 1;
        int line = 1 + valid.Count((byte)'\n');
        int column = 1 + Encoding.UTF8.GetCharCount(valid[lineStart..]);
        problem = Diagnostic.Error(DiagnosticCodes.BadText, new SourceLocation(file.File, line, column), null,
            string.Create(CultureInfo.InvariantCulture, $"byte 0x{data[bytesRead]:X2} is not valid UTF-8; save the file as UTF-8"));
        return null;
    }

    private static string Size(long bytes) => bytes >= 1024 * 1024 && bytes % (1024 * 1024) == 0
        ? string.Create(CultureInfo.InvariantCulture, $"{bytes / (1024 * 1024)} MiB")
        : string.Create(CultureInfo.InvariantCulture, $"{bytes} bytes");

    private static Diagnostic Unreadable(SourceLocation location, string message) =>
        Diagnostic.Error(DiagnosticCodes.Unreadable, location, null, message);
}
