using System.CommandLine;
using System.CommandLine.Parsing;

namespace NetSolve.Cli.Settings;

/// <summary>The <c>--output/-o</c> of commands that write a file: required with its extension naming the format, or optional.</summary>
internal static class OutputFileOption
{
    /// <summary>A required <c>--output/-o</c> whose extension must be one of <paramref name="extensions"/> (a usage error otherwise).</summary>
    public static Option<string> Create(string description, IReadOnlyCollection<string> extensions)
    {
        var option = new Option<string>("--output", "-o")
        {
            Description = description,
            Required = true,
        };
        option.Validators.Add(result => RequireExtension(result, option.Name, result.GetValueOrDefault<string>(), extensions));
        return option;
    }

    /// <summary>An optional file option whose extension, when given, must be one of <paramref name="extensions"/> (a usage error otherwise).</summary>
    public static Option<string?> Named(Option<string?> option, IReadOnlyCollection<string> extensions)
    {
        option.Validators.Add(result =>
        {
            string? value = result.GetValueOrDefault<string?>();
            if (value is not null)
            {
                RequireExtension(result, option.Name, value, extensions);
            }
        });
        return option;
    }

    /// <summary>An optional <c>--output/-o</c> of any extension (<c>fit</c> writes a network file under any name).</summary>
    public static Option<string?> Optional(string description) => Named(new Option<string?>("--output", "-o") { Description = description });

    /// <summary><paramref name="option"/>, a file to write, refused as a usage error when its value cannot name a file.</summary>
    public static Option<string?> Named(Option<string?> option)
    {
        option.Validators.Add(result => IsUsablePath(result, option.Name, result.GetValueOrDefault<string?>()));
        return option;
    }

    /// <summary>A usage error naming the option when <paramref name="value"/> cannot name a file or its extension names another format.</summary>
    private static void RequireExtension(OptionResult result, string name, string? value, IReadOnlyCollection<string> extensions)
    {
        if (!IsUsablePath(result, name, value))
        {
            return;
        }

        string extension = Path.GetExtension(value ?? string.Empty).ToLowerInvariant();
        if (!extensions.Contains(extension, StringComparer.Ordinal))
        {
            result.AddError(Messages.WrongExtension(name, value, extensions));
        }
    }

    /// <summary>
    /// False, with a usage error naming the option, when <paramref name="value"/> is empty or holds a character no path
    /// may hold (NUL on every system): the file system would otherwise refuse it with an exception after the work was done.
    /// </summary>
    private static bool IsUsablePath(OptionResult result, string name, string? value)
    {
        if (value is null || (value.Length > 0 && value.IndexOfAny(Path.GetInvalidPathChars()) < 0))
        {
            return true;
        }

        result.AddError(value.Length == 0 ? Messages.EmptyPath(name) : Messages.NotPath(name, value));
        return false;
    }
}
