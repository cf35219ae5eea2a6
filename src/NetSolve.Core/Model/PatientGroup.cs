using System.Collections.Immutable;

namespace NetSolve.Model;

/// <summary>
/// A patient group (for example elective or paediatric patients) with its own arrivals and, optionally, its own
/// routes, arrival profile and service times per unit. It shares the units and their servers with everyone else.
/// </summary>
/// <remarks>
/// Immutable. The network's top-level <c>arrivals</c> and <c>routes</c> form an implicit default group, so a v1 file
/// is a network with no groups. A group without routes of its own follows the network's routes.
/// </remarks>
/// <param name="Id">The group id from the file.</param>
/// <param name="Label">Display name; the id when the file gives none.</param>
/// <param name="Arrivals">External arrivals of this group, at most one per unit.</param>
public sealed record PatientGroup(string Id, string Label, ImmutableArray<Arrival> Arrivals)
{
    /// <summary>The group's own routes; null to follow the network's routes.</summary>
    public ImmutableArray<Route>? Routes { get; init; }

    /// <summary>The group's arrival profile; null to use the network's profile (or none).</summary>
    public ArrivalProfile? ArrivalProfile { get; init; }

    /// <summary>Service distributions that replace the unit's for this group, at most one per unit.</summary>
    public ImmutableArray<GroupService> Services { get; init; } = [];

    /// <summary>Total external arrivals of this group per hour (its mean over a week when a profile applies).</summary>
    public double ExternalArrivalsPerHour => Arrivals.Sum(arrival => arrival.PerHour);
}
