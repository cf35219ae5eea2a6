namespace NetSolve.Presentation;

/// <summary>The planning caution every report carries: staffing and capacity advice can hurt patients if misread.</summary>
public static class Caution
{
    /// <summary>The caution, one paragraph.</summary>
    public const string Text =
        "Caution: these are planning estimates under stated assumptions (steady state; each unit's method, exact for "
        + "Poisson arrivals and exponential service and approximate otherwise; independent routing; first come first served). Decisions on beds and staffing follow local clinical "
        + "governance and safe-staffing rules.";

    /// <summary>
    /// The caution under an hour-by-hour result (a roster): it claims no steady state, since each hour comes from the
    /// time-varying queue over a repeating day.
    /// </summary>
    public const string HourByHour =
        "Caution: these are planning estimates under stated assumptions (arrival rates varying by hour of day, and by day of "
        + "week where the file's profile gives it, the same every cycle; each hour from the time-varying queue, exact for Poisson arrivals and exponential "
        + "service and approximate otherwise; independent routing; first come first served). Decisions on beds and staffing "
        + "follow local clinical governance and safe-staffing rules.";
}
