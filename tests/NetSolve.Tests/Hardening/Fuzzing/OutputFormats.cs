using System.Text;
using System.Text.Json;
using System.Xml;

namespace NetSolve.Tests.Hardening.Fuzzing;

/// <summary>Whether a written file is complete for its format: JSON parses, SVG is well-formed XML, HTML ends with its closing tag, PNG ends with its last chunk.</summary>
internal static class OutputFormats
{
    private static readonly byte[] PngSignature = [0x89, 0x50, 0x4E, 0x47, 0x0D, 0x0A, 0x1A, 0x0A];

    private static readonly byte[] PngEnd = [0x49, 0x45, 0x4E, 0x44, 0xAE, 0x42, 0x60, 0x82];

    /// <summary>True for formats whose bytes are not text.</summary>
    public static bool IsBinary(string path) => string.Equals(Path.GetExtension(path), ".png", StringComparison.OrdinalIgnoreCase);

    /// <summary>Why the file is not complete, or null when it is.</summary>
    public static string? Incomplete(string path, byte[] bytes)
    {
        if (bytes.Length == 0)
        {
            return "empty output file";
        }

        string extension = Path.GetExtension(path).ToLowerInvariant();
        string text = extension == ".png" ? string.Empty : Encoding.UTF8.GetString(bytes);
        return extension switch
        {
            ".png" => bytes.AsSpan().StartsWith(PngSignature) && bytes.AsSpan().EndsWith(PngEnd) ? null : "png without its signature or last chunk",
            ".json" => ParsesAsJson(text) ? null : "json that does not parse",
            ".svg" => XmlProblem(text),
            ".html" => text.TrimEnd().EndsWith("</html>", StringComparison.OrdinalIgnoreCase) ? null : "html without its closing tag",
            ".dot" => text.TrimEnd().EndsWith('}') ? null : "dot without its closing brace",
            _ => text.EndsWith('\n') ? null : "text file without its last line end",
        };
    }

    private static bool ParsesAsJson(string text)
    {
        try
        {
            using var document = JsonDocument.Parse(text);
            return true;
        }
        catch (JsonException)
        {
            return false;
        }
    }

    private static string? XmlProblem(string text)
    {
        try
        {
            using var reader = XmlReader.Create(new StringReader(text), new XmlReaderSettings { DtdProcessing = DtdProcessing.Ignore, XmlResolver = null });
            while (reader.Read())
            {
            }

            return null;
        }
        catch (XmlException exception)
        {
            return "svg that is not well-formed XML: " + CliInvariant.Shorten(exception.Message);
        }
    }
}
