namespace NetSolve.Model;

/// <summary>The time unit a network file uses for bare numbers and for every reported time and rate.</summary>
public enum TimeUnit
{
    /// <summary>Minutes.</summary>
    Minute,

    /// <summary>Hours (the default, and the unit Core stores every time in).</summary>
    Hour,

    /// <summary>Days of 24 hours.</summary>
    Day,
}
