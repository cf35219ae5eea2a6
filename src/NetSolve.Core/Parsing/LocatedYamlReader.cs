using YamlDotNet.Core;
using YamlDotNet.Core.Events;
using NetSolve.Diagnostics;

namespace NetSolve.Parsing;

/// <summary>
/// Reads YAML into a <see cref="YamlTree"/> whose nodes keep their file positions, duplicate keys and quoting,
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
    /// <remarks>The nodes are stored in the order they are met, so the first scalar with a tab is the first in the file.</remarks>
    private static void RefuseTabs(YamlNode? root)
    {
        if (root is not YamlNode { Tree: var tree })
        {
            return;
        }

        for (int i = 0; i < tree.Count; i++)
        {
            if (tree[i].Kind == YamlNodeKind.Scalar)
            {
                RefuseTab(tree.Location(i), tree.Text(i), tree[i].IsPlain);
            }
        }
    }

    /// <summary>Throws at the first tab of a key's or value's <paramref name="text"/>, which starts at <paramref name="location"/>.</summary>
    private static void RefuseTab(SourceLocation location, ReadOnlySpan<char> text, bool isPlain)
    {
        int tab = text.IndexOf('\t');
        if (tab < 0)
        {
            return;
        }

        bool sameLine = !text[..tab].ContainsAny('\n', '\r');
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
            var tree = new YamlTree(text, fileName, 16);
            ReadNode(parser, tree, 0);
            var root = tree.Root;
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

    /// <summary>Adds the node at the parser, and its children, to <paramref name="tree"/>; returns its index.</summary>
    private static int ReadNode(IParser parser, YamlTree tree, int depth)
    {
        var start = parser.Current!;
        var location = At(tree.FileName, start.Start);
        if (depth > MaxDepth)
        {
            throw new YamlReadException(location, $"nesting deeper than {MaxDepth} levels");
        }

        switch (start)
        {
            case Scalar scalar:
                parser.MoveNext();
                return tree.AddScalar(location.Line, location.Column, scalar.Value, scalar.Style == ScalarStyle.Plain && scalar.Tag.IsEmpty);
            case SequenceStart:
            {
                parser.MoveNext();
                int sequence = tree.Add(YamlNodeKind.Sequence, location.Line, location.Column, 0, 0, isPlain: true);
                int count = 0;
                int previous = 0;
                while (!parser.TryConsume<SequenceEnd>(out _))
                {
                    int item = ReadNode(parser, tree, depth + 1);
                    if (previous != 0)
                    {
                        tree.SetNext(previous, item);
                    }

                    previous = item;
                    count++;
                }

                tree.SetLength(sequence, count);
                return sequence;
            }

            case MappingStart:
            {
                parser.MoveNext();
                int mapping = tree.Add(YamlNodeKind.Mapping, location.Line, location.Column, 0, 0, isPlain: true);
                int count = 0;
                int previous = 0;
                while (!parser.TryConsume<MappingEnd>(out _))
                {
                    int key = ReadNode(parser, tree, depth + 1);
                    if (tree[key].Kind != YamlNodeKind.Scalar)
                    {
                        throw new YamlReadException(location, "a mapping key must be a plain name, not a list or mapping");
                    }

                    // The value follows its key: a key is one record.
                    int value = ReadNode(parser, tree, depth + 1);
                    if (previous != 0)
                    {
                        tree.SetNext(previous, key);
                    }

                    previous = value;
                    count++;
                }

                tree.SetLength(mapping, count);
                return mapping;
            }

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
