using System.CommandLine;
using NetSolve.Diagnostics;

namespace NetSolve.Cli;

/// <summary>
/// Words on the command line that name no command or option, said once each with the nearest real name, in place
/// of the parser's own lines (which name every stray token and suggest nothing).
/// </summary>
/// <remarks>
/// A misspelt command makes every later word stray too; only the command is worth naming then. A misspelt option
/// leaves its value stray; the value is not named again.
/// </remarks>
internal static class UnknownWords
{
    /// <summary>The usage problems of <paramref name="parse"/>, one line each, with unknown words rewritten; empty when there are none.</summary>
    public static IReadOnlyList<string> Problems(ParseResult parse, IReadOnlyList<string> args)
    {
        var unmatched = new HashSet<string>(parse.UnmatchedTokens, StringComparer.Ordinal);
        var command = parse.CommandResult.Command;
        if (command is RootCommand && args.Count > 0 && !IsOptionLike(args[0]) && unmatched.Contains(args[0]))
        {
            return [Messages.UnknownCommand(args[0], NearestName.Hint(args[0], command.Subcommands.Select(sub => sub.Name)))];
        }

        // An unknown option before FILE is taken for FILE, so look at every word, not only the unmatched ones.
        var known = new HashSet<string>(OptionNames(parse), StringComparer.Ordinal);
        var named = new HashSet<string>(StringComparer.Ordinal);
        var problems = new List<string>();
        for (int i = 0; i < args.Count; i++)
        {
            string option = args[i].Split('=', 2)[0];
            if (!IsOptionLike(option) || known.Contains(option) || !named.Add(args[i]))
            {
                continue;
            }

            problems.Add(Messages.UnknownOption(option, command.Name, NearestName.Hint(option, known)));
            if (i + 1 < args.Count && !IsOptionLike(args[i + 1]) && !args[i].Contains('=', StringComparison.Ordinal))
            {
                named.Add(args[i + 1]); // the misspelt option's value
            }
        }

        // The parser's other problems (a missing FILE, a bad value) stay; its lines about stray words go once an
        // unknown option explains them.
        problems.AddRange(parse.Errors
            .Select(error => error.Message)
            .Where(message => problems.Count == 0 || !unmatched.Any(word => message.Contains(string.Concat("'", word, "'"), StringComparison.Ordinal))));
        return problems;
    }

    /// <summary>True for a word that looks like an option; a negative number is a value.</summary>
    private static bool IsOptionLike(string word) => word.Length > 1 && word[0] == '-' && !char.IsAsciiDigit(word[1]) && word[1] != '.';

    /// <summary>Every name the matched command answers to: its options and the ones it inherits (<c>--verbose</c>, <c>--help</c>).</summary>
    private static IEnumerable<string> OptionNames(ParseResult parse)
    {
        var options = parse.CommandResult.Command.Options.AsEnumerable();
        if (parse.CommandResult.Command is not RootCommand)
        {
            options = options.Concat(parse.RootCommandResult.Command.Options.Where(option => option.Recursive));
        }

        return options.SelectMany(option => option.Aliases.Prepend(option.Name)).Distinct(StringComparer.Ordinal);
    }
}
