using System.Text;

namespace NetSolve.Tests.Architecture;

/// <summary>
/// C# source with comments and the text of string and character literals blanked out, so that only code is left
/// to search for names. Every character keeps its place and every line break stays, so line numbers still hold.
/// </summary>
/// <remarks>
/// Handles line, block and documentation comments; regular, verbatim, interpolated and raw strings; character
/// literals. The code inside the holes of an interpolated string is kept (it can name types); the holes of a raw
/// interpolated string are blanked with its text.
/// </remarks>
internal static class CodeText
{
    public static string Blank(string source)
    {
        ArgumentNullException.ThrowIfNull(source);
        var output = new StringBuilder(source.Length);
        int i = 0;
        Code(source, ref i, output, insideHole: false);
        return output.ToString();
    }

    /// <summary>Copies code from <paramref name="i"/> to the end, or inside a hole up to (not past) the brace that closes it.</summary>
    private static void Code(string s, ref int i, StringBuilder output, bool insideHole)
    {
        int depth = 0;
        while (i < s.Length)
        {
            char c = s[i];
            if (c == '/' && At(s, i + 1, '/'))
            {
                BlankUntil(s, ref i, output, s.IndexOf('\n', i) is int end and >= 0 ? end : s.Length);
            }
            else if (c == '/' && At(s, i + 1, '*'))
            {
                int close = s.IndexOf("*/", i + 2, StringComparison.Ordinal);
                BlankUntil(s, ref i, output, close < 0 ? s.Length : close + 2);
            }
            else if (c == '\'')
            {
                CharLiteral(s, ref i, output);
            }
            else if (StringStart(s, i, out int prefix, out bool verbatim, out int dollars))
            {
                output.Append(s, i, prefix);
                i += prefix;
                StringLiteral(s, ref i, output, verbatim, dollars);
            }
            else
            {
                if (insideHole && c == '{')
                {
                    depth++;
                }
                else if (insideHole && c == '}' && depth-- == 0)
                {
                    return;
                }

                output.Append(c);
                i++;
            }
        }
    }

    /// <summary>True when a string literal starts at <paramref name="i"/>; its prefix is <c>$</c>s and <c>@</c> before the first quote.</summary>
    private static bool StringStart(string s, int i, out int prefix, out bool verbatim, out int dollars)
    {
        prefix = 0;
        verbatim = false;
        dollars = 0;
        int j = i;
        while (j < s.Length && s[j] is '$' or '@')
        {
            verbatim |= s[j] == '@';
            dollars += s[j] == '$' ? 1 : 0;
            j++;
        }

        if (!At(s, j, '"'))
        {
            return false;
        }

        prefix = j - i;
        return true;
    }

    /// <summary>Blanks a string literal whose opening quote is at <paramref name="i"/>; keeps the code in interpolation holes.</summary>
    private static void StringLiteral(string s, ref int i, StringBuilder output, bool verbatim, int dollars)
    {
        int quotes = 0;
        while (At(s, i + quotes, '"'))
        {
            quotes++;
        }

        if (quotes >= 3)
        {
            // A raw string ends at the first run of as many quotes as opened it.
            string fence = new('"', quotes);
            int close = s.IndexOf(fence, i + quotes, StringComparison.Ordinal);
            output.Append(fence);
            i += quotes;
            BlankUntil(s, ref i, output, close < 0 ? s.Length : close);
            output.Append(s, i, Math.Min(quotes, s.Length - i));
            i = Math.Min(s.Length, i + quotes);
            return;
        }

        output.Append('"');
        i++;
        if (quotes == 2)
        {
            output.Append('"');
            i++;
            return;
        }

        while (i < s.Length)
        {
            char c = s[i];
            if ((!verbatim && c == '\\') || (verbatim && c == '"' && At(s, i + 1, '"')) || (dollars > 0 && c == '{' && At(s, i + 1, '{')))
            {
                output.Append("  ");
                i += 2;
            }
            else if (c == '"')
            {
                output.Append('"');
                i++;
                return;
            }
            else if (dollars > 0 && c == '{')
            {
                output.Append('{');
                i++;
                Code(s, ref i, output, insideHole: true);
                if (At(s, i, '}'))
                {
                    output.Append('}');
                    i++;
                }
            }
            else
            {
                output.Append(c == '\n' ? '\n' : ' ');
                i++;
            }
        }
    }

    private static void CharLiteral(string s, ref int i, StringBuilder output)
    {
        int end = i + 1;
        while (end < s.Length && s[end] != '\'' && s[end] != '\n')
        {
            end += s[end] == '\\' ? 2 : 1;
        }

        output.Append('\'');
        i++;
        BlankUntil(s, ref i, output, Math.Min(end, s.Length));
        if (i < s.Length && s[i] == '\'')
        {
            output.Append('\'');
            i++;
        }
    }

    private static void BlankUntil(string s, ref int i, StringBuilder output, int end)
    {
        for (; i < end; i++)
        {
            output.Append(s[i] == '\n' ? '\n' : ' ');
        }
    }

    private static bool At(string s, int i, char c) => i < s.Length && s[i] == c;
}
