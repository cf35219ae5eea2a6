namespace NetSolve.Fitting.Reading;

/// <summary>Gathers the counts of messy rows found while reading and while building journeys.</summary>
internal static class LogProblems
{
    /// <summary>The counts, with the stays still running at either end of the extract counted over the stays kept.</summary>
    public static LogProblemCounts Count(LogRowReader rows, JourneyBuilder journeys, long extractStartMs)
    {
        long stillRunning = 0;
        long runningAtStart = 0;
        foreach (int index in journeys.Order)
        {
            ref readonly var row = ref rows.Rows[index];
            stillRunning += journeys.EndOf(row) == long.MaxValue ? 1 : 0;
            runningAtStart += row.ServiceStartMs < extractStartMs ? 1 : 0;
        }

        return new LogProblemCounts
        {
            Duplicates = journeys.Duplicates,
            Readmissions = journeys.Readmissions,
            OverlappingStays = journeys.Overlapping,
            NestedStays = journeys.Nested,
            ZeroDurations = rows.ZeroDurations,
            NegativeDurations = rows.NegativeDurations,
            UnknownColumns = rows.UnknownColumns,
            RowsOutOfOrder = journeys.RowsOutOfOrder,
            StillRunningAtEnd = stillRunning,
            RunningAtStart = runningAtStart,
            OutsideExtract = journeys.OutsideExtract,
            ClockChangeTimes = rows.ClockChangeTimes,
        };
    }
}
