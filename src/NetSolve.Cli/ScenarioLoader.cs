using NetSolve.Scenarios;

namespace NetSolve.Cli;

/// <summary>Reads scenario (or network) files for a command, printing each warning line once.</summary>
internal sealed class ScenarioLoader(CliContext context)
{
    private readonly HashSet<string> _reported = new(StringComparer.Ordinal);

    /// <summary>The scenario, or an <see cref="InputException"/> carrying the errors when it is invalid.</summary>
    public Scenario Load(string path)
    {
        var result = ScenarioReader.ReadFile(path);
        var errors = result.Diagnostics.Where(d => d.IsError).ToList();
        if (errors.Count > 0)
        {
            throw new InputException(string.Join("\n", errors.Select(d => d.ToString())));
        }

        foreach (var warning in result.Diagnostics.Select(d => d.ToString()).Where(_reported.Add))
        {
            context.Report(warning);
        }

        return result.Scenario!;
    }
}
