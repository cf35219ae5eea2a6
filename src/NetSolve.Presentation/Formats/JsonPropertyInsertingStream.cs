namespace NetSolve.Presentation.Formats;

/// <summary>
/// Passes a JSON document through to another stream as it is written, adding one top-level property on the way:
/// after the root object's first property when that property has the name given, else before it. Nothing is held
/// back but the root's first name, so a document of any size streams in constant memory.
/// </summary>
/// <remarks>
/// The document is expected as <see cref="System.Text.Json.Utf8JsonWriter"/> writes it (well formed, possibly split
/// into any number of writes). A root that is not an object passes through untouched. <paramref name="member"/> is the
/// property as written inside an object, without the braces (for an indented document: a line break, the indent,
/// <c>"name": value</c>); <paramref name="alone"/> is the whole object holding only that property, written when the
/// root is empty. Not thread-safe; one document per instance; the inner stream is not disposed.
/// </remarks>
/// <param name="inner">Where the document goes.</param>
/// <param name="member">The property to add, without braces or a separating comma.</param>
/// <param name="alone">An object with only the property, written for an empty root <c>{}</c>.</param>
/// <param name="afterName">The UTF-8 name (without quotes) after whose property the new one goes, when it comes first.</param>
public sealed class JsonPropertyInsertingStream(Stream inner, ReadOnlyMemory<byte> member, ReadOnlyMemory<byte> alone, ReadOnlyMemory<byte> afterName) : WriteOnlyStream
{
    private enum Stage
    {
        BeforeRoot,
        BeforeFirstName,
        InFirstName,
        InFirstNameEscape,
        AfterFirstName,
        Done,
    }

    private readonly List<byte> _held = [];
    private Stage _stage;
    private int _nameStart;
    private bool _insertAfterValue;
    private int _depth;
    private bool _inString;
    private bool _escaped;

    /// <inheritdoc/>
    public override void Write(ReadOnlySpan<byte> buffer)
    {
        int passed = 0;
        for (int i = 0; i < buffer.Length && _stage != Stage.Done; i++)
        {
            byte b = buffer[i];
            switch (_stage)
            {
                case Stage.BeforeRoot:
                    if (b == (byte)'{')
                    {
                        _stage = Stage.BeforeFirstName;
                        inner.Write(buffer[passed..(i + 1)]);
                        passed = i + 1;
                    }
                    else if (!IsWhiteSpace(b))
                    {
                        _stage = Stage.Done;
                    }

                    break;
                case Stage.BeforeFirstName:
                    if (b == (byte)'}')
                    {
                        // An empty root: the whole object is the new property alone (its brace replaces ours).
                        inner.Write(buffer[passed..i]);
                        inner.Write(alone.Span[1..]);
                        passed = i + 1;
                        _stage = Stage.Done;
                        break;
                    }

                    _held.Add(b);
                    passed = i + 1;
                    if (b == (byte)'"')
                    {
                        _nameStart = _held.Count;
                        _stage = Stage.InFirstName;
                    }

                    break;
                case Stage.InFirstName or Stage.InFirstNameEscape:
                    _held.Add(b);
                    passed = i + 1;
                    if (_stage == Stage.InFirstNameEscape)
                    {
                        _stage = Stage.InFirstName;
                    }
                    else if (b == (byte)'\\')
                    {
                        _stage = Stage.InFirstNameEscape;
                    }
                    else if (b == (byte)'"')
                    {
                        DecideOnFirstName();
                    }

                    break;
                case Stage.AfterFirstName:
                    passed = AfterFirstName(buffer, i, passed);
                    break;
            }
        }

        inner.Write(buffer[passed..]);
    }

    /// <inheritdoc/>
    public override void Flush() => inner.Flush();

    private static bool IsWhiteSpace(byte b) => b is (byte)' ' or (byte)'\t' or (byte)'\n' or (byte)'\r';

    /// <summary>The first name is complete in <see cref="_held"/>: write the new property before it, or wait for its value's end.</summary>
    private void DecideOnFirstName()
    {
        var held = System.Runtime.InteropServices.CollectionsMarshal.AsSpan(_held);
        _insertAfterValue = held[_nameStart..^1].SequenceEqual(afterName.Span);
        if (!_insertAfterValue)
        {
            inner.Write(member.Span);
            inner.WriteByte((byte)',');
        }

        inner.Write(held);
        _held.Clear();
        _stage = _insertAfterValue ? Stage.AfterFirstName : Stage.Done;
        _depth = 1;
    }

    /// <summary>
    /// One byte after the first name: white space between values is held back, so that the new property goes right
    /// after the first value, before the line break that leads to the next property or the closing brace.
    /// </summary>
    /// <returns>Where the bytes not yet passed on start.</returns>
    private int AfterFirstName(ReadOnlySpan<byte> buffer, int i, int passed)
    {
        byte b = buffer[i];
        if (!_inString && _depth == 1 && IsWhiteSpace(b))
        {
            inner.Write(buffer[passed..i]);
            _held.Add(b);
            return i + 1;
        }

        bool ends = EndsFirstValue(b);
        if (!ends && _held.Count == 0)
        {
            return passed;
        }

        inner.Write(buffer[passed..i]);
        if (ends)
        {
            inner.WriteByte((byte)',');
            inner.Write(member.Span);
            _stage = Stage.Done;
        }

        inner.Write(System.Runtime.InteropServices.CollectionsMarshal.AsSpan(_held));
        _held.Clear();
        return i;
    }

    /// <summary>True at the comma or closing brace that ends the root's first value (strings and nesting skipped).</summary>
    private bool EndsFirstValue(byte b)
    {
        if (_inString)
        {
            if (_escaped)
            {
                _escaped = false;
            }
            else if (b == (byte)'\\')
            {
                _escaped = true;
            }
            else if (b == (byte)'"')
            {
                _inString = false;
            }

            return false;
        }

        switch (b)
        {
            case (byte)'"':
                _inString = true;
                return false;
            case (byte)'{' or (byte)'[':
                _depth++;
                return false;
            case (byte)'}' or (byte)']':
                _depth--;
                return _depth == 0;
            case (byte)',':
                return _depth == 1;
            default:
                return false;
        }
    }
}
