using NetSolve.Parsing;

namespace NetSolve.Tests.Hardening;

/// <summary>A YAML tree written out with every position, quoting and value, so that two trees compare as text.</summary>
internal static class YamlTreeText
{
    public static string Of(YamlNode? node) => node switch
    {
        null => "null",
        YamlScalar scalar => $"S({scalar.Location},{scalar.Value},{scalar.IsPlain})",
        YamlMapping mapping => $"M({mapping.Location};" + string.Join(";", mapping.Entries.Select(e => Of(e.Key) + "=" + Of(e.Value))) + ")",
        YamlSequence sequence => $"Q({sequence.Location};" + string.Join(";", sequence.Items.Select(Of)) + ")",
        _ => throw new ArgumentOutOfRangeException(nameof(node)),
    };
}
