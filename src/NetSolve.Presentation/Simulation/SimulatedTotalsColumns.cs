using System.Collections.Immutable;
using NetSolve.Model;
using NetSolve.Presentation.Metrics;
using NetSolve.Simulation;

namespace NetSolve.Presentation.Simulation;

/// <summary>The registry of a simulation's network totals: ids as in the contract's <c>totals</c> object.</summary>
public static class SimulatedTotalsColumns
{
    /// <summary>The model's mean external arrivals, all groups: an input, as in <c>solve</c>.</summary>
    public static readonly Column<SimulatedTotals> ExternalArrivalRate = Columns.Number<SimulatedTotals>("external_arrival_rate", "external arrivals", MetricDimension.Rate, totals => totals.ExternalArrivalsPerHour);

    /// <summary>Patients leaving the network after service.</summary>
    public static readonly EstimateMetric<SimulatedTotals> Throughput = new("throughput", "throughput", MetricDimension.Rate, totals => totals.ThroughputPerHour);

    /// <summary>Time-average number of patients in the network.</summary>
    public static readonly EstimateMetric<SimulatedTotals> MeanInSystem = new("mean_in_system", "patients in network", MetricDimension.Count, totals => totals.MeanInSystem);

    /// <summary>Mean time from entering to leaving the network; absent when nobody left.</summary>
    public static readonly EstimateMetric<SimulatedTotals> MeanTimeInSystem = new("mean_time_in_system", "mean time in network", MetricDimension.Time, totals => totals.MeanTimeInSystemHours);

    /// <summary>Patients turned away because a unit was full.</summary>
    public static readonly EstimateMetric<SimulatedTotals> TurnedAwayRate = new("turned_away_rate", "turned away", MetricDimension.Rate, totals => totals.TurnedAwayPerHour);

    /// <summary>The flat fields of the <c>totals</c> object, in the contract's order (the percentiles follow them).</summary>
    public static readonly ImmutableArray<Column<SimulatedTotals>> ForJson =
        [ExternalArrivalRate, .. Throughput.ForMachines, .. MeanInSystem.ForMachines, .. MeanTimeInSystem.ForMachines, .. TurnedAwayRate.ForMachines];
}
