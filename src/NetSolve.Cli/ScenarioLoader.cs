using NetSolve.Scenarios;

namespace NetSolve.Cli;

/// <summary>Reads scenario (or network) files for a command, printing each warning line once.</summary>
internal sealed class ScenarioLoader(WarningLog warnings)
{
    /// <summary>The scenario, or an <see cref="InputException"/> carrying the errors when it is invalid.</summary>
    public Scenario Load(string path)
    {
        var result = ScenarioReader.ReadFile(path);
        var errors = result.Diagnostics.Where(d => d.IsError).ToList();
        if (errors.Count > 0)
        {
            throw new InputException(string.Join("\n", errors.Select(d => d.ToString())));
        }

        foreach (var warning in result.Diagnostics)
        {
            warnings.Report(warning.ToString());
        }

        return result.Scenario!;
    }
}
