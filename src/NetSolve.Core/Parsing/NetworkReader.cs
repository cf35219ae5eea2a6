using System.Collections.Immutable;
using NetSolve.Diagnostics;

namespace NetSolve.Parsing;

/// <summary>Reads network files (see the network file contract) into a validated <see cref="Model.Network"/>.</summary>
/// <remarks>Never throws for bad input: every problem is a <see cref="Diagnostic"/>. Thread-safe.</remarks>
public static class NetworkReader
{
    /// <summary>Reads the file at <paramref name="path"/>; the path is shown in diagnostics as given.</summary>
    public static ReadResult ReadFile(string path)
    {
        ArgumentNullException.ThrowIfNull(path);
        if (InputFile.TryRead(path, "a network file", out var problem) is not string text)
        {
            return new ReadResult(null, [problem!]);
        }

        return ReadText(text, path);
    }

    /// <summary>Reads network YAML from <paramref name="text"/>; <paramref name="fileName"/> is used in diagnostics.</summary>
    public static ReadResult ReadText(string text, string fileName)
    {
        ArgumentNullException.ThrowIfNull(text);
        ArgumentNullException.ThrowIfNull(fileName);
        YamlNode? root;
        try
        {
            root = LocatedYamlReader.Read(text, fileName);
        }
        catch (YamlReadException exception)
        {
            return Failed(exception.Location, DiagnosticCodes.NotYaml, exception.Message);
        }

        return ReadTree(root, fileName);
    }

    /// <summary>
    /// Reads a network from the YAML tree of a file already read with <see cref="LocatedYamlReader.Read"/>: a caller that
    /// looked at the tree first (is it a scenario?) need not read a 100,000-unit file twice.
    /// </summary>
    public static ReadResult ReadTree(YamlNode? root, string fileName)
    {
        ArgumentNullException.ThrowIfNull(fileName);
        if (root is not YamlNode top || top.IsNullScalar)
        {
            return Failed(new SourceLocation(fileName, 1, 1), DiagnosticCodes.Empty, "the file is empty; a network file needs 'units' and 'arrivals'");
        }

        var diagnostics = new List<Diagnostic>();
        var network = new NetworkFileParser(fileName, diagnostics).Parse(top);
        if (network is not null && !diagnostics.Any(d => d.IsError))
        {
            StructureRules.Check(network.Value.Network, network.Value.Locations, diagnostics);
            BareNumbers.Check(top, network.Value.Network.TimeUnit, diagnostics);
        }

        var sorted = diagnostics
            .OrderBy(d => d.Location.Line)
            .ThenBy(d => d.Location.Column)
            .ToImmutableArray();
        bool failed = sorted.Any(d => d.IsError);
        return new ReadResult(failed ? null : network?.Network, sorted);
    }

    private static ReadResult Failed(SourceLocation location, string code, string message) =>
        new(null, [Diagnostic.Error(code, location, null, message)]);
}
