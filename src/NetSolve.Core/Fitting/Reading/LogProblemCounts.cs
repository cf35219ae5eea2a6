namespace NetSolve.Fitting.Reading;

/// <summary>
/// The messy rows a movement log held, each kind counted. None stops the fit unless <c>--strict</c> is given; the
/// rule applied to each is in docs/movement-log.md.
/// </summary>
public sealed record LogProblemCounts
{
    /// <summary>Rows identical to another row in every column: dropped.</summary>
    public long Duplicates { get; init; }

    /// <summary>Journeys after a patient's first: a gap between stays longer than the new-journey limit.</summary>
    public long Readmissions { get; init; }

    /// <summary>Stays that began before the patient's previous stay ended and outlast it: taken as a transfer.</summary>
    public long OverlappingStays { get; init; }

    /// <summary>Stays wholly inside another stay of the same patient: a side visit, kept out of the routing.</summary>
    public long NestedStays { get; init; }

    /// <summary>Stays of no length (left at arrival, or service of no length): kept, as a step shorter than the log's clock shows.</summary>
    public long ZeroDurations { get; init; }

    /// <summary>Stays whose times run backwards (left before arrival, service outside the stay): dropped.</summary>
    public long NegativeDurations { get; init; }

    /// <summary>Header columns the log has beyond patient, unit, arrived, started and left: ignored.</summary>
    public long UnknownColumns { get; init; }

    /// <summary>Rows that arrive before an earlier row of the same patient: read in time order regardless.</summary>
    public long RowsOutOfOrder { get; init; }

    /// <summary>Stays still running at the extract's end (empty <c>left</c>, or leaving after it): censored.</summary>
    public long StillRunningAtEnd { get; init; }

    /// <summary>Stays already running at the extract's start: only their time inside the extract is counted.</summary>
    public long RunningAtStart { get; init; }

    /// <summary>Stays wholly outside the extract (ended before its start or arrived after its end): dropped.</summary>
    public long OutsideExtract { get; init; }

    /// <summary>Local times in an hour a clock change repeated (taken as the earlier) or skipped (moved forward).</summary>
    public long ClockChangeTimes { get; init; }
}
