using NetSolve.Diagnostics;
using NetSolve.Model;
using NetSolve.Parsing;
using NetSolve.Scenarios;

namespace NetSolve.Cli;

/// <summary>Reads a network file for a command, printing every diagnostic on stderr, one line each.</summary>
internal static class NetworkLoader
{
    /// <summary>The network, or an <see cref="InputException"/> carrying the diagnostics when the file is invalid.</summary>
    /// <param name="path">The network file.</param>
    /// <param name="context">Where warnings go.</param>
    /// <param name="overrides">What-if texts from <c>--set</c>, applied in order after reading (see <see cref="OverrideParser"/>).</param>
    /// <param name="forSimulation">True for <c>simulate</c>: warnings that the formulas ignore a key do not apply.</param>
    public static Network Load(string path, CliContext context, IReadOnlyList<string>? overrides = null, bool forSimulation = false)
    {
        var result = NetworkReader.ReadFile(path);
        var errors = result.Diagnostics.Where(d => d.IsError).ToList();
        if (errors.Count > 0)
        {
            throw new InputException(string.Join("\n", errors.Select(d => d.ToString())));
        }

        foreach (var warning in result.Diagnostics.Where(d => !forSimulation || d.Code != DiagnosticCodes.IgnoredByFormulas))
        {
            context.Report(warning.ToString());
        }

        return overrides is null || overrides.Count == 0
            ? result.Network!
            : ApplyOverrides(result.Network!, path, overrides, context);
    }

    /// <summary>Applies <c>--set</c> texts to <paramref name="network"/>; every bad text is reported, one line each.</summary>
    public static Network ApplyOverrides(Network network, string path, IReadOnlyList<string> overrides, CliContext context)
    {
        var changes = new List<NetworkChange>();
        var problems = new List<Diagnostic>();
        foreach (string text in overrides)
        {
            if (OverrideParser.Parse(text, network.TimeUnit, out var change) is Diagnostic problem)
            {
                problems.Add(problem);
            }
            else
            {
                changes.Add(change!);
            }
        }

        if (problems.Count == 0)
        {
            var edit = NetworkEditor.Apply(network, changes, new SourceLocation(path, 0, 0));
            problems.AddRange(edit.Diagnostics.Where(d => d.IsError));
            if (edit.Network is Network changed)
            {
                foreach (var warning in edit.Diagnostics)
                {
                    context.Report(warning.ToString());
                }

                // The name travels into every table, JSON document, map and report: say that these are what-if numbers.
                return changed with { Name = $"{changed.Name} (what-if: {string.Join(", ", overrides)})" };
            }
        }

        throw new InputException(string.Join("\n", problems.Select(d => d.ToString())));
    }
}
