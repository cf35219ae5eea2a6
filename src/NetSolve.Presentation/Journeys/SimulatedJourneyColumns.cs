using System.Collections.Immutable;
using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Metrics;
using NetSolve.Presentation.Simulation;
using NetSolve.Simulation;

namespace NetSolve.Presentation.Journeys;

/// <summary>
/// The registry of a journey's simulated figures: the same ids as <see cref="JourneyColumns"/>, each with its
/// <c>_ci</c> half-width, so that a journey reads the same from <c>solve</c> and <c>simulate</c>.
/// </summary>
public static class SimulatedJourneyColumns
{
    /// <summary>The journey's name.</summary>
    public static readonly Column<SimulatedJourney> Journey = Columns.Words<SimulatedJourney>("journey", "journey", row => row.Journey.Id);

    /// <summary>The journey's display name.</summary>
    public static readonly Column<SimulatedJourney> Label = Columns.Words<SimulatedJourney>("label", "label", row => row.Journey.Label, Audience.Machines);

    /// <summary>Whose journeys: every patient, or one patient group.</summary>
    public static readonly Column<SimulatedJourney> Patients = Columns.Words<SimulatedJourney>("patients", "patients", row => JourneyColumns.PatientsWord(row.Group), Audience.People);

    /// <summary>Journeys finished per unit of time.</summary>
    public static readonly EstimateMetric<SimulatedJourney> Rate = new("journey_rate", "journeys", MetricDimension.Rate, row => row.PerHour);

    /// <summary>The mean journey time.</summary>
    public static readonly EstimateMetric<SimulatedJourney> MeanTime = new("mean_time", "mean time", MetricDimension.Time, row => row.MeanHours);

    /// <summary>The shares longer than each of the journey's times, as people read them.</summary>
    public static readonly Column<SimulatedJourney> Over = Columns.Words<SimulatedJourney>("over", "share longer than", row => OverWords(row), Audience.People);

    /// <summary>The time t of a share over t.</summary>
    public static readonly Column<WaitOverEstimate> OverTime = Columns.Number<WaitOverEstimate>("time", "longer than", MetricDimension.Time, over => over.WaitHours);

    /// <summary>The fields of each object of a journey's <c>over</c> array.</summary>
    public static readonly ImmutableArray<Column<WaitOverEstimate>> OverForJson = [OverTime, .. WaitOverColumns.Probability.ForMachines, WaitOverColumns.UpperBound];

    /// <summary>The columns of <paramref name="rows"/>: the patients column only when some row is for a group.</summary>
    public static ImmutableArray<Column<SimulatedJourney>> For(IReadOnlyList<SimulatedJourney> rows, Audience audience)
    {
        ArgumentNullException.ThrowIfNull(rows);
        var percentiles = JourneyFormula.Fractions.Select((fraction, i) => new EstimateMetric<SimulatedJourney>(
            SimulatedUnitColumns.PercentileKey(fraction * 100.0),
            SimulatedUnitColumns.PercentileKey(fraction * 100.0),
            MetricDimension.Time,
            row => row.Percentiles[i].Hours));
        var metrics = new[] { Rate, MeanTime }.Concat(percentiles).ToList();
        if (audience == Audience.Machines)
        {
            return [Journey, Label, .. metrics.SelectMany(metric => metric.ForMachines)];
        }

        var patients = rows.Any(row => row.Group is not null) ? [Patients] : Array.Empty<Column<SimulatedJourney>>();
        return [Journey, .. patients, .. metrics.Select(metric => metric.ForPeople), Over];
    }

    /// <summary>
    /// The journey figures of the per-unit CSV (<see cref="JourneyCsvRows"/>): <c>patients</c>, then the figures under
    /// the <c>journey_</c> prefix, each followed by its <c>_ci</c>, then per time any journey gives
    /// <c>journey_over_Th</c>, <c>journey_over_Th_ci</c> and <c>journey_over_Th_upper_bound</c> (the rule-of-three
    /// bound when no journey was longer), empty for a journey without that time.
    /// </summary>
    public static ImmutableArray<Column<SimulatedJourney>> ForCsv(IReadOnlyList<SimulatedJourney> rows)
    {
        ArgumentNullException.ThrowIfNull(rows);
        var figures = For(rows, Audience.Machines).Where(column => column != Journey && column != Label);
        var over = JourneyCsvRows.OverTimes(rows.Select(row => row.Over.Select(share => share.WaitHours))).SelectMany(hours => OverForCsv(hours));
        return [Patients with { Audience = Audience.Machines }, .. figures.Select(JourneyCsvRows.Prefixed), .. over];
    }

    /// <summary>The journey table of <paramref name="rows"/> for <paramref name="audience"/>.</summary>
    public static ResultTable Table(IReadOnlyList<SimulatedJourney> rows, TimeUnit timeUnit, Audience audience) => ResultTable.Build(For(rows, audience), rows, timeUnit);

    private static IEnumerable<Column<SimulatedJourney>> OverForCsv(double hours)
    {
        string id = JourneyCsvRows.OverId(hours);
        WaitOverEstimate? At(SimulatedJourney row) => row.Over.FirstOrDefault(share => share.WaitHours.Equals(hours));
        var share = new EstimateMetric<SimulatedJourney>(id, id, MetricDimension.Probability, row => At(row)?.Probability);
        return [.. share.ForMachines, Columns.Number<SimulatedJourney>(id + "_upper_bound", id, MetricDimension.Probability, row => At(row)?.UpperBound, Audience.Machines)];
    }

    private static string OverWords(SimulatedJourney row) => row.MeanHours is null
        ? PeopleFormat.Missing
        : string.Join("; ", row.Over.Select(over => "> " + PeopleFormat.Time(over.WaitHours) + ": " + ShareWords(over)));

    private static string ShareWords(WaitOverEstimate over) => over.UpperBound is double bound
        ? "< " + PeopleFormat.Percent(bound)
        : over.Probability.HalfWidth is double half
            ? PeopleFormat.Percent(over.Probability.Mean) + " \u00B1 " + PeopleFormat.Percent(half)
            : PeopleFormat.Percent(over.Probability.Mean);
}
