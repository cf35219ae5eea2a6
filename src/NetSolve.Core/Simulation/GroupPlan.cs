namespace NetSolve.Simulation;

/// <summary>One patient group compiled to arrays: where its patients arrive, how fast, and where they go next.</summary>
/// <remarks>Immutable after construction and shared by all replications. Cumulative probabilities restart at 0 on each row.</remarks>
internal sealed class GroupPlan
{
    /// <summary>Mean external arrivals per hour.</summary>
    public required double ArrivalsPerHour { get; init; }

    /// <summary>Rate of candidate arrivals for thinning: mean rate × the profile's largest multiplier.</summary>
    public required double CandidatesPerHour { get; init; }

    /// <summary>The profile's largest multiplier (1 without a profile).</summary>
    public required double MaxMultiplier { get; init; }

    /// <summary>24 hour-of-day multipliers, or null for a constant rate.</summary>
    public required double[]? HourOfDay { get; init; }

    /// <summary>7 day-of-week multipliers, or null.</summary>
    public required double[]? DayOfWeek { get; init; }

    /// <summary>Units where the group's patients arrive from outside.</summary>
    public required int[] EntryUnits { get; init; }

    /// <summary>Picks the place in <see cref="EntryUnits"/> of each arriving patient, by the units' shares of the arrivals.</summary>
    public required AliasTable EntryPick { get; init; }

    /// <summary>Row starts of the routes out of each unit (length units + 1).</summary>
    public required int[] RouteOffsets { get; init; }

    /// <summary>
    /// The routes, row by row: each with its cumulative probability within its row (a draw above the last leaves the
    /// network) beside its destination, so choosing a route reads one array.
    /// </summary>
    public required RouteChoice[] Routes { get; init; }

    /// <summary>The arrival-rate multiplier in force at <paramref name="hours"/> after Monday 00:00.</summary>
    public double MultiplierAt(double hours)
    {
        if (HourOfDay is null)
        {
            return 1.0;
        }

        long wholeHours = (long)hours;
        double multiplier = HourOfDay[(int)(wholeHours % 24)];
        return DayOfWeek is null ? multiplier : multiplier * DayOfWeek[(int)(wholeHours / 24 % 7)];
    }
}
