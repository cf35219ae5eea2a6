using System.Collections.Immutable;
using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Metrics;
using NetSolve.Presentation.Simulation;

namespace NetSolve.Presentation.Journeys;

/// <summary>
/// The registry of a journey's figures by the formula: ids as in the objects of the contract's <c>journeys</c> array
/// (docs/network-file.md, "Journeys"), headers of the "Journeys" table. The units and the shares over each time are
/// arrays of their own, written by <see cref="JourneyJsonWriter"/>.
/// </summary>
public static class JourneyColumns
{
    /// <summary>The journey's name.</summary>
    public static readonly Column<JourneyEstimate> Journey = Columns.Words<JourneyEstimate>("journey", "journey", row => row.Journey.Id);

    /// <summary>The journey's display name.</summary>
    public static readonly Column<JourneyEstimate> Label = Columns.Words<JourneyEstimate>("label", "label", row => row.Journey.Label, Audience.Machines);

    /// <summary>Whose journeys: every patient, or one patient group.</summary>
    public static readonly Column<JourneyEstimate> Patients = Columns.Words<JourneyEstimate>("patients", "patients", row => PatientsWord(row.Group), Audience.People);

    /// <summary>Journeys started per unit of time.</summary>
    public static readonly Column<JourneyEstimate> Rate = Columns.Number<JourneyEstimate>("journey_rate", "journeys", MetricDimension.Rate, row => row.PerHour);

    /// <summary>The mean journey time.</summary>
    public static readonly Column<JourneyEstimate> MeanTime = Columns.Number<JourneyEstimate>("mean_time", "mean time", MetricDimension.Time, row => row.MeanHours);

    /// <summary>The shares longer than each of the journey's times, as people read them.</summary>
    public static readonly Column<JourneyEstimate> Over = Columns.Words<JourneyEstimate>("over", "share longer than", row => OverWords(row), Audience.People);

    /// <summary>The columns of <paramref name="rows"/>: the patients column only when some row is for a group.</summary>
    public static ImmutableArray<Column<JourneyEstimate>> For(IReadOnlyList<JourneyEstimate> rows)
    {
        ArgumentNullException.ThrowIfNull(rows);
        var percentiles = JourneyFormula.Fractions.Select((fraction, i) => Columns.Number<JourneyEstimate>(
            SimulatedUnitColumns.PercentileKey(fraction * 100.0),
            SimulatedUnitColumns.PercentileKey(fraction * 100.0),
            MetricDimension.Time,
            row => row.Percentiles.IsEmpty ? null : row.Percentiles[i].Hours));
        var patients = rows.Any(row => row.Group is not null) ? [Patients] : Array.Empty<Column<JourneyEstimate>>();
        return [Journey, Label, .. patients, Rate, MeanTime, .. percentiles, Over];
    }

    /// <summary>
    /// The journey figures of the per-unit CSV (<see cref="JourneyCsvRows"/>): <c>patients</c>, then the figures under
    /// the <c>journey_</c> prefix, then one <c>journey_over_Th</c> share per time any journey gives (empty for a journey
    /// without that time, or without figures).
    /// </summary>
    public static ImmutableArray<Column<JourneyEstimate>> ForCsv(IReadOnlyList<JourneyEstimate> rows)
    {
        ArgumentNullException.ThrowIfNull(rows);
        var figures = For(rows).Where(column => column.Audience != Audience.People && column != Journey && column != Label);
        var over = JourneyCsvRows.OverTimes(rows.Select(row => row.Over.Select(share => share.Hours))).Select(hours =>
            Columns.Number<JourneyEstimate>(JourneyCsvRows.OverId(hours), JourneyCsvRows.OverId(hours), MetricDimension.Probability,
                row => row.Over.FirstOrDefault(share => share.Hours.Equals(hours))?.Probability, Audience.Machines));
        return [Patients with { Audience = Audience.Machines }, .. figures.Select(JourneyCsvRows.Prefixed), .. over];
    }

    /// <summary>The journey table of <paramref name="rows"/>.</summary>
    public static ResultTable Table(IReadOnlyList<JourneyEstimate> rows, TimeUnit timeUnit) => ResultTable.Build(For(rows), rows, timeUnit);

    /// <summary>"all" for every patient, else the group's id.</summary>
    public static string PatientsWord(PatientGroup? group) => group?.Id ?? "all";

    private static string OverWords(JourneyEstimate row) => row.MeanHours is null
        ? PeopleFormat.Missing
        : string.Join("; ", row.Over.Select(over => "> " + PeopleFormat.Time(over.Hours) + ": " + PeopleFormat.Percent(over.Probability)));
}
