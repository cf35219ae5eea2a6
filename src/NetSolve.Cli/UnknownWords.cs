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
    /// <summary>The usage problems of <paramref name="parse"/>, one line each, with unknown words rewritten.</summary>
    public static IReadOnlyList<string> Problems(ParseResult parse, IReadOnlyList<string> args)
    {
        var unmatched = new HashSet<string>(parse.UnmatchedTokens, StringComparer.Ordinal);
        var command = parse.CommandResult.Command;
        if (unmatched.Count == 0)
        {
            return parse.Errors.Select(error => error.Message).ToList();
        }

        if (command is RootCommand && args.Count > 0 && !IsOptionLike(args[0]) && unmatched.Contains(args[0]))
        {
            return [Messages.UnknownCommand(args[0], NearestName.Hint(args[0], command.Subcommands.Select(sub => sub.Name)))];
        }

        var named = new HashSet<string>(StringComparer.Ordinal);
        var problems = new List<string>();
        for (int i = 0; i < args.Count; i++)
        {
            string word = args[i];
            if (!IsOptionLike(word) || !unmatched.Contains(word) || !named.Add(word))
            {
                continue;
            }

            string option = word.Split('=', 2)[0];
            problems.Add(Messages.UnknownOption(option, command.Name, NearestName.Hint(option, OptionNames(parse))));
            if (i + 1 < args.Count && !IsOptionLike(args[i + 1]) && unmatched.Contains(args[i + 1]))
            {
                named.Add(args[i + 1]); // the misspelt option's value
            }
        }

        // The parser's other problems (a missing FILE, a bad value) stay; its lines about words named above go.
        problems.AddRange(parse.Errors
            .Select(error => error.Message)
            .Where(message => !named.Any(word => message.Contains(string.Concat("'", word, "'"), StringComparison.Ordinal))));
        return problems;
    }

    private static bool IsOptionLike(string word) => word.Length > 1 && word[0] == '-';

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
