namespace NetSolve.Model;

/// <summary>The kinds of unit target, in the order outputs list breached ones.</summary>
public enum TargetKind
{
    /// <summary>Mean wait before service (<c>mean_wait</c>).</summary>
    MeanWait,

    /// <summary>Mean time in the unit, wait plus service (<c>mean_time_in_unit</c>).</summary>
    MeanTimeInUnit,

    /// <summary>Share of patients waiting longer than a time (<c>wait_over</c>).</summary>
    WaitOver,

    /// <summary>Share of arrivals finding the unit full (<c>turned_away</c>).</summary>
    TurnedAway,
}
