using NetSolve.Diagnostics;

namespace NetSolve.Parsing;

/// <summary>Reads an input file's text, turning a missing file, a directory or an unreadable file into a diagnostic.</summary>
public static class InputFile
{
    /// <summary>
    /// The text of <paramref name="path"/>, or null with <paramref name="problem"/> set. <paramref name="kind"/>
    /// names what was expected, as in "is a directory, not a network file".
    /// </summary>
    public static string? TryRead(string path, string kind, out Diagnostic? problem)
    {
        ArgumentNullException.ThrowIfNull(path);
        var location = new SourceLocation(path, 0, 0);
        problem = null;
        if (Directory.Exists(path))
        {
            problem = Diagnostic.Error(DiagnosticCodes.Unreadable, location, null, $"is a directory, not {kind}");
            return null;
        }

        if (!File.Exists(path))
        {
            problem = Diagnostic.Error(DiagnosticCodes.Unreadable, location, null, "no such file");
            return null;
        }

        try
        {
            return File.ReadAllText(path);
        }
        catch (Exception exception) when (exception is IOException or UnauthorizedAccessException)
        {
            problem = Diagnostic.Error(DiagnosticCodes.Unreadable, location, null, "cannot be read: " + exception.Message);
            return null;
        }
    }
}
