using NetSolve.Diagnostics;
using NetSolve.Parsing;

namespace NetSolve.Scenarios;

/// <summary>
/// Reads scenario files (a base network and its changes, see docs/scenarios.md). A file without a <c>base</c> key
/// is read as a network file, a scenario with no changes, so that commands comparing scenarios accept both.
/// </summary>
/// <remarks>Never throws for bad input: every problem is a located <see cref="Diagnostic"/>. Thread-safe.</remarks>
public static class ScenarioReader
{
    /// <summary>The word in <c>close_units</c> for patients who leave the network instead (not a valid unit id, so never ambiguous).</summary>
    public const string LeaveNetwork = "leave network";

    /// <summary>Reads the file at <paramref name="path"/>; a relative <c>base</c> is resolved against the file's folder.</summary>
    public static ScenarioReadResult ReadFile(string path)
    {
        ArgumentNullException.ThrowIfNull(path);
        if (InputFile.TryRead(path, "a scenario or network file", out var problem) is not string text)
        {
            return Failed(problem!.Location, problem.Code, problem.Message);
        }

        return ReadText(text, path, basePath => NetworkReader.ReadFile(ResolveBase(path, basePath)));
    }

    /// <summary>Reads scenario (or network) YAML from <paramref name="text"/>.</summary>
    /// <param name="text">The YAML.</param>
    /// <param name="fileName">Used in diagnostics and for the default name.</param>
    /// <param name="readBase">Reads the base network named by the <c>base</c> key, as written in the file.</param>
    public static ScenarioReadResult ReadText(string text, string fileName, Func<string, ReadResult> readBase)
    {
        ArgumentNullException.ThrowIfNull(text);
        ArgumentNullException.ThrowIfNull(fileName);
        ArgumentNullException.ThrowIfNull(readBase);
        YamlNode? root;
        try
        {
            root = LocatedYamlReader.Read(text, fileName);
        }
        catch (YamlReadException exception)
        {
            return Failed(exception.Location, DiagnosticCodes.NotYaml, exception.Message);
        }

        if (root?.AsMapping is YamlMapping mapping && mapping.Find("base") is null)
        {
            var network = NetworkReader.ReadTree(root, fileName);
            return network.Network is null
                ? new ScenarioReadResult(null, network.Diagnostics)
                : new ScenarioReadResult(
                    new Scenario(Path.GetFileNameWithoutExtension(fileName), fileName, network.Network, [], network.Network),
                    network.Diagnostics);
        }

        if (root is not YamlNode top || top.IsNullScalar)
        {
            return Failed(new SourceLocation(fileName, 1, 1), DiagnosticCodes.Empty, "the file is empty; a scenario file needs 'base' and its changes");
        }

        return new ScenarioFileParser(fileName, readBase).Parse(top);
    }

    /// <summary>The base path as the program opens it: relative paths are taken from the scenario file's folder.</summary>
    public static string ResolveBase(string scenarioPath, string basePath)
    {
        ArgumentNullException.ThrowIfNull(scenarioPath);
        ArgumentNullException.ThrowIfNull(basePath);
        return Path.IsPathRooted(basePath) ? basePath : Path.Combine(Path.GetDirectoryName(scenarioPath) ?? string.Empty, basePath);
    }

    private static ScenarioReadResult Failed(SourceLocation location, string code, string message) =>
        new(null, [Diagnostic.Error(code, location, null, message)]);
}
