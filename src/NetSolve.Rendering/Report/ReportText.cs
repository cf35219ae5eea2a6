using System.Net;
using NetSolve.Presentation.Formats;

namespace NetSolve.Rendering.Report;

/// <summary>Text from input files as the report writes it: control characters made visible, HTML-encoded, headings kept short.</summary>
internal static class ReportText
{
    /// <summary>A heading longer than this many characters is cut with an ellipsis; its title attribute keeps it whole.</summary>
    public const int MaxHeadingLength = 120;

    /// <summary>A column heading longer than this is cut the same way, so one long name cannot stretch a table.</summary>
    public const int MaxColumnHeadingLength = 60;

    /// <summary>HTML-encoded text with no control character (see <see cref="SafeText.ForDisplay"/>).</summary>
    public static string HtmlEncode(string text) => WebUtility.HtmlEncode(SafeText.ForDisplay(text));

    /// <summary>
    /// An element's attributes and content for a heading: <c>&gt;text</c> when it is short enough, else
    /// <c> title="whole text"&gt;start…</c>, so a reader still finds the whole text in the tooltip.
    /// </summary>
    public static string Heading(string text, int maxLength)
    {
        string safe = SafeText.ForDisplay(text);
        if (safe.Length <= maxLength)
        {
            return ">" + WebUtility.HtmlEncode(safe);
        }

        int cut = maxLength - 1;
        if (char.IsHighSurrogate(safe[cut - 1]))
        {
            cut--;
        }

        return " title=\"" + WebUtility.HtmlEncode(safe) + "\">" + WebUtility.HtmlEncode(safe[..cut].TrimEnd()) + "\u2026";
    }

    /// <summary>The short form of <see cref="Heading"/> alone, for the document's title.</summary>
    public static string Short(string text, int maxLength)
    {
        string safe = SafeText.ForDisplay(text);
        return safe.Length <= maxLength ? WebUtility.HtmlEncode(safe) : WebUtility.HtmlEncode(safe[..(maxLength - 1)].TrimEnd()) + "\u2026";
    }

    /// <summary>A chart's legend entry: no control character, cut like a column heading (the table beside it has the whole label).</summary>
    public static string Legend(string text)
    {
        string safe = SafeText.ForDisplay(text);
        return safe.Length <= MaxColumnHeadingLength ? safe : safe[..(MaxColumnHeadingLength - 1)].TrimEnd() + "\u2026";
    }
}
