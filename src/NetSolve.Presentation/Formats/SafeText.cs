using NetSolve.Diagnostics;
using System.Text;

namespace NetSolve.Presentation.Formats;

/// <summary>
/// Makes text from input files (labels, names, ids) safe to show: no control character reaches a map, a report, a
/// DOT file or the terminal, and nothing that would make XML invalid or reorder what a planner reads.
/// </summary>
/// <remarks>
/// The readers reject such characters in files, but text can also arrive by other paths (a fitted movement log, a
/// library caller), so every place that shows text cleans it again. Text that needs no change is returned as it is.
/// A control character becomes its visible symbol from Unicode's Control Pictures block (NUL shows as U+2400, ESC as
/// U+241B); a tab or line break becomes a space; C1 controls, the non-characters U+FFFE and U+FFFF, an unpaired
/// surrogate and the bidirectional embedding, override and isolate controls become U+FFFD, so a planner sees that
/// something was there. Thread-safe.
/// </remarks>
public static class SafeText
{
    /// <summary>Shown in place of a character that cannot be shown safely.</summary>
    public const char Replacement = '\uFFFD';

    /// <summary>Text for one line of a map, report or table: every control character replaced, line breaks by spaces.</summary>
    public static string ForDisplay(string text) => Clean(text, keepLineFeeds: false);

    /// <summary>Text for the terminal: as <see cref="ForDisplay"/>, but line feeds kept so a table keeps its lines.</summary>
    public static string ForTerminal(string text) => Clean(text, keepLineFeeds: true);

    private static string Clean(string text, bool keepLineFeeds)
    {
        ArgumentNullException.ThrowIfNull(text);
        int first = TerminalText.FirstUnsafe(text, keepLineFeeds);
        if (first < 0)
        {
            return text;
        }

        var clean = new StringBuilder(text.Length);
        clean.Append(text, 0, first);
        for (int i = first; i < text.Length; i++)
        {
            char c = text[i];
            if (char.IsHighSurrogate(c) && i + 1 < text.Length && char.IsLowSurrogate(text[i + 1]))
            {
                clean.Append(c).Append(text[i + 1]);
                i++;
            }
            else
            {
                clean.Append(TerminalText.IsUnsafe(c, keepLineFeeds) ? Shown(c) : c);
            }
        }

        return clean.ToString();
    }

    private static char Shown(char c) => c switch
    {
        '\t' or '\n' or '\r' => ' ',
        < ' ' => (char)('\u2400' + c),
        '\u007F' => '\u2421',
        _ => Replacement,
    };
}
