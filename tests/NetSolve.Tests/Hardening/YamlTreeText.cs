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

    /// <summary>A key, written as a scalar is, so that a key and a value with the same text and place read alike.</summary>
    private static string Of(YamlKey key) => $"S({key.Location},{key.Value},{key.IsPlain})";
}
