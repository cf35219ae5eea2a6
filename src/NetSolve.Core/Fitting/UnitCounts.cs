namespace NetSolve.Fitting;

/// <summary>
/// What the log shows about one unit, as whole milliseconds and counts: sums of whole numbers do not depend on the
/// order they are added in, so the fit is the same byte for byte whatever the order of the rows.
/// </summary>
internal sealed class UnitCounts
{
    /// <summary>Stays kept.</summary>
    public int Stays { get; set; }

    /// <summary>Stays that ended inside the extract.</summary>
    public int Completed { get; set; }

    /// <summary>Stays still running at the extract's end.</summary>
    public int StillRunning { get; set; }

    /// <summary>Stays whose end is known and which are not side visits: the denominator of routing fractions.</summary>
    public int Routed { get; set; }

    /// <summary>Journeys entering the hospital here inside the extract.</summary>
    public int Entries { get; set; }

    /// <summary>Service time observed inside the extract, over all stays (completed or not).</summary>
    public long ObservedServiceMs { get; set; }

    /// <summary>Completed stays observed from their start (not already running when the extract began).</summary>
    public int WholeStays { get; set; }

    /// <summary>Sum of the service times of the whole stays.</summary>
    public long WholeServiceMs { get; set; }

    /// <summary>Sum of the squares of the service times of the whole stays.</summary>
    public Int128 WholeServiceSquaresMs { get; set; }

    /// <summary>Stays with a recorded start of service.</summary>
    public int Timed { get; set; }

    /// <summary>Timed stays that waited (service began after arrival).</summary>
    public int Waited { get; set; }

    /// <summary>Sum of waits over the timed stays.</summary>
    public long WaitMs { get; set; }

    /// <summary>Most stays in service at once.</summary>
    public int PeakInService { get; set; }
}
