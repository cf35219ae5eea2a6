using StringPool = System.Collections.Generic.Dictionary<string, string>.AlternateLookup<System.ReadOnlySpan<char>>;

using NetSolve.Diagnostics;

namespace NetSolve.Parsing;

/// <summary>
/// A fast reader for the plain block-mapping YAML that network files are written in, producing exactly the
/// nodes and positions that <see cref="LocatedYamlReader"/> builds through YamlDotNet.
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

        var scratch = new List<List<YamlEntry>>();
        var mapping = ReadMapping(lines, 0, fileName, 0, scratch);
        if (mapping is null || lines.HasCurrent || lines.Failed)
        {
            return false;
        }

        root = mapping;
        return true;
    }

    /// <summary>
    /// Reads the mapping whose keys stand at <paramref name="indent"/>, using one reusable entry list per depth
    /// (<paramref name="scratch"/>) so that each mapping keeps an array of exactly its entries.
    /// </summary>
    private static YamlMapping? ReadMapping(LineCursor lines, int indent, string fileName, int depth, List<List<YamlEntry>> scratch)
    {
        if (depth > LocatedYamlReader.MaxDepth)
        {
            return null;
        }

        if (scratch.Count == depth)
        {
            scratch.Add([]);
        }

        var entries = scratch[depth];
        entries.Clear();
        int firstNumber = lines.Current.Number;
        while (lines.HasCurrent && lines.Current.Indent == indent)
        {
            var line = lines.Current;
            lines.Advance();
            var key = new YamlKey(new SourceLocation(fileName, line.Number, indent + 1), line.Key, IsPlain: true);
            if (line.Value is not null)
            {
                entries.Add(new(key, new YamlScalar(new SourceLocation(fileName, line.Number, line.ValueColumn), line.Value, line.ValueIsPlain)));
            }
            else if (lines.HasCurrent && lines.Current.Indent > indent)
            {
                var child = ReadMapping(lines, lines.Current.Indent, fileName, depth + 1, scratch);
                if (child is null)
                {
                    return null;
                }

                entries.Add(new(key, child));
            }
            else
            {
                entries.Add(new(key, new YamlScalar(new SourceLocation(fileName, line.Number, line.ValueColumn), string.Empty, IsPlain: true)));
            }
        }

        // A line indented deeper than its siblings but not under an empty key is not a block mapping.
        if (lines.HasCurrent && lines.Current.Indent > indent)
        {
            return null;
        }

        return new YamlMapping(new SourceLocation(fileName, firstNumber, indent + 1), entries.ToArray());
    }

    /// <summary>The next line with a key on it, read when asked for; blank and comment lines are passed over.</summary>
    private sealed class LineCursor(string text)
    {
        // Keys and values repeat (unit ids appear as routes' targets, probabilities recur): one string each. Sized so
        // that the pool is not regrown as it fills: the generated 100,000-unit network has 287,000 distinct strings
        // in 13.4 M characters, one per 47 characters (at one per 64 the pool was regrown once, 12 MB more).
        private readonly StringPool _pool = new Dictionary<string, string>(text.Length / 40, StringComparer.Ordinal).GetAlternateLookup<ReadOnlySpan<char>>();
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

                _position = end + 1;
                if (!ReadLine(span, _lineNumber, _pool, out var line))
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

    /// <summary>False when the line is outside the accepted subset; <paramref name="line"/> is null for a blank or comment line.</summary>
    private static bool ReadLine(ReadOnlySpan<char> span, int number, StringPool pool, out Line? line)
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

        string key = Intern(pool, span[indent..keyEnd]);
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
            line = new Line(number, indent, key, null, colon + 2, true);
            return true;
        }

        if (!ReadValue(rest, pool, out string? value, out bool isPlain))
        {
            return false;
        }

        line = new Line(number, indent, key, value, valueStart + 1, isPlain);
        return true;
    }

    private static bool ReadValue(ReadOnlySpan<char> rest, StringPool pool, out string? value, out bool isPlain)
    {
        value = null;
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

            value = Intern(pool, rest[1..(close + 1)]);
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

        value = Intern(pool, body);
        return true;
    }

    private static string Intern(StringPool pool, ReadOnlySpan<char> text)
    {
        if (!pool.TryGetValue(text, out string? interned))
        {
            interned = text.ToString();
            pool.Dictionary[interned] = interned;
        }

        return interned;
    }

    private static bool IsKeyChar(char c) => char.IsAsciiLetterOrDigit(c) || c is '_' or '-';

    private readonly record struct Line(int Number, int Indent, string Key, string? Value, int ValueColumn, bool ValueIsPlain);
}
