namespace NetSolve.Cli.Output;

/// <summary>
/// A stream of UTF-8 bytes (a JSON document) that ends up in a text writer: straight into the bytes under stdout
/// when the writer is a UTF-8 <see cref="StreamWriter"/> (what the program writes to), else decoded into the writer
/// (a test's <see cref="StringWriter"/>). Nothing is held beyond the decoder's few bytes of a split character.
/// </summary>
internal static class Utf8Sink
{
    /// <summary>A stream writing into <paramref name="output"/>; dispose it (or flush it) when the document is done.</summary>
    public static Stream Over(TextWriter output)
    {
        if (output is StreamWriter { Encoding.CodePage: 65001 } stream && stream.Encoding.Preamble.IsEmpty)
        {
            // Whatever the writer holds goes first, so text written before the document stays in front of it.
            stream.Flush();
            return new NonClosingStream(stream.BaseStream);
        }

        return new DecodingStream(output);
    }
}
