using System.Collections.Immutable;

namespace NetSolve.Fitting.Estimation;

/// <summary>
/// What an extract shows about one unit, as plain arrays: the input of <see cref="FitEvidence.Estimate"/>. Times in
/// hours; entry times in hours from the extract's start.
/// </summary>
/// <param name="UnitId">The unit.</param>
/// <param name="StayHours">
/// Per stay, the time holding a server (from start of service, or arrival, to leaving); for a censored stay, to the
/// extract's end. Finite and not negative.
/// </param>
/// <param name="Censored">Per stay, true when the patient was still in service at the extract's end (right-censored).</param>
/// <param name="AgeAtStartHours">
/// Per stay, the service time already spent when the extract began: 0 for a stay that began inside the extract, positive
/// for a stay already running (left-truncated: it is in the extract only because it lasted that long). Empty: all 0.
/// </param>
/// <param name="WaitHours">Observed waits for a server, one per stay that records its start of service; empty when the extract has none.</param>
/// <param name="EntryHours">When patients entered the hospital at this unit (their first stay), hours from the extract's start.</param>
/// <param name="Routes">Moves from this unit straight to another, counted per destination.</param>
/// <param name="Servers">Servers from a roster or bed count, or the estimate; null when unknown.</param>
/// <param name="NeverQueued">True when no patient waited here, so <paramref name="Servers"/> is only a lower bound.</param>
public sealed record UnitObservations(
    string UnitId,
    ImmutableArray<double> StayHours,
    ImmutableArray<bool> Censored,
    ImmutableArray<double> AgeAtStartHours,
    ImmutableArray<double> WaitHours,
    ImmutableArray<double> EntryHours,
    ImmutableArray<RouteCount> Routes,
    int? Servers = null,
    bool NeverQueued = false)
{
    /// <summary>Stays seen.</summary>
    public int Stays => StayHours.Length;

    /// <summary>The age at the extract's start of stay <paramref name="index"/>: 0 when none was given.</summary>
    public double AgeAtStart(int index) => AgeAtStartHours.IsDefaultOrEmpty ? 0.0 : AgeAtStartHours[index];

    /// <summary>What makes these observations inconsistent (arrays of different lengths, values no extract can give); null when nothing.</summary>
    public string? Problem()
    {
        if (string.IsNullOrEmpty(UnitId))
        {
            return "A unit id is needed.";
        }

        if (StayHours.IsDefault || Censored.IsDefault || WaitHours.IsDefault || EntryHours.IsDefault || Routes.IsDefault)
        {
            return "Every array of observations must be given (empty when there is nothing).";
        }

        if (Censored.Length != Stays || (!AgeAtStartHours.IsDefaultOrEmpty && AgeAtStartHours.Length != Stays))
        {
            return "Censoring flags and ages at the start go one per stay.";
        }

        for (int i = 0; i < Stays; i++)
        {
            if (!double.IsFinite(StayHours[i]) || StayHours[i] < 0.0 || !double.IsFinite(AgeAtStart(i)) || AgeAtStart(i) < 0.0 || AgeAtStart(i) > StayHours[i])
            {
                return "A stay is finite, not negative, and at least as long as its age at the extract's start.";
            }
        }

        return WaitHours.Any(wait => !double.IsFinite(wait) || wait < 0.0) || EntryHours.Any(entry => !double.IsFinite(entry))
            || Routes.Any(route => route.Count < 0) || Servers is < 1
            ? "Waits are finite and not negative, entry times finite, route counts not negative, servers at least 1."
            : null;
    }
}
