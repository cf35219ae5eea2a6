using System.CommandLine;

namespace NetSolve.Cli.Settings;

/// <summary>The required <c>--output/-o</c> of commands that write a file; its extension names the format.</summary>
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
        option.Validators.Add(result =>
        {
            string? value = result.GetValueOrDefault<string>();
            string extension = Path.GetExtension(value ?? string.Empty).ToLowerInvariant();
            if (!extensions.Contains(extension, StringComparer.Ordinal))
            {
                result.AddError(Messages.WrongExtension("--output", value, extensions));
            }
        });
        return option;
    }
}
