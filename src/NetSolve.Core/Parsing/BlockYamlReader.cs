namespace NetSolve.Parsing;

/// <summary>
/// A fast reader for the plain block-mapping YAML that network files are written in, producing exactly the
/// nodes and positions that <see cref="LocatedYamlReader"/> builds through YamlDotNet, each scalar a span of the text.
/// </summary>
/// <remarks>
/// YamlDotNet reads about 2 MB a second, too slow for 100,000-unit networks. This reader accepts only nested
/// block mappings of simple keys with plain or simply quoted scalar values, and comments; on anything else
/// (lists, flow style, anchors, tags, escapes, tabs, multi-line scalars, odd indentation) it declines, and
/// YamlDotNet reads the file and words any error. A differential test checks that both give the same nodes.
/// </remarks>
internal static class BlockYamlReader
{
    private const int MaxImplicitKeyLength = 1024;

    /// <summary>True when the text is in the accepted subset; <paramref name="root"/> is null for a file of comments only.</summary>
    public static bool TryRead(string text, string fileName, out YamlNode? root)
    {
        root = null;
        // Lines are read one ahead as the mappings are built, not listed first: for a 100,000-unit file the list
        // was a 25 MB array held through the whole read.
        var lines = new LineCursor(text);
        lines.Advance();
        if (!lines.HasCurrent)
        {
            return !lines.Failed;
        }

        if (lines.Current.Indent != 0)
        {
            return false;
        }

        // A key and a value per line at most: the records are allocated once, at their final size or a little over.
        var tree = new YamlTree(text, fileName, (2 * text.AsSpan().Count('\n')) + 2);
        if (!ReadMapping(lines, 0, tree, 0) || lines.HasCurrent || lines.Failed)
        {
            return false;
        }

        root = tree.Root;
        return true;
    }

    /// <summary>Reads the mapping whose keys stand at <paramref name="indent"/> into <paramref name="tree"/>; false when it is outside the subset.</summary>
    private static bool ReadMapping(LineCursor lines, int indent, YamlTree tree, int depth)
    {
        if (depth > LocatedYamlReader.MaxDepth)
        {
            return false;
        }

        int mapping = tree.Add(YamlNodeKind.Mapping, lines.Current.Number, indent + 1, 0, 0, isPlain: true);
        int count = 0;
        int previous = 0;
        while (lines.HasCurrent && lines.Current.Indent == indent)
        {
            var line = lines.Current;
            lines.Advance();
            int key = tree.Add(YamlNodeKind.Scalar, line.Number, indent + 1, line.KeyStart, line.KeyLength, isPlain: true);
            if (previous != 0)
            {
                tree.SetNext(previous, key);
            }

            previous = key + 1;
            count++;
            if (line.HasValue)
            {
                tree.Add(YamlNodeKind.Scalar, line.Number, line.ValueColumn, line.ValueStart, line.ValueLength, line.ValueIsPlain);
            }
            else if (lines.HasCurrent && lines.Current.Indent > indent)
            {
                if (!ReadMapping(lines, lines.Current.Indent, tree, depth + 1))
                {
                    return false;
                }
            }
            else
            {
                tree.Add(YamlNodeKind.Scalar, line.Number, line.ValueColumn, 0, 0, isPlain: true);
            }
        }

        tree.SetLength(mapping, count);

        // A line indented deeper than its siblings but not under an empty key is not a block mapping.
        return !(lines.HasCurrent && lines.Current.Indent > indent);
    }

    /// <summary>The next line with a key on it, read when asked for; blank and comment lines are passed over.</summary>
    private sealed class LineCursor(string text)
    {
        private int _position;
        private int _lineNumber;

        public Line Current { get; private set; }

        public bool HasCurrent { get; private set; }

        /// <summary>True once a line outside the accepted subset was met; reading stops there.</summary>
        public bool Failed { get; private set; }

        public void Advance()
        {
            HasCurrent = false;
            while (!Failed && _position <= text.Length)
            {
                int end = text.IndexOf('\n', _position);
                if (end < 0)
                {
                    end = text.Length;
                }

                _lineNumber++;
                var span = text.AsSpan(_position, end - _position);
                if (span.EndsWith("\r"))
                {
                    span = span[..^1];
                }

                int lineStart = _position;
                _position = end + 1;
                if (!ReadLine(span, lineStart, _lineNumber, out var line))
                {
                    Failed = true;
                    return;
                }

                if (line is Line keyed)
                {
                    Current = keyed;
                    HasCurrent = true;
                    return;
                }
            }
        }
    }

    /// <summary>
    /// False when the line is outside the accepted subset; <paramref name="line"/> is null for a blank or comment line.
    /// <paramref name="lineStart"/> is where the line starts in the text: the line's key and value are kept as places there.
    /// </summary>
    private static bool ReadLine(ReadOnlySpan<char> span, int lineStart, int number, out Line? line)
    {
        line = null;
        // Most lines are printable ASCII throughout: one vectorised search, and the character loop only for the rest.
        foreach (char c in span.ContainsAnyExceptInRange(' ', '~') ? span : [])
        {
            // Control characters, YAML's other line breaks (NEL, LS, PS), byte order marks and surrogates: let YamlDotNet decide.
            if (c < ' ' || c is (>= '\u007f' and <= '\u009f') or '\u2028' or '\u2029' or '\uFEFF' or '\uFFFE' or '\uFFFF' || char.IsSurrogate(c))
            {
                return false;
            }
        }

        int indent = 0;
        while (indent < span.Length && span[indent] == ' ')
        {
            indent++;
        }

        if (indent == span.Length || span[indent] == '#')
        {
            return true;
        }

        int keyEnd = indent;
        while (keyEnd < span.Length && IsKeyChar(span[keyEnd]))
        {
            keyEnd++;
        }

        // YAML 1.2.2 section 7.4 limits an implicit key to 1024 characters; YamlDotNet refuses longer ones.
        if (keyEnd == indent || span[indent] == '-' || keyEnd >= span.Length || span[keyEnd] != ':' || keyEnd - indent > MaxImplicitKeyLength)
        {
            return false;
        }

        int colon = keyEnd;
        int valueStart = colon + 1;
        if (valueStart < span.Length && span[valueStart] != ' ')
        {
            return false;
        }

        while (valueStart < span.Length && span[valueStart] == ' ')
        {
            valueStart++;
        }

        var rest = span[valueStart..];
        if (rest.Length == 0 || rest[0] == '#')
        {
            line = new Line(number, indent, lineStart + indent, keyEnd - indent, HasValue: false, 0, 0, colon + 2, ValueIsPlain: true);
            return true;
        }

        if (!ReadValue(rest, out int offset, out int length, out bool isPlain))
        {
            return false;
        }

        line = new Line(number, indent, lineStart + indent, keyEnd - indent, HasValue: true, lineStart + valueStart + offset, length, valueStart + 1, isPlain);
        return true;
    }

    /// <summary>The value's text: <paramref name="length"/> characters from <paramref name="offset"/> in <paramref name="rest"/>.</summary>
    private static bool ReadValue(ReadOnlySpan<char> rest, out int offset, out int length, out bool isPlain)
    {
        offset = 0;
        length = 0;
        isPlain = true;
        char first = rest[0];
        if (first is '"' or '\'')
        {
            int close = rest[1..].IndexOf(first);
            if (close < 0 || (first == '"' && rest[1..(close + 1)].Contains('\\')))
            {
                return false;
            }

            var after = rest[(close + 2)..].TrimStart(' ');
            if (after.Length > 0 && (after[0] != '#' || rest[(close + 2)..].Length == after.Length))
            {
                return false;
            }

            offset = 1;
            length = close;
            isPlain = false;
            return true;
        }

        if ("[]{}&*!|>%@`,?:-#".Contains(first, StringComparison.Ordinal) && !(first == '-' && rest.Length > 1 && rest[1] != ' '))
        {
            return false;
        }

        int comment = rest.IndexOf(" #");
        var body = (comment >= 0 ? rest[..comment] : rest).TrimEnd(' ');
        // The body ends before the first " #", so it holds none.
        if (body.Contains(": ", StringComparison.Ordinal) || body.EndsWith(":"))
        {
            return false;
        }

        length = body.Length;
        return true;
    }

    private static bool IsKeyChar(char c) => char.IsAsciiLetterOrDigit(c) || c is '_' or '-';

    /// <summary>A line with a key: where its key and value stand in the text (<paramref name="ValueColumn"/> counts from the line's start).</summary>
    private readonly record struct Line(
        int Number, int Indent, int KeyStart, int KeyLength, bool HasValue, int ValueStart, int ValueLength, int ValueColumn, bool ValueIsPlain);
}
