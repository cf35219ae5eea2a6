using System.Text;

namespace NetSolve.Tests.Docs;

/// <summary>
/// Reads the small subset of shell the documents may use on a command line, and refuses the rest so that a
/// document cannot show a line the test would run differently from a shell: words with single or double quotes
/// and backslash escapes; <c>;</c> and <c>&amp;&amp;</c> between commands; a pipe (what follows it is not run);
/// <c>&gt; FILE</c>; <c>$PWD</c>; <c>*</c> and <c>?</c> patterns; a trailing <c>#</c> comment.
/// Another variable marks its command as not runnable (<see cref="ShellCommand.Problem"/>). Anything else (<c>$(...)</c>, back quotes, <c>&lt;</c>, <c>2&gt;</c>, <c>&gt;&gt;</c>,
/// <c>||</c>, a lone <c>&amp;</c>) is a <see cref="FormatException"/> naming it.
/// </summary>
internal static class ShellLineParser
{
    /// <summary>Splits <paramref name="line"/> into commands, with <c>$PWD</c> read as <paramref name="workingDirectory"/>.</summary>
    public static ShellLine Parse(string line, string workingDirectory)
    {
        var state = new ParseState();
        int index = 0;
        while (index < line.Length)
        {
            char c = line[index];
            if (char.IsWhiteSpace(c))
            {
                state.EndWord();
                index++;
            }
            else if (c == '#' && !state.InWord)
            {
                state.EndCommand();
                return new ShellLine(state.Commands, line[index..].Trim());
            }
            else
            {
                index = ReadSpecial(line, index, state, workingDirectory);
            }
        }

        state.EndCommand();
        return new ShellLine(state.Commands, "");
    }

    private static int ReadSpecial(string line, int index, ParseState state, string workingDirectory)
    {
        char c = line[index];
        char next = index + 1 < line.Length ? line[index + 1] : '\0';
        switch (c)
        {
            case '\'':
                int close = line.IndexOf('\'', index + 1);
                if (close < 0)
                {
                    throw new FormatException("an unclosed single quote");
                }

                state.Append(line[(index + 1)..close]);
                return close + 1;
            case '"':
                return ReadDoubleQuoted(line, index + 1, state, workingDirectory);
            case '\\':
                state.Append(next.ToString());
                return index + 2;
            case '$':
                return ReadVariable(line, index, state, workingDirectory);
            case '`':
                throw new FormatException("a back-quoted command");
            case ';':
                state.EndCommand();
                return index + 1;
            case '&' when next == '&':
                state.EndCommand();
                return index + 2;
            case '&':
                throw new FormatException("a command run in the background ('&')");
            case '|' when next == '|':
                throw new FormatException("'||'");
            case '|':
                state.StartPipe();
                return index + 1;
            case '>' when next == '>':
                throw new FormatException("'>>' (appending)");
            case '>':
                state.StartRedirect();
                return index + 1;
            case '<':
                throw new FormatException("'<' (reading stdin from a file)");
            case '*' or '?':
                state.AppendPattern(c);
                return index + 1;
            default:
                state.Append(c.ToString());
                return index + 1;
        }
    }

    private static int ReadDoubleQuoted(string line, int index, ParseState state, string workingDirectory)
    {
        var text = new StringBuilder();
        while (index < line.Length && line[index] != '"')
        {
            char c = line[index];
            if (c == '\\' && index + 1 < line.Length && line[index + 1] is '"' or '\\' or '$' or '`')
            {
                text.Append(line[index + 1]);
                index += 2;
            }
            else if (c == '$')
            {
                index = ReadVariable(line, index, text, state, workingDirectory);
            }
            else if (c == '`')
            {
                throw new FormatException("a back-quoted command");
            }
            else
            {
                text.Append(c);
                index++;
            }
        }

        if (index >= line.Length)
        {
            throw new FormatException("an unclosed double quote");
        }

        state.Append(text.ToString());
        return index + 1;
    }

    private static int ReadVariable(string line, int index, ParseState state, string workingDirectory)
    {
        var text = new StringBuilder();
        int end = ReadVariable(line, index, text, state, workingDirectory);
        state.Append(text.ToString());
        return end;
    }

    // $PWD is the working directory; another variable makes its command one the test cannot run (a command that is
    // not netsolve's, such as the README's PATH line, may use any); $(...) and ${...} other than ${PWD} are refused.
    private static int ReadVariable(string line, int index, StringBuilder text, ParseState state, string workingDirectory)
    {
        string rest = line[(index + 1)..];
        foreach (string name in (string[])["{PWD}", "PWD"])
        {
            if (rest.StartsWith(name, StringComparison.Ordinal) && (name[0] == '{' || !IsNameCharacter(rest.ElementAtOrDefault(name.Length))))
            {
                text.Append(workingDirectory);
                return index + 1 + name.Length;
            }
        }

        string variable = new([.. rest.TakeWhile(IsNameCharacter)]);
        if (variable.Length == 0)
        {
            throw new FormatException(string.Concat("'$", rest.AsSpan(0, Math.Min(2, rest.Length)), "' (only $PWD is read)"));
        }

        state.Refuse(string.Concat("'$", variable, "' (only $PWD is read)"));
        text.Append('$').Append(variable);
        return index + 1 + variable.Length;
    }

    private static bool IsNameCharacter(char c) => char.IsAsciiLetterOrDigit(c) || c == '_';
}
