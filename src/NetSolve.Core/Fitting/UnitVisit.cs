namespace NetSolve.Fitting;

/// <summary>One stay of one patient in one unit, read from a movement log. Times in hours from the log's start.</summary>
/// <param name="Patient">The patient's pseudonymous id.</param>
/// <param name="UnitId">The unit visited.</param>
/// <param name="ArrivedHours">When the patient reached the unit.</param>
/// <param name="StartedHours">When service began (a bed, cubicle or clinician taken); null if the log does not say.</param>
/// <param name="LeftHours">When the patient left the unit.</param>
/// <param name="Line">The log line, for diagnostics.</param>
public sealed record UnitVisit(string Patient, string UnitId, double ArrivedHours, double? StartedHours, double LeftHours, int Line)
{
    /// <summary>Time holding a server: from start of service (or arrival) to leaving.</summary>
    public double ServiceHours => LeftHours - (StartedHours ?? ArrivedHours);

    /// <summary>Time waiting for a server; 0 when the log has no start of service.</summary>
    public double WaitHours => (StartedHours ?? ArrivedHours) - ArrivedHours;
}
