using System.Collections.Immutable;
using System.Runtime.CompilerServices;
using System.Runtime.InteropServices;

namespace NetSolve.Model;

/// <summary>A validated hospital network: units in file order, external arrivals and routing fractions.</summary>
/// <remarks>
/// Immutable; a what-if is <c>network with { Units = ... }</c>. Times are stored in hours and rates per hour;
/// <see cref="TimeUnit"/> only says how to report them. The parser guarantees that ids are unique, that every
/// id in <see cref="Arrivals"/> and <see cref="Routes"/> names a unit, and that routes out of a unit sum to at most 1.
/// </remarks>
/// <param name="Name">Shown in outputs.</param>
/// <param name="TimeUnit">The unit for reported times and rates.</param>
/// <param name="Units">Units in file order.</param>
/// <param name="Arrivals">External arrival streams, at most one per unit.</param>
/// <param name="Routes">Routing fractions, at most one per (from, to) pair.</param>
public sealed record Network(
    string Name,
    TimeUnit TimeUnit,
    ImmutableArray<Unit> Units,
    ImmutableArray<Arrival> Arrivals,
    ImmutableArray<Route> Routes)
{
    /// <summary>How the top-level arrivals vary by hour and day; null for a constant rate (the v1 meaning).</summary>
    public ArrivalProfile? ArrivalProfile { get; init; }

    /// <summary>Patient groups beside the default group formed by <see cref="Arrivals"/> and <see cref="Routes"/>; empty in v1.</summary>
    public ImmutableArray<PatientGroup> Groups { get; init; } = [];

    /// <summary>Named sets of units whose time per patient is reported as a whole (docs/network-file.md, "Journeys"); empty when the file has none.</summary>
    public ImmutableArray<Journey> Journeys { get; init; } = [];

    /// <summary>Total external arrivals per hour of the default group (the v1 arrivals).</summary>
    public double ExternalArrivalsPerHour => Arrivals.Sum(arrival => arrival.PerHour);

    /// <summary>Total external arrivals per hour of the default group and every patient group.</summary>
    public double AllExternalArrivalsPerHour => ExternalArrivalsPerHour + Groups.Sum(group => group.ExternalArrivalsPerHour);

    // One index per list of units, shared by every caller that reads the same list: a 100,000-unit solve asked for
    // it four times or more (rules, routing, inputs, loops, journeys). Keyed by the units' array, so a network made with
    // `with { Units = ... }` gets its own, and no field is added to the record's equality.
    private static readonly ConditionalWeakTable<Unit[], IReadOnlyDictionary<string, int>> Indexes = new();

    /// <summary>Maps each unit id to its position in <see cref="Units"/>; built once per list of units and shared (read only).</summary>
    public IReadOnlyDictionary<string, int> BuildIndex()
    {
        var units = ImmutableCollectionsMarshal.AsArray(Units);
        return units is null ? Index([]) : Indexes.GetValue(units, Index);
    }

    private static Dictionary<string, int> Index(Unit[] units)
    {
        var index = new Dictionary<string, int>(units.Length, StringComparer.Ordinal);
        for (int i = 0; i < units.Length; i++)
        {
            index[units[i].Id] = i;
        }

        return index;
    }
}
