using NetSolve.Diagnostics;

namespace NetSolve.Parsing;

/// <summary>Where each unit and each unit's routes are written, for rules that run after parsing.</summary>
/// <param name="Units">Unit id to the location of its key under <c>units</c>.</param>
/// <param name="Routes">Unit id to the location of its key under <c>routes</c>, where it has routes.</param>
public sealed record NetworkLocations(
    IReadOnlyDictionary<string, SourceLocation> Units,
    IReadOnlyDictionary<string, SourceLocation> Routes)
{
    /// <summary>Group id to the location of its key under <c>groups</c>; empty without groups.</summary>
    public IReadOnlyDictionary<string, SourceLocation> Groups { get; init; } = new Dictionary<string, SourceLocation>(StringComparer.Ordinal);

    /// <summary>The best place to point at for a unit: its routes if it has any, else its definition.</summary>
    public SourceLocation For(string unitId) =>
        Routes.TryGetValue(unitId, out var routes) ? routes : Units[unitId];
}
