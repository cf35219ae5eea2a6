using NetSolve.Model;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Journeys;
using NetSolve.Presentation.Metrics;
using NetSolve.Presentation.Solution;
using NetSolve.Simulation;
using NetSolve.Solving;

namespace NetSolve.Presentation.Simulation;

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
        var rows = SimulatedUnitRow.Of(result, strainThreshold);
        output.Write($"{result.Network.Name}  ({Title(result, strainThreshold)})\n\n");
        PeopleTableWriter.Write(ResultTable.Build(SimulatedUnitColumns.ForPeople, rows, timeUnit), output);
        WritePercentiles(result, output);
        WriteWaitOver(result, rows, output);
        JourneyTableWriter.Write(result.Journeys, timeUnit, output);
        TimeOfDayTableWriter.Write(result, rows, output);
        WriteTotals(result, output);
    }

    /// <summary>How the run was made, the rates' time unit and the strain threshold, in one line.</summary>
    public static string Title(SimulationResult result, double strainThreshold)
    {
        ArgumentNullException.ThrowIfNull(result);
        var options = result.Options;
        return FormattableString.Invariant(
            $"simulated: {result.ReplicationsFinished} of {options.Replications} replications of {PeopleFormat.Time(options.DurationHours)}{Chosen(options.IsDurationFromModel)} each after a warm-up of {PeopleFormat.Time(options.WarmupHours)}{Chosen(options.IsWarmupFromModel)}, seed {options.Seed}; ")
            + Precision(result) + SolutionTableWriter.Title(result.Network.TimeUnit, strainThreshold) + "; \u00B1 is the 95% half-width";
    }

    /// <summary>Says that a run length was chosen from the slowest unit's relaxation time rather than given.</summary>
    private static string Chosen(bool fromModel) => fromModel ? " (from relaxation time)" : string.Empty;

    /// <summary>The requested precision and whether it was reached, with the worst relative half-width; empty when none was asked.</summary>
    public static string Precision(SimulationResult result)
    {
        ArgumentNullException.ThrowIfNull(result);
        if (result.Options.Precision is not double precision)
        {
            return string.Empty;
        }

        string worst = result.WorstRelativeHalfWidth is double relative && double.IsFinite(relative)
            ? " (worst " + PeopleFormat.Percent(relative) + ")"
            : string.Empty;
        string outcome = result.PrecisionReached == true ? "reached" : "NOT reached";
        return "precision " + PeopleFormat.Percent(precision) + " " + outcome + worst + "; ";
    }

    private static void WritePercentiles(SimulationResult result, TextWriter output)
    {
        var totals = result.Totals!;
        var rows = result.Units.Select(unit => new PercentileRow(unit.Unit.Id, unit.TimeInUnitPercentiles))
            .Append(new PercentileRow("(network)", totals.TimeInSystemPercentiles))
            .Concat(result.Groups.Select(group => new PercentileRow($"(group {group.Group.Id})", group.TimeInSystemPercentiles)));
        output.Write("\ntime in unit by percentile\n");
        PeopleTableWriter.Write(ResultTable.Build(PercentileColumns.Of(totals.TimeInSystemPercentiles), rows, result.Network.TimeUnit), output);
    }

    private static void WriteWaitOver(SimulationResult result, IEnumerable<SimulatedUnitRow> rows, TextWriter output)
    {
        var thresholds = result.Options.WaitThresholdsHours;
        if (thresholds.IsDefaultOrEmpty)
        {
            return;
        }

        var timeUnit = result.Network.TimeUnit;
        output.Write("\nprobability of waiting longer than\n");
        var columns = thresholds.Select((threshold, i) => SimulatedUnitColumns.WaitOverForPeople(i, threshold, timeUnit)).Prepend(SimulatedUnitColumns.Id);
        PeopleTableWriter.Write(ResultTable.Build(columns, rows, timeUnit), output);
    }

    private static void WriteTotals(SimulationResult result, TextWriter output)
    {
        var totals = result.Totals!;
        var timeUnit = result.Network.TimeUnit;
        output.Write("\n" + Labelled(SimulatedTotalsColumns.ExternalArrivalRate, totals, timeUnit));
        output.Write("   " + Labelled(SimulatedTotalsColumns.Throughput.ForPeople, totals, timeUnit));
        output.Write("   " + Labelled(SimulatedTotalsColumns.MeanInSystem.ForPeople, totals, timeUnit));
        if (totals.MeanTimeInSystemHours is not null)
        {
            output.Write("   " + Labelled(SimulatedTotalsColumns.MeanTimeInSystem.ForPeople, totals, timeUnit));
        }

        output.Write("\n");
        if (totals.TurnedAwayPerHour.Mean > 0.0)
        {
            output.Write(Labelled(SimulatedTotalsColumns.TurnedAwayRate.ForPeople, totals, timeUnit) + "\n");
        }

        foreach (var group in result.Groups)
        {
            output.Write($"group {group.Group.Id}: " + Labelled(SimulatedGroupColumns.Throughput.ForPeople, group, timeUnit));
            if (group.MeanTimeInSystemHours is not null)
            {
                output.Write("   " + Labelled(SimulatedGroupColumns.MeanTimeInSystem.ForPeople, group, timeUnit));
            }

            output.Write("\n");
        }
    }

    /// <summary>The column's header and its value for people; a rate with its time unit, as no header above says it.</summary>
    private static string Labelled<TRow>(Column<TRow> column, TRow row, TimeUnit timeUnit)
    {
        string value = PeopleFormat.Cell(column.Read(row), timeUnit);
        return column.Header + " " + (column.Dimension == MetricDimension.Rate ? value + "/" + TimeConstants.Suffix(timeUnit) : value);
    }
}
