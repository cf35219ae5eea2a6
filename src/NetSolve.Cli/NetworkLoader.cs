using System.Collections.Immutable;
using NetSolve.Diagnostics;
using NetSolve.Model;
using NetSolve.Parsing;
using NetSolve.Presentation.Scenarios;
using NetSolve.Scenarios;

namespace NetSolve.Cli;

/// <summary>
/// Reads the network a command works on: a network file, or a scenario file (its base network with its changes),
/// then the <c>--set</c> changes. Warnings go to stderr; errors are an <see cref="InputException"/>, one line each.
/// </summary>
internal static class NetworkLoader
{
    /// <summary>What a FILE argument may be, as named when it is neither (a folder, say).</summary>
    public const string FileKind = Messages.NetworkOrScenarioFile;

    /// <summary>
    /// The network with the list of changes that made it (the scenario file's, then the <c>--set</c> ones, in
    /// planner's words from <see cref="ChangeWords"/>, for the outputs' headers), or an <see cref="InputException"/>
    /// carrying every diagnostic when a file is invalid.
    /// </summary>
    /// <param name="path">The network or scenario file.</param>
    /// <param name="warnings">Where warnings go.</param>
    /// <param name="overrides">What-if texts from <c>--set</c>, applied in order after reading (see <see cref="OverrideParser"/>).</param>
    /// <param name="forSimulation">True for <c>simulate</c>: warnings that the formulas ignore a key do not apply.</param>
    public static LoadedNetwork Read(string path, WarningLog warnings, IReadOnlyList<string>? overrides = null, bool forSimulation = false)
    {
        ArgumentNullException.ThrowIfNull(warnings);
        if (InputFile.TryRead(path, FileKind, out var problem) is not string text)
        {
            throw new InputException(problem!.ToString());
        }

        var (network, scenarioChanges, diagnostics) = ReadNetworkOrScenario(text, path);
        var errors = diagnostics.Where(d => d.IsError).ToList();
        if (errors.Count > 0)
        {
            throw new InputException(string.Join("\n", errors.Select(d => d.ToString())));
        }

        warnings.ReportAll(diagnostics.Where(d => !forSimulation || d.Code != DiagnosticCodes.IgnoredByFormulas), path);

        if (overrides is null || overrides.Count == 0)
        {
            return new LoadedNetwork(network!, scenarioChanges);
        }

        var changed = ApplyOverrides(network!, path, overrides, warnings, out var setChanges);
        return new LoadedNetwork(changed, scenarioChanges.AddRange(ChangeWords.Describe(setChanges, network!.TimeUnit)));
    }

    /// <summary>Applies <c>--set</c> texts to <paramref name="network"/>; every bad text is reported, one line each.</summary>
    public static Network ApplyOverrides(Network network, string path, IReadOnlyList<string> overrides, WarningLog warnings) =>
        ApplyOverrides(network, path, overrides, warnings, out _);

    /// <summary>As the other overload, also giving the parsed changes in the order they applied.</summary>
    private static Network ApplyOverrides(Network network, string path, IReadOnlyList<string> overrides, WarningLog warnings, out IReadOnlyList<NetworkChange> applied)
    {
        ArgumentNullException.ThrowIfNull(network);
        ArgumentNullException.ThrowIfNull(overrides);
        ArgumentNullException.ThrowIfNull(warnings);
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
                    warnings.Report(warning.ToString());
                }

                applied = changes;

                // The name travels into every table, JSON document, map and report: say that these are what-if numbers.
                return changed with { Name = Messages.WhatIfName(changed.Name, overrides) };
            }
        }

        throw new InputException(string.Join("\n", problems.Select(d => d.ToString())));
    }

    /// <summary>
    /// Reads the YAML once: a mapping with a <c>base</c> key (a network file never has one) is a scenario file,
    /// anything else is read as a network file from the same tree.
    /// </summary>
    private static (Network? Network, ImmutableArray<string> Changes, IReadOnlyList<Diagnostic> Diagnostics) ReadNetworkOrScenario(string text, string path)
    {
        YamlNode? root;
        try
        {
            root = LocatedYamlReader.Read(text, path);
        }
        catch (YamlReadException)
        {
            // Not YAML: the network reader says where, as for any network file.
            return FromNetworkFile(NetworkReader.ReadText(text, path));
        }

        return root?.AsMapping is YamlMapping mapping && mapping.Find("base") is not null
            ? ReadScenario(text, path)
            : FromNetworkFile(NetworkReader.ReadTree(root, path));
    }

    private static (Network? Network, ImmutableArray<string> Changes, IReadOnlyList<Diagnostic> Diagnostics) FromNetworkFile(ReadResult result) =>
        (result.Network, [], result.Diagnostics);

    private static (Network? Network, ImmutableArray<string> Changes, IReadOnlyList<Diagnostic> Diagnostics) ReadScenario(string text, string path)
    {
        var result = ScenarioReader.ReadText(text, path, basePath => NetworkReader.ReadFile(ScenarioReader.ResolveBase(path, basePath)));

        // The name travels into every output, as a what-if's does: say which scenario the numbers are for.
        var network = result.Scenario is Scenario scenario ? scenario.Network with { Name = Messages.ScenarioName(scenario.Network.Name, scenario.Name) } : null;
        var changes = result.Scenario is Scenario read ? ChangeWords.Describe(read.Changes, read.Network.TimeUnit) : [];
        return (network, changes, result.Diagnostics);
    }
}
