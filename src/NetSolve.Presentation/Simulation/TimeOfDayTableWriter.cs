using System.Globalization;
using NetSolve.Presentation.Formats;
using NetSolve.Simulation;

namespace NetSolve.Presentation.Simulation;

/// <summary>
/// Writes the mean queue by hour of day for people: one row per hour and one column per unit, for the units of
/// <see cref="TimeOfDayQueues.Shown"/>. Units are columns here, so the table is laid out by hand rather than from a
/// registry's rows; its cells are the means of <see cref="SimulatedUnitColumns.QueueAtHour"/>.
/// </summary>
internal static class TimeOfDayTableWriter
{
    /// <summary>
    /// Writes the section only when arrivals follow a profile: without one every hour has the same expected queue (JSON
    /// and CSV still carry the numbers).
    /// </summary>
    public static void Write(SimulationResult result, IReadOnlyList<SimulatedUnitRow> rows, TextWriter output)
    {
        if (!TimeOfDayQueues.HasArrivalProfile(result.Network))
        {
            return;
        }

        var shown = TimeOfDayQueues.Shown(result);
        output.Write("\nmean queue by hour of day (patients waiting; hour 00 is 00:00-01:00)\n");
        if (shown.Count == 0)
        {
            output.Write("no patient waited at any unit\n");
            return;
        }

        var shownRows = shown.Select(unit => rows.First(row => ReferenceEquals(row.Simulated, unit))).ToList();
        var table = new TextTable(["hour", .. shown.Select(unit => ">" + unit.Unit.Id)]);
        for (int hour = 0; hour < TimeOfDayQueues.HoursOfDay; hour++)
        {
            var queue = SimulatedUnitColumns.QueueAtHour(hour).Mean;
            table.Add([queue.Header, .. shownRows.Select(row => PeopleFormat.Cell(queue.Read(row), result.Network.TimeUnit))]);
        }

        table.Add(["peak", .. shown.Select(unit => TimeOfDayQueues.PeakHour(unit) is int peak ? peak.ToString("00", CultureInfo.InvariantCulture) + ":00" : PeopleFormat.Missing)]);
        table.Write(output);
        int hidden = result.Units.Length - shown.Count;
        if (hidden > 0)
        {
            output.Write(string.Create(CultureInfo.InvariantCulture,
                $"{hidden} other unit(s) not shown: their queues peak lower or stay at 0 (every unit is in --format json and csv)\n"));
        }
    }
}
