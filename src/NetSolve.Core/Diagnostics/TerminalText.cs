using System.Globalization;
using System.Text;

namespace NetSolve.Diagnostics;

/// <summary>
/// Escapes text quoted from the command line or an input file before it is shown in a message, so that a value
/// holding NUL, ESC, a bell or a right-to-left override is named rather than acted on by the terminal.
/// </summary>
/// <remarks>
/// Every character a terminal could act on, or that would reorder or hide what a planner reads, is written as
/// <c>\uXXXX</c> (ESC as <c>\u001B</c>, U+202E as <c>\u202E</c>): C0 controls (tab and carriage return included),
/// DEL, C1 controls, the bidirectional embedding, override and isolate controls, the non-characters U+FFFE and
/// U+FFFF and unpaired surrogates. Everything else, other scripts and emoji included, is kept. Text that needs no
/// change is returned as it is. This is the one escaping rule of messages; the readers and the CLI both use it.
/// </remarks>
public static class TerminalText
{
    /// <summary>
    /// <paramref name="text"/> as one safe line: every unsafe character escaped, line feeds too, so a quoted value
    /// can never start a second line of a message.
    /// </summary>
    public static string Quote(string text) => Escape(text, keepLineFeeds: false);

    /// <summary>
    /// As <see cref="Quote"/>, but line feeds kept: for a whole message of several lines, one per problem.
    /// </summary>
    public static string Lines(string text) => Escape(text, keepLineFeeds: true);

    private static string Escape(string text, bool keepLineFeeds)
    {
        ArgumentNullException.ThrowIfNull(text);
        int first = FirstUnsafe(text, keepLineFeeds);
        if (first < 0)
        {
            return text;
        }

        var escaped = new StringBuilder(text.Length + 12);
        escaped.Append(text, 0, first);
        for (int i = first; i < text.Length; i++)
        {
            char c = text[i];
            if (char.IsHighSurrogate(c) && i + 1 < text.Length && char.IsLowSurrogate(text[i + 1]))
            {
                escaped.Append(c).Append(text[i + 1]);
                i++;
            }
            else if (IsUnsafe(c, keepLineFeeds))
            {
                escaped.Append("\\u").Append(((int)c).ToString("X4", CultureInfo.InvariantCulture));
            }
            else
            {
                escaped.Append(c);
            }
        }

        return escaped.ToString();
    }

    /// <summary>The index of the first character that must not reach a screen or file as it is, or -1; a valid surrogate pair is safe.</summary>
    public static int FirstUnsafe(string text, bool keepLineFeeds)
    {
        for (int i = 0; i < text.Length; i++)
        {
            char c = text[i];
            if (char.IsHighSurrogate(c) && i + 1 < text.Length && char.IsLowSurrogate(text[i + 1]))
            {
                i++;
            }
            else if (IsUnsafe(c, keepLineFeeds))
            {
                return i;
            }
        }

        return -1;
    }

    /// <summary>
    /// A control character (C0 except line feed when kept, DEL, C1), a bidirectional override or isolate, U+FFFE/U+FFFF
    /// or a surrogate (callers skip valid pairs first): the one rule shared by terminal escaping and display cleaning.
    /// </summary>
    public static bool IsUnsafe(char c, bool keepLineFeeds) => c switch
    {
        '\n' => !keepLineFeeds,
        < ' ' or '\u007F' => true,
        >= '\u0080' and <= '\u009F' => true,
        >= '\u202A' and <= '\u202E' => true,
        >= '\u2066' and <= '\u2069' => true,
        '\uFFFE' or '\uFFFF' => true,
        _ => char.IsSurrogate(c),
    };
}
