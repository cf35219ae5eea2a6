using NetSolve.Parsing;

namespace NetSolve.Tests.Hardening;

/// <summary>A YAML tree written out with every position, quoting and value, so that two trees compare as text.</summary>
internal static class YamlTreeText
{
    public static string Of(YamlNode? node) => node is YamlNode given ? Of(given) : "null";

    private static string Of(YamlNode node) => node.Kind switch
    {
        YamlNodeKind.Scalar => Of(node.AsScalar!.Value),
        YamlNodeKind.Mapping => $"M({node.Location};" + string.Join(";", node.AsMapping!.Value.Entries.Select(e => Of(e.Key) + "=" + Of(e.Value))) + ")",
        YamlNodeKind.Sequence => $"Q({node.Location};" + string.Join(";", node.AsSequence!.Value.Items.Select(Of)) + ")",
        _ => throw new ArgumentOutOfRangeException(nameof(node)),
    };

    private static string Of(YamlScalar scalar) => $"S({scalar.Location},{scalar.Value},{scalar.IsPlain})";

    /// <summary>A key, written as a scalar is, so that a key and a value with the same text and place read alike.</summary>
    private static string Of(YamlKey key) => $"S({key.Location},{key.Value},{key.IsPlain})";
}
