using NetSolve.Model;

namespace NetSolve.Fitting;

/// <summary>What a movement log shows about one unit. Times in hours.</summary>
/// <param name="Id">The unit id.</param>
/// <param name="Stays">Stays recorded (duplicates and stays outside the extract left out).</param>
/// <param name="EntriesPerHour">Journeys whose first stay is here, per hour of the extract: the external arrival rate.</param>
/// <param name="MeanServiceHours">Mean time holding a server from the chosen fit, allowing for stays still running or already running.</param>
/// <param name="ServiceCv">Coefficient of variation of that time (standard deviation / mean) from the chosen fit: 1 for the exponential.</param>
/// <param name="MeanWaitHours">Mean observed wait for a server; 0 when the log has no start-of-service times.</param>
/// <param name="PeakInService">Most patients in service at once: the estimate of servers, a lower bound when <paramref name="NeverQueued"/>.</param>
/// <param name="Label">The unit's name as the log spells it.</param>
/// <param name="CompletedStays">Stays that ended inside the extract: the events the mean stay rests on.</param>
/// <param name="StillRunning">Stays still running at the extract's end (censored).</param>
/// <param name="HasStartTimes">Whether the unit's stays record start of service; without it waits count as service.</param>
/// <param name="NeverQueued">Start times are recorded and no patient ever waited: the peak shows demand, not capacity.</param>
public sealed record FittedUnit(string Id, int Stays, double EntriesPerHour, double MeanServiceHours, double ServiceCv, double MeanWaitHours, int PeakInService,
    string Label, int CompletedStays, int StillRunning, bool HasStartTimes, bool NeverQueued)
{
    /// <summary>The service distribution written: lognormal where it fits the stays clearly better, otherwise exponential.</summary>
    public ServiceKind Distribution { get; init; } = ServiceKind.Exponential;

    /// <summary>Servers from the roster or bed count given to <c>fit</c>; null when the peak in service is used instead.</summary>
    public int? RosterServers { get; init; }
}
