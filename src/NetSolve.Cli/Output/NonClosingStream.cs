using NetSolve.Presentation.Formats;

namespace NetSolve.Cli.Output;

/// <summary>Writes through to stdout's stream but leaves it open when disposed: the program closes stdout once, at its end.</summary>
internal sealed class NonClosingStream(Stream inner) : WriteOnlyStream
{
    /// <inheritdoc/>
    public override void Write(ReadOnlySpan<byte> buffer) => inner.Write(buffer);

    /// <inheritdoc/>
    public override void Flush() => inner.Flush();
}
