using NetSolve.Model;
using NetSolve.Parsing;

namespace NetSolve.Cli;

/// <summary>Reads a network file for a command, printing every diagnostic on stderr, one line each.</summary>
internal static class NetworkLoader
{
    /// <summary>The network, or an <see cref="InputException"/> carrying the diagnostics when the file is invalid.</summary>
    public static Network Load(string path, CliContext context)
    {
        var result = NetworkReader.ReadFile(path);
        var errors = result.Diagnostics.Where(d => d.IsError).ToList();
        if (errors.Count > 0)
        {
            throw new InputException(string.Join("\n", errors.Select(d => d.ToString())));
        }

        foreach (var warning in result.Diagnostics)
        {
            context.Report(warning.ToString());
        }

        return result.Network!;
    }
}
