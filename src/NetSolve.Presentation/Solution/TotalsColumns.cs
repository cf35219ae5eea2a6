using System.Collections.Immutable;
using NetSolve.Model;
using NetSolve.Presentation.Metrics;
using NetSolve.Solving;

namespace NetSolve.Presentation.Solution;

/// <summary>The registry of the network totals: ids as in the contract's <c>totals</c> object.</summary>
public static class TotalsColumns
{
    /// <summary>Patients arriving from outside.</summary>
    public static readonly Column<NetworkTotals> ExternalArrivalRate = Columns.Number<NetworkTotals>("external_arrival_rate", "external arrivals", MetricDimension.Rate, totals => totals.ExternalArrivalsPerHour);

    /// <summary>Patients leaving the network; absent when unstable.</summary>
    public static readonly Column<NetworkTotals> Throughput = Columns.Number<NetworkTotals>("throughput", "throughput", MetricDimension.Rate, totals => totals.ThroughputPerHour);

    /// <summary>Mean patients in the network; absent when unstable.</summary>
    public static readonly Column<NetworkTotals> MeanInSystem = Columns.Number<NetworkTotals>("mean_in_system", "patients in network", MetricDimension.Count, totals => totals.MeanInSystem);

    /// <summary>Mean time in the network (Little's law); absent when unstable.</summary>
    public static readonly Column<NetworkTotals> MeanTimeInSystem = Columns.Number<NetworkTotals>("mean_time_in_system", "mean time in network", MetricDimension.Time, totals => totals.MeanTimeInSystemHours);

    /// <summary>Patients turned away by full units.</summary>
    public static readonly Column<NetworkTotals> TurnedAwayRate = Columns.Number<NetworkTotals>("turned_away_rate", "turned away", MetricDimension.Rate, totals => totals.TurnedAwayPerHour);

    /// <summary>Patients diverted from full units to others.</summary>
    public static readonly Column<NetworkTotals> DivertedRate = Columns.Number<NetworkTotals>("diverted_rate", "diverted", MetricDimension.Rate, totals => totals.DivertedPerHour);

    /// <summary>Every total, in the contract's order.</summary>
    public static readonly ImmutableArray<Column<NetworkTotals>> All = [ExternalArrivalRate, Throughput, MeanInSystem, MeanTimeInSystem, TurnedAwayRate, DivertedRate];

    /// <summary>The one-row totals table of <paramref name="solution"/>.</summary>
    public static ResultTable Table(NetworkSolution solution)
    {
        ArgumentNullException.ThrowIfNull(solution);
        return ResultTable.Build(All, [solution.Totals], solution.Network.TimeUnit);
    }
}
