using YamlDotNet.Core;
using YamlDotNet.Core.Events;
using NetSolve.Diagnostics;

namespace NetSolve.Parsing;

/// <summary>
/// Reads YAML into <see cref="YamlNode"/>s that keep their file positions, duplicate keys and quoting,
/// which the network rules need and YamlDotNet's own object model hides.
/// </summary>
public static class LocatedYamlReader
{
    /// <summary>Deepest nesting accepted; network files need four levels, junk can need thousands.</summary>
    public const int MaxDepth = 64;

    /// <summary>Reads the first document of <paramref name="text"/>; null for an empty file.</summary>
    /// <exception cref="YamlReadException">The text is not YAML this reader accepts.</exception>
    public static YamlNode? Read(string text, string fileName)
    {
        ArgumentNullException.ThrowIfNull(text);
        int refused = InputCharacters.FindRefused(text);
        if (refused >= 0)
        {
            throw new YamlReadException(Position(text, refused, fileName), InputCharacters.Describe(text, refused));
        }

        // The block reader declines every line with a tab (or any other control character), so a tree it built
        // has no tab to look for: only YamlDotNet's trees need the walk of RefuseTabs.
        if (BlockYamlReader.TryRead(text, fileName, out var fast))
        {
            return fast;
        }

        YamlNode? root;
        try
        {
            root = ReadWithYamlDotNet(text, fileName);
        }
        catch (YamlReadException) when (IndentationTabs.Find(text) is int tab && tab >= 0)
        {
            // The library's position and words for an indenting tab mislead; name the tab itself and the fix.
            throw new YamlReadException(Position(text, tab, fileName), IndentationTabs.Problem);
        }

        RefuseTabs(root);
        return root;
    }

    /// <summary>
    /// A tab inside a key or value is refused: YAML allows it there, but in a label or id it is invisible, and a
    /// pasted cell from a spreadsheet brings one in by mistake. Tabs between tokens and in comments are fine.
    /// </summary>
    private static void RefuseTabs(YamlNode? node)
    {
        switch (node)
        {
            case YamlScalar scalar:
                RefuseTab(scalar.Location, scalar.Value, scalar.IsPlain);
                break;
            case YamlMapping mapping:
                foreach (var (key, value) in mapping.Entries)
                {
                    RefuseTab(key.Location, key.Value, key.IsPlain);
                    RefuseTabs(value);
                }

                break;
            case YamlSequence sequence:
                foreach (var item in sequence.Items)
                {
                    RefuseTabs(item);
                }

                break;
        }
    }

    /// <summary>Throws at the first tab of a key's or value's <paramref name="text"/>, which starts at <paramref name="location"/>.</summary>
    private static void RefuseTab(SourceLocation location, string text, bool isPlain)
    {
        int tab = text.IndexOf('\t', StringComparison.Ordinal);
        if (tab < 0)
        {
            return;
        }

        bool sameLine = !text.AsSpan(0, tab).ContainsAny('\n', '\r');
        var at = sameLine ? location with { Column = location.Column + tab + (isPlain ? 0 : 1) } : location;
        throw new YamlReadException(at, "a tab inside a key or value is not allowed; use spaces");
    }

    /// <summary>The line and column (from 1, in UTF-16 code units as YamlDotNet counts) of <paramref name="index"/>.</summary>
    private static SourceLocation Position(string text, int index, string fileName)
    {
        var before = text.AsSpan(0, index);
        int lineStart = before.LastIndexOf('\n') + 1;
        return new SourceLocation(fileName, 1 + before.Count('\n'), 1 + index - lineStart);
    }

    /// <summary>Reads through YamlDotNet only; the reference that the fast block reader must agree with.</summary>
    internal static YamlNode? ReadWithYamlDotNet(string text, string fileName)
    {
        var parser = new Parser(new StringReader(text));
        try
        {
            parser.Consume<StreamStart>();
            if (parser.Accept<StreamEnd>(out _))
            {
                return null;
            }

            parser.Consume<DocumentStart>();
            var root = ReadNode(parser, fileName, 0);
            parser.Consume<DocumentEnd>();
            if (!parser.Accept<StreamEnd>(out _))
            {
                throw new YamlReadException(At(fileName, parser.Current!.Start), "the file holds more than one YAML document");
            }

            return root;
        }
        catch (YamlException exception)
        {
            throw new YamlReadException(At(fileName, exception.Start), "not valid YAML: " + Describe(exception));
        }
        catch (InvalidOperationException)
        {
            // YamlDotNet's scanner throws this, without a position, on some unterminated flow collections
            // (for example an unclosed '{'): point at the last place it read.
            var mark = parser.Current is { } current ? current.End : Mark.Empty;
            throw new YamlReadException(At(fileName, mark), "not valid YAML: cannot be read past this point (an unclosed bracket or quote?)");
        }
    }

    private static YamlNode ReadNode(IParser parser, string fileName, int depth)
    {
        var start = parser.Current!;
        var location = At(fileName, start.Start);
        if (depth > MaxDepth)
        {
            throw new YamlReadException(location, $"nesting deeper than {MaxDepth} levels");
        }

        switch (start)
        {
            case Scalar scalar:
                parser.MoveNext();
                return new YamlScalar(location, scalar.Value, scalar.Style == ScalarStyle.Plain && scalar.Tag.IsEmpty);
            case SequenceStart:
                parser.MoveNext();
                var items = new List<YamlNode>();
                while (!parser.TryConsume<SequenceEnd>(out _))
                {
                    items.Add(ReadNode(parser, fileName, depth + 1));
                }

                return new YamlSequence(location, items);
            case MappingStart:
                parser.MoveNext();
                var entries = new List<YamlEntry>();
                while (!parser.TryConsume<MappingEnd>(out _))
                {
                    if (ReadNode(parser, fileName, depth + 1) is not YamlScalar key)
                    {
                        throw new YamlReadException(location, "a mapping key must be a plain name, not a list or mapping");
                    }

                    entries.Add(new(new YamlKey(key.Location, key.Value, key.IsPlain), ReadNode(parser, fileName, depth + 1)));
                }

                return new YamlMapping(location, entries);
            case AnchorAlias:
                throw new YamlReadException(location, "YAML aliases (*name) are not supported in network files");
            default:
                throw new YamlReadException(location, "unexpected YAML content");
        }
    }

    private static SourceLocation At(string fileName, Mark mark) =>
        new(fileName, (int)Math.Max(1, mark.Line), (int)Math.Max(1, mark.Column));

    private static string Describe(YamlException exception)
    {
        // YamlDotNet prefixes its message with "(Line: .., Col: .., Idx: ..) - (..): "; the location is ours to print.
        string message = exception.Message;
        int cut = message.LastIndexOf("): ", StringComparison.Ordinal);
        message = cut >= 0 ? message[(cut + 3)..] : message;
        message = message.ReplaceLineEndings(" ").Trim();
        return message.Length == 0 ? "unreadable content" : char.ToLowerInvariant(message[0]) + message[1..].TrimEnd('.');
    }
}
