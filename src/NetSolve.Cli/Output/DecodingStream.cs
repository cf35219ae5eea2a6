using System.Text;
using NetSolve.Presentation.Formats;

namespace NetSolve.Cli.Output;

/// <summary>Decodes UTF-8 bytes into a text writer as they come; a character split between writes is completed by the next.</summary>
internal sealed class DecodingStream(TextWriter output) : WriteOnlyStream
{
    private readonly Decoder _decoder = new UTF8Encoding(false, throwOnInvalidBytes: true).GetDecoder();
    private char[] _chars = [];

    /// <inheritdoc/>
    public override void Write(ReadOnlySpan<byte> buffer)
    {
        int needed = _decoder.GetCharCount(buffer, flush: false);
        if (_chars.Length < needed)
        {
            _chars = new char[Math.Max(needed, 1024)];
        }

        int count = _decoder.GetChars(buffer, _chars, flush: false);
        output.Write(_chars, 0, count);
    }

    /// <inheritdoc/>
    public override void Flush() => output.Flush();
}
