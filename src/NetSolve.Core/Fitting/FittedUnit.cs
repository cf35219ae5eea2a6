namespace NetSolve.Fitting;

/// <summary>What a movement log shows about one unit. Times in hours.</summary>
/// <param name="Id">The unit id.</param>
/// <param name="Stays">Stays recorded.</param>
/// <param name="EntriesPerHour">Patients whose first recorded stay is here, per hour: the external arrival rate.</param>
/// <param name="MeanServiceHours">Mean time holding a server.</param>
/// <param name="ServiceCv">Coefficient of variation of that time (standard deviation / mean).</param>
/// <param name="MeanWaitHours">Mean observed wait for a server; 0 when the log has no start-of-service times.</param>
/// <param name="PeakInService">Most patients in service at once: the estimate of servers.</param>
public sealed record FittedUnit(string Id, int Stays, double EntriesPerHour, double MeanServiceHours, double ServiceCv, double MeanWaitHours, int PeakInService);
