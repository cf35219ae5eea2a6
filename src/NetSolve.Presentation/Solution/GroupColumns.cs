using System.Collections.Immutable;
using System.Text.Json;
using NetSolve.Model;
using NetSolve.Presentation.Formats;
using NetSolve.Presentation.Metrics;
using NetSolve.Solving;

namespace NetSolve.Presentation.Solution;

/// <summary>
/// The registry of a patient group's results: ids as in the contract's <c>groups</c> objects (docs/network-file.md),
/// headers of the "Patient groups" table. The visits per unit are an object of their own, written by <see cref="WriteArray"/>.
/// </summary>
public static class GroupColumns
{
    /// <summary>The JSON field of a group's visits per patient to each unit.</summary>
    public const string VisitsId = "visits";

    /// <summary>The group's id.</summary>
    public static readonly Column<GroupResult> Id = Columns.Words<GroupResult>("id", "group", group => group.Id);

    /// <summary>The group's display name.</summary>
    public static readonly Column<GroupResult> Label = Columns.Words<GroupResult>("label", "label", group => group.Label, Audience.Machines);

    /// <summary>The group's patients arriving from outside.</summary>
    public static readonly Column<GroupResult> ExternalArrivalRate = Columns.Number<GroupResult>("external_arrival_rate", "arrivals", MetricDimension.Rate, group => group.ExternalArrivalsPerHour);

    /// <summary>The group's patients leaving the network.</summary>
    public static readonly Column<GroupResult> Throughput = Columns.Number<GroupResult>("throughput", "throughput", MetricDimension.Rate, group => group.ThroughputPerHour);

    /// <summary>Mean time in the network of the group's patients; absent when the group visits an unstable unit.</summary>
    public static readonly Column<GroupResult> MeanTimeInNetwork = Columns.Number<GroupResult>("mean_time_in_network", "mean time in network", MetricDimension.Time, group => group.MeanTimeInNetworkHours);

    /// <summary>Mean number of the group's patients in the network (Little's law); absent where the time is.</summary>
    public static readonly Column<GroupResult> MeanInNetwork = Columns.Number<GroupResult>("mean_in_network", "patients in network", MetricDimension.Count, group => group.MeanInNetwork);

    /// <summary>Every column, in the contract's order (the visits object follows them).</summary>
    public static readonly ImmutableArray<Column<GroupResult>> All = [Id, Label, ExternalArrivalRate, Throughput, MeanTimeInNetwork, MeanInNetwork];

    /// <summary>The group table of <paramref name="solution"/>: one row per group, none without groups.</summary>
    public static ResultTable Table(NetworkSolution solution)
    {
        ArgumentNullException.ThrowIfNull(solution);
        return ResultTable.Build(All, solution.Groups, solution.Network.TimeUnit);
    }

    /// <summary>
    /// Writes the array property <c>groups</c>: per group its fields and <c>visits</c>, an object from unit id to the
    /// group's visits per patient, every unit in file order.
    /// </summary>
    public static void WriteArray(NetworkSolution solution, Utf8JsonWriter json)
    {
        ArgumentNullException.ThrowIfNull(solution);
        ArgumentNullException.ThrowIfNull(json);
        var table = Table(solution);
        var units = solution.Network.Units;
        json.WriteStartArray("groups");
        for (int row = 0; row < table.Rows.Length; row++)
        {
            json.WriteStartObject();
            JsonTableWriter.WriteFields(table, table.Rows[row], json);
            json.WriteStartObject(VisitsId);
            for (int i = 0; i < units.Length; i++)
            {
                json.WriteNumber(units[i].Id, solution.Groups[row].VisitsPerPatient[i]);
            }

            json.WriteEndObject();
            json.WriteEndObject();
        }

        json.WriteEndArray();
    }
}
