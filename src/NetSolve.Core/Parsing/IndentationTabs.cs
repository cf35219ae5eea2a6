namespace NetSolve.Parsing;

/// <summary>
/// Finds a tab in the indentation of a line. YAML indents with spaces only (YAML 1.2.2 specification, section 6.1),
/// and the YAML library reports such a tab where its scanner gives up, often on the line before and in its own
/// words; a tab pasted from an editor or a spreadsheet is the usual cause, so the reader names it and the fix.
/// </summary>
internal static class IndentationTabs
{
    /// <summary>What is wrong and what to do, for the location of the tab.</summary>
    public const string Problem = "a tab in the indentation; YAML indents with spaces: replace it with spaces";

    /// <summary>The index of the first tab among the leading blanks of a line that holds content (not a comment), or -1.</summary>
    public static int Find(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        int lineStart = 0;
        while (lineStart < text.Length)
        {
            int lineEnd = text.IndexOf('\n', lineStart);
            if (lineEnd < 0)
            {
                lineEnd = text.Length;
            }

            int firstTab = -1;
            int i = lineStart;
            for (; i < lineEnd && text[i] is ' ' or '\t'; i++)
            {
                if (text[i] == '\t' && firstTab < 0)
                {
                    firstTab = i;
                }
            }

            bool content = i < lineEnd && text[i] is not '#' and not '\r';
            if (firstTab >= 0 && content)
            {
                return firstTab;
            }

            lineStart = lineEnd + 1;
        }

        return -1;
    }
}
