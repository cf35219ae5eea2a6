using System.Globalization;
using NetSolve.Diagnostics;
using NetSolve.Model;
using NetSolve.Parsing.Values;

namespace NetSolve.Parsing;

/// <summary>
/// What every parser of located YAML needs: fields checked against known keys with a nearest-key hint,
/// duplicate keys reported, values checked for shape and form, each problem collected as a diagnostic.
/// </summary>
/// <param name="diagnostics">Where problems are collected.</param>
internal abstract class NodeParser(List<Diagnostic> diagnostics)
{
    /// <summary>Every problem found so far, in the order found.</summary>
    protected List<Diagnostic> Diagnostics { get; } = diagnostics;

    // Most mappings (a unit's fields, its routes) hold a handful of keys: a linear scan finds duplicates there
    // without a dictionary per mapping, which matters for 100,000-unit files.
    internal const int ScanLimit = 16;

    protected Dictionary<string, YamlNode> Fields(YamlMapping mapping, string[] knownKeys, string? unitId)
    {
        var fields = new Dictionary<string, YamlNode>(StringComparer.Ordinal);
        foreach (var (key, value) in UniqueEntries(mapping, unitId))
        {
            if (KnownKey(key, knownKeys, unitId) is int index and >= 0)
            {
                fields[knownKeys[index]] = value;
            }
        }

        return fields;
    }

    /// <summary>The node under <paramref name="key"/> in fields read by <see cref="Fields"/>; null when the key is not there.</summary>
    protected static YamlNode? Field(Dictionary<string, YamlNode> fields, string key) =>
        fields.TryGetValue(key, out var node) ? node : null;

    /// <summary>
    /// The same checks and messages as <see cref="Fields"/>, with the fields left where they are in the mapping:
    /// for the mappings a file has one of per unit.
    /// </summary>
    protected FieldValues KnownFields(YamlMapping mapping, string[] knownKeys, string? unitId)
    {
        var entries = mapping.Entries;
        long present = 0;
        if (entries.Count > ScanLimit)
        {
            foreach (var (key, _) in UniqueEntries(mapping, unitId))
            {
                present |= KnownKey(key, knownKeys, unitId) is int index and >= 0 ? 1L << index : 0;
            }

            return new FieldValues(mapping, knownKeys, present);
        }

        foreach (var (key, _) in entries)
        {
            if (FirstOccurrence(entries, key, null) is SourceLocation first)
            {
                ReportDuplicate(key, first, unitId);
            }
            else if (KnownKey(key, knownKeys, unitId) is int index and >= 0)
            {
                present |= 1L << index;
            }
        }

        return new FieldValues(mapping, knownKeys, present);
    }

    /// <summary>Where the key's text is in <paramref name="knownKeys"/>; otherwise -1, after reporting the key with the nearest known key.</summary>
    private int KnownKey(YamlKey key, string[] knownKeys, string? unitId)
    {
        if (IndexOf(knownKeys, key.Text) is int index and >= 0)
        {
            return index;
        }

        string text = key.Value;
        string hint = NearestName.Suggest(text, knownKeys) is string best
            ? $"; did you mean '{best}'?"
            : $" (known keys: {string.Join(", ", knownKeys)})";
        Error(key.Location, unitId, DiagnosticCodes.UnknownKey, $"unknown key '{text}'{hint}");
        return -1;
    }

    /// <summary>Where <paramref name="text"/> is in <paramref name="names"/>; -1 when it is not.</summary>
    internal static int IndexOf(string[] names, ReadOnlySpan<char> text)
    {
        for (int i = 0; i < names.Length; i++)
        {
            if (text.SequenceEqual(names[i]))
            {
                return i;
            }
        }

        return -1;
    }

    internal void ReportDuplicate(YamlKey key, SourceLocation first, string? unitId) =>
        Error(key.Location, unitId, DiagnosticCodes.DuplicateKey, string.Create(CultureInfo.InvariantCulture,
            $"duplicate key '{key.Value}' (first at line {first.Line})"));

    /// <summary>The entries of <paramref name="mapping"/> with a key not seen before in it; repeats are reported.</summary>
    protected UniqueEntryList UniqueEntries(YamlMapping mapping, string? unitId) => new(this, mapping, unitId);

    /// <summary>
    /// Where <paramref name="key"/> of <paramref name="entries"/> first appeared, when it appeared before: looked up
    /// in <paramref name="seen"/> (the earlier keys' places) when given, else by a scan of the earlier keys.
    /// </summary>
    internal static SourceLocation? FirstOccurrence(YamlEntries entries, YamlKey key, HashSet<int>? seen)
    {
        if (seen is not null)
        {
            return seen.TryGetValue(key.Index, out int earlier) ? entries.Tree.Location(earlier) : null;
        }

        int first = entries.Tree.EarlierKey(entries.FirstKey, key.Index);
        return first >= 0 ? entries.Tree.Location(first) : null;
    }

    /// <summary>
    /// Reads the scalar <paramref name="node"/> with <paramref name="parse"/>; on a mistake reports the value kind's
    /// message for the field <c>label 'labelUnit'</c> (<see cref="FieldLabels.For"/>) and returns null.
    /// </summary>
    /// <remarks>The field name is built only on a mistake: a 100,000-unit file has hundreds of thousands of routes.</remarks>
    protected T? Value<T>(YamlNode node, string? unitId, string label, Func<ReadOnlySpan<char>, ValueResult<T>> parse, string? labelUnit = null)
        where T : struct
    {
        if (node.AsScalar is not YamlScalar { IsNull: false } scalar)
        {
            Scalar(node, unitId, FieldLabels.For(label, labelUnit));
            return null;
        }

        var result = parse(scalar.Text);
        if (!result.IsValid)
        {
            Error(scalar.Location, unitId, DiagnosticCodes.BadValue, result.MessageFor(FieldLabels.For(label, labelUnit)));
            return null;
        }

        return result.Value;
    }

    /// <summary>Reads a unit's servers: a plain (unquoted) <see cref="ServersValue"/>; null after reporting a mistake.</summary>
    /// <remarks>The parser is chosen before the call, not inside a lambda over the node: no closure per unit.</remarks>
    protected Servers? ServersField(YamlNode node, string unitId) => node.AsScalar is { IsPlain: false }
        ? Value(node, unitId, FieldLabels.Servers, ServersValue.Quoted)
        : Value(node, unitId, FieldLabels.Servers, ServersValue.Parse);

    protected YamlScalar? Scalar(YamlNode node, string? unitId, string what)
    {
        if (node.AsScalar is YamlScalar scalar && !scalar.IsNull)
        {
            return scalar;
        }

        Error(node.Location, unitId, DiagnosticCodes.WrongShape, node.Kind == YamlNodeKind.Scalar ? $"{what} has no value" : $"{what} must be a single value, not a list or mapping");
        return null;
    }

    protected YamlMapping? Mapping(YamlNode node, string? unitId, string what)
    {
        if (node.AsMapping is YamlMapping mapping)
        {
            return mapping;
        }

        Error(node.Location, unitId, DiagnosticCodes.WrongShape, $"{what} must be a mapping of keys to values");
        return null;
    }

    protected void Error(SourceLocation location, string? unitId, string code, string message) =>
        Diagnostics.Add(Diagnostic.Error(code, location, unitId, message));

    protected void Warning(SourceLocation location, string? unitId, string code, string message) =>
        Diagnostics.Add(Diagnostic.Warning(code, location, unitId, message));
}
