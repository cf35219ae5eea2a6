using System.Globalization;
using NetSolve.Model;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Metrics;
using NetSolve.Solving;

namespace NetSolve.Presentation.ByHour;

/// <summary>
/// Writes the by-hour section of <c>solve</c> for people, below the steady-state table: a summary row per unit that
/// varies by hour, then the hours of the units with the longest worst-hour wait (every unit and hour is in JSON and
/// in <c>--format csv --by-hour</c>).
/// </summary>
public static class ByHourTableWriter
{
    /// <summary>At most this many units get their 24 hours written out: enough for the worst, short enough to read.</summary>
    public const int MaxUnitsInDetail = 3;

    private static readonly Column<ByHourRow>[] DetailColumns =
        [ByHourColumns.Hour, ByHourColumns.ArrivalRate, ByHourColumns.Servers, ByHourColumns.Utilisation, ByHourColumns.MeanQueue, ByHourColumns.MeanWait];

    /// <summary>True when <see cref="Write"/> writes a section: an hour-by-hour solution in which some unit's arrivals or servers vary.</summary>
    public static bool HasSection(NetworkSolution solution) => ByHourUnit.All(solution).Any(unit => unit.Varies);

    /// <summary>Writes the section; nothing without an hour-by-hour solution.</summary>
    public static void Write(NetworkSolution solution, TextWriter output)
    {
        ArgumentNullException.ThrowIfNull(solution);
        ArgumentNullException.ThrowIfNull(output);
        var varying = ByHourUnit.All(solution).Where(unit => unit.Varies).ToList();
        if (solution.ByHour is null || varying.Count == 0)
        {
            return;
        }

        var timeUnit = solution.Network.TimeUnit;
        output.Write("\nhour by hour (arrival_profile; time-varying formulas, docs/time-of-day.md; hour 00 is 00:00-01:00)\n");
        PeopleTableWriter.Write(ResultTable.Build(ByHourSummaryColumns.All, varying, timeUnit), output);
        var detailed = varying
            .Where(unit => unit.WorstHour is int hour && unit.MeanWaitHours(hour) > 0.0)
            .OrderByDescending(unit => unit.MeanWaitHours(unit.WorstHour!.Value))
            .Take(MaxUnitsInDetail)
            .ToList();
        foreach (var unit in detailed)
        {
            int day = unit.WorstHour!.Value / ArrivalProfile.HoursPerDay;
            string which = unit.CycleHours == ArrivalProfile.HoursPerDay ? string.Empty : ", the day of its worst hour";
            output.Write($"\n{unit.UnitId} by hour{which} ({unit.Waits.Method})\n");
            var rows = Enumerable.Range(day * ArrivalProfile.HoursPerDay, ArrivalProfile.HoursPerDay).Select(hour => new ByHourRow(unit, hour));
            PeopleTableWriter.Write(ResultTable.Build(DetailColumns, rows, timeUnit), output);
        }

        int hidden = varying.Count - detailed.Count;
        if (hidden > 0)
        {
            output.Write(string.Create(CultureInfo.InvariantCulture,
                $"{hidden} other unit(s) not shown hour by hour: shorter worst waits (every unit and hour is in --format json, and in --format csv --by-hour)\n"));
        }
    }
}
