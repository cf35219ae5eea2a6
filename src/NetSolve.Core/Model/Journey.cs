using System.Collections.Immutable;

namespace NetSolve.Model;

/// <summary>
/// A named set of units whose time per patient is asked as a whole, for example an emergency department with its
/// laboratory, imaging and return for review (the 4-hour question).
/// </summary>
/// <remarks>
/// Immutable. A patient's journey starts when they arrive at a unit of the set while not already inside it and ends
/// when they leave the set: after service at a unit of the set they go on to a unit outside it, or leave the network,
/// or are turned away. A patient who comes back into the set later starts a new journey (docs/network-file.md,
/// "Journeys"). The parser guarantees at least one unit, each named once and defined in <c>units</c>.
/// </remarks>
/// <param name="Id">The journey's name in the file.</param>
/// <param name="Label">Display name; the id when the file gives none.</param>
/// <param name="UnitIds">The units of the set, in the order written.</param>
/// <param name="OverHours">The times t, in hours and in the order written, for which P(journey time &gt; t) is reported.</param>
public sealed record Journey(string Id, string Label, ImmutableArray<string> UnitIds, ImmutableArray<double> OverHours)
{
    /// <summary>True when <paramref name="unitId"/> is one of the set's units.</summary>
    public bool Contains(string unitId) => UnitIds.Contains(unitId, StringComparer.Ordinal);
}
