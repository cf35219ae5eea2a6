using NetSolve.Analysis;
using System.Globalization;
using NetSolve.Model;
using NetSolve.Simulation;
using NetSolve.Solving;

namespace NetSolve.Presentation;

/// <summary>
/// Writes a simulation for people: the unit table (each mean with ± its 95% half-width), times in unit by percentile,
/// P(wait &gt; t), the mean queue by hour of day, and the network totals and groups.
/// </summary>
public static class SimulationTableWriter
{
    /// <summary>Writes every section that has content.</summary>
    public static void Write(SimulationResult result, TextWriter output, double strainThreshold = Defaults.StrainThreshold)
    {
        ArgumentNullException.ThrowIfNull(result);
        ArgumentNullException.ThrowIfNull(output);
        var timeUnit = result.Network.TimeUnit;
        var scale = new TimeScale(timeUnit);
        string per = "/" + TimeConstants.Suffix(timeUnit);
        string time = "(" + TimeConstants.Suffix(timeUnit) + ")";
        var options = result.Options;
        output.Write(string.Create(CultureInfo.InvariantCulture,
            $"{result.Network.Name}  (simulated: {result.ReplicationsFinished} of {options.Replications} replications of {Numbers.Compact(scale.Time(options.DurationHours))} {TimeConstants.Name(timeUnit)}s each after a warm-up of {Numbers.Compact(scale.Time(options.WarmupHours))} {TimeConstants.Name(timeUnit)}s, seed {options.Seed}; ± is the 95% half-width)\n\n"));

        var statuses = SimulationStatus.Of(result, strainThreshold);
        var table = new TextTable("unit", ">servers", ">arrivals" + per, ">util", ">P(wait)", ">queue", ">wait " + time,
            ">in unit", ">time " + time, ">P(full)", "status");
        for (int i = 0; i < result.Units.Length; i++)
        {
            var unit = result.Units[i];
            var model = unit.Unit;
            table.Add(
                model.Id,
                model.Servers.ToString(),
                WithHalfWidth(unit.ArrivalsPerHour, scale.RateFactor),
                WithHalfWidth(unit.Utilisation, 1.0),
                WithHalfWidth(unit.WaitProbability, 1.0),
                WithHalfWidth(unit.MeanQueue, 1.0),
                WithHalfWidth(unit.MeanWaitHours, scale.TimeFactor),
                WithHalfWidth(unit.MeanInUnit, 1.0),
                WithHalfWidth(unit.MeanTimeInUnitHours, scale.TimeFactor),
                model.Capacity is null ? Numbers.Missing : WithHalfWidth(unit.FullProbability, 1.0),
                StatusWords.Marker(statuses[i]) + " " + StatusWords.Name(statuses[i]));
        }

        table.Write(output);
        WritePercentiles(result, output, scale, time);
        WriteWaitOver(result, output, scale);
        WriteQueueByHour(result, output);
        WriteTotals(result, output, scale, per, time);
    }

    /// <summary>A mean with ± its half-width, both scaled; the half-width is left out when there is none.</summary>
    public static string WithHalfWidth(Estimate estimate, double factor) =>
        estimate.HalfWidth is double half
            ? Numbers.Compact(estimate.Mean * factor) + " ±" + Numbers.Compact(half * factor)
            : Numbers.Compact(estimate.Mean * factor);

    private static void WritePercentiles(SimulationResult result, TextWriter output, TimeScale scale, string time)
    {
        output.Write($"\ntime in unit {time} by percentile\n");
        var table = new TextTable("unit", ">p50", ">p90", ">p95", ">p99");
        foreach (var unit in result.Units)
        {
            table.Add([unit.Unit.Id, .. unit.TimeInUnitPercentiles.Select(p => Numbers.Compact(p.Hours?.Mean * scale.TimeFactor))]);
        }

        table.Add(["(network)", .. result.Totals!.TimeInSystemPercentiles.Select(p => Numbers.Compact(p.Hours?.Mean * scale.TimeFactor))]);
        foreach (var group in result.Groups)
        {
            table.Add([$"(group {group.Group.Id})", .. group.TimeInSystemPercentiles.Select(p => Numbers.Compact(p.Hours?.Mean * scale.TimeFactor))]);
        }

        table.Write(output);
    }

    private static void WriteWaitOver(SimulationResult result, TextWriter output, TimeScale scale)
    {
        var thresholds = result.Options.WaitThresholdsHours;
        if (thresholds.IsDefaultOrEmpty)
        {
            return;
        }

        string suffix = TimeConstants.Suffix(scale.Unit);
        output.Write("\nprobability of waiting longer than\n");
        var table = new TextTable(["unit", .. thresholds.Select(t => ">" + Numbers.Compact(scale.Time(t)) + suffix)]);
        foreach (var unit in result.Units)
        {
            table.Add([unit.Unit.Id, .. unit.WaitOver.Select(over => WithHalfWidth(over.Probability, 1.0))]);
        }

        table.Write(output);
    }

    /// <summary>
    /// One row per hour of day and one column per unit, for the units with the highest peak queues; only when arrivals
    /// follow a profile (without one every hour has the same expected queue; JSON and CSV still carry the numbers).
    /// </summary>
    private static void WriteQueueByHour(SimulationResult result, TextWriter output)
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

        var table = new TextTable(["hour", .. shown.Select(unit => ">" + unit.Unit.Id)]);
        for (int hour = 0; hour < TimeOfDayQueues.HoursOfDay; hour++)
        {
            table.Add([hour.ToString("00", CultureInfo.InvariantCulture), .. shown.Select(unit => Numbers.Compact(unit.MeanQueueByHour[hour]?.Mean))]);
        }

        table.Add(["peak", .. shown.Select(unit => TimeOfDayQueues.PeakHour(unit) is int peak ? peak.ToString("00", CultureInfo.InvariantCulture) + ":00" : Numbers.Missing)]);
        table.Write(output);
        int hidden = result.Units.Length - shown.Count;
        if (hidden > 0)
        {
            output.Write(string.Create(CultureInfo.InvariantCulture,
                $"{hidden} other unit(s) not shown: their queues peak lower or stay at 0 (every unit is in --format json and csv)\n"));
        }
    }

    private static void WriteTotals(SimulationResult result, TextWriter output, TimeScale scale, string per, string time)
    {
        var totals = result.Totals!;
        output.Write("\n");
        output.Write($"external arrivals {Numbers.Compact(scale.Rate(totals.ExternalArrivalsPerHour))}{per}");
        output.Write($"   throughput {WithHalfWidth(totals.ThroughputPerHour, scale.RateFactor)}{per}");
        output.Write($"   patients in network {WithHalfWidth(totals.MeanInSystem, 1.0)}");
        if (totals.MeanTimeInSystemHours is Estimate timeInSystem)
        {
            output.Write($"   mean time in network {WithHalfWidth(timeInSystem, scale.TimeFactor)} {time}");
        }

        output.Write("\n");
        if (totals.TurnedAwayPerHour.Mean > 0.0)
        {
            output.Write($"turned away {WithHalfWidth(totals.TurnedAwayPerHour, scale.RateFactor)}{per}\n");
        }

        foreach (var group in result.Groups)
        {
            output.Write($"group {group.Group.Id}: throughput {WithHalfWidth(group.ThroughputPerHour, scale.RateFactor)}{per}");
            if (group.MeanTimeInSystemHours is Estimate groupTime)
            {
                output.Write($"   mean time in network {WithHalfWidth(groupTime, scale.TimeFactor)} {time}");
            }

            output.Write("\n");
        }
    }
}
