namespace NetSolve.Parsing;

/// <summary>
/// The known fields of a mapping, looked up where they stand in the mapping instead of copied into a dictionary:
/// a 100,000-unit file would otherwise build 100,000 dictionaries of three or four keys each.
/// </summary>
/// <remarks>
/// A key answers with its first occurrence, as the reader's checks keep the first and report later duplicates;
/// a key outside <paramref name="KnownKeys"/> is never found, as unknown keys are reported and left out.
/// </remarks>
/// <param name="Mapping">The mapping the fields are in.</param>
/// <param name="KnownKeys">The keys this kind of mapping may have.</param>
/// <param name="Present">Bit i set when the mapping holds <c>KnownKeys[i]</c>: most of a unit's possible keys are absent, and are answered without a look at the mapping.</param>
internal readonly record struct FieldValues(YamlMapping Mapping, string[] KnownKeys, long Present)
{
    public bool TryGetValue(string key, out YamlNode value)
    {
        value = default;
        int index = Array.IndexOf(KnownKeys, key);
        if (index < 0 || (Present & (1L << index)) == 0)
        {
            return false;
        }

        foreach (var (entryKey, entryValue) in Mapping.Entries)
        {
            if (entryKey.Is(key))
            {
                value = entryValue;
                return true;
            }
        }

        return false;
    }

    public YamlNode? GetValueOrDefault(string key) => TryGetValue(key, out var value) ? value : null;

    public bool ContainsKey(string key) => TryGetValue(key, out _);
}
