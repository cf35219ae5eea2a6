namespace NetSolve.Fitting.Estimation;

/// <summary>The confidence level and the thin-data limits behind every interval and warning of the fit evidence.</summary>
public static class EvidenceThresholds
{
    /// <summary>Every interval is a 95% interval: it misses the true value about one time in twenty by chance.</summary>
    public const double Confidence = 0.95;

    /// <summary>The standard normal quantile for a two-sided 95% interval, z(0.975).</summary>
    public const double NormalQuantile = 1.959963984540054;

    /// <summary>
    /// Fewer stays than this in a unit give a warning. Common practice: below about 30 observations the normal
    /// approximations behind the intervals and the choice between distributions are unreliable.
    /// </summary>
    public const int MinStays = 30;

    /// <summary>A route seen fewer times than this gives a warning: its fraction rests on a handful of patients.</summary>
    public const int MinRouteTransitions = 10;

    /// <summary>
    /// The lognormal replaces the exponential only when its AIC is lower by more than this. Models within 2 of the best
    /// have substantial support (Burnham and Anderson, Model Selection and Multimodel Inference, 2nd ed., 2002, p. 70),
    /// and then the simpler one, with one parameter and the Jackson formulas' own assumption, is kept.
    /// </summary>
    public const double AicMargin = 2.0;

    /// <summary>An hour-of-day profile needs at least this many whole days of extract.</summary>
    public const double MinDaysForHourProfile = 7.0;

    /// <summary>A day-of-week profile needs at least this many whole weeks of extract (each weekday seen 4 times).</summary>
    public const double MinWeeksForDayProfile = 4.0;

    /// <summary>A profile needs on average at least this many entries per slot (hour of day or day of week).</summary>
    public const double MinEntriesPerSlot = 10.0;

    /// <summary>
    /// A profile is written only when a Pearson chi-squared test rejects flat arrivals at this level: otherwise the
    /// shape in the data is within chance of a constant rate and a constant rate is written.
    /// </summary>
    public const double FlatnessTestLevel = 0.05;
}
