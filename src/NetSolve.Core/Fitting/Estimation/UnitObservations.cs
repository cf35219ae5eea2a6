using System.Collections.Immutable;

namespace NetSolve.Fitting.Estimation;

/// <summary>
/// What an extract shows about one unit: the input of <see cref="FitEvidence.Estimate"/>. Times in hours; entry times
/// in hours from the extract's start.
/// </summary>
/// <param name="UnitId">The unit.</param>
/// <param name="Stays">
/// The stays, grouped by length and age at the extract's start: the time holding a server (from start of service, or
/// arrival, to leaving; for a stay still running, to the extract's end, where it is right-censored), and the service
/// time already spent when the extract began (positive for a stay already running then: left-truncated).
/// </param>
/// <param name="WaitHours">Observed waits for a server, one per stay that records its start of service; empty when the extract has none.</param>
/// <param name="EntryHours">When patients entered the hospital at this unit (their first stay), hours from the extract's start.</param>
/// <param name="Routes">Moves from this unit straight to another, counted per destination.</param>
/// <param name="Servers">Servers from a roster or bed count, or the estimate; null when unknown.</param>
/// <param name="NeverQueued">True when no patient waited here, so <paramref name="Servers"/> is only a lower bound.</param>
/// <param name="Departures">
/// Stays that ended inside the extract with a known next step, a move or leaving the hospital: the denominator of the
/// routing fractions. A side visit (inside another stay of the patient) is no departure. Null: every ended stay.
/// </param>
public sealed record UnitObservations(
    string UnitId,
    StayGroups Stays,
    ImmutableArray<double> WaitHours,
    ImmutableArray<double> EntryHours,
    ImmutableArray<RouteCount> Routes,
    int? Servers = null,
    bool NeverQueued = false,
    int? Departures = null)
{
    /// <summary>The observations with the stays given one by one: lengths, censoring flags, and ages at the start (empty: all 0).</summary>
    /// <exception cref="ArgumentException">The stays' arrays differ in length, or hold a value no extract can give.</exception>
    public UnitObservations(
        string unitId,
        ImmutableArray<double> stayHours,
        ImmutableArray<bool> censored,
        ImmutableArray<double> ageAtStartHours,
        ImmutableArray<double> waitHours,
        ImmutableArray<double> entryHours,
        ImmutableArray<RouteCount> routes,
        int? servers = null,
        bool neverQueued = false)
        : this(unitId, StayGroups.Of(stayHours.AsSpan(), censored.AsSpan(), ageAtStartHours.IsDefault ? [] : ageAtStartHours.AsSpan()),
            waitHours, entryHours, routes, servers, neverQueued)
    {
    }

    /// <summary>The routing fractions' denominator: <see cref="Departures"/>, or every ended stay.</summary>
    public int RoutedStays => Departures ?? Stays.EndedStays;

    /// <summary>What makes these observations inconsistent (values no extract can give); null when nothing.</summary>
    public string? Problem()
    {
        if (string.IsNullOrEmpty(UnitId))
        {
            return "A unit id is needed.";
        }

        if (Stays is null || WaitHours.IsDefault || EntryHours.IsDefault || Routes.IsDefault)
        {
            return "Every array of observations must be given (empty when there is nothing).";
        }

        if (Stays.Problem() is string problem)
        {
            return problem;
        }

        if (Departures is int departures && (departures < 0 || departures > Stays.EndedStays || Routes.Sum(route => route.Count) > departures))
        {
            return "Departures are at most the ended stays and at least the moves counted.";
        }

        return WaitHours.Any(wait => !double.IsFinite(wait) || wait < 0.0) || EntryHours.Any(entry => !double.IsFinite(entry))
            || Routes.Any(route => route.Count < 0) || Servers is < 1
            ? "Waits are finite and not negative, entry times finite, route counts not negative, servers at least 1."
            : null;
    }
}
