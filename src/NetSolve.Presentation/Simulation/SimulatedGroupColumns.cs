using System.Collections.Immutable;
using NetSolve.Model;
using NetSolve.Presentation.Metrics;
using NetSolve.Simulation;

namespace NetSolve.Presentation.Simulation;

/// <summary>The registry of a patient group's simulated flow: ids as in the contract's <c>groups</c> objects.</summary>
public static class SimulatedGroupColumns
{
    /// <summary>The group's id.</summary>
    public static readonly Column<SimulatedGroup> Id = Columns.Words<SimulatedGroup>("id", "group", group => group.Group.Id);

    /// <summary>The group's display name.</summary>
    public static readonly Column<SimulatedGroup> Label = Columns.Words<SimulatedGroup>("label", "label", group => group.Group.Label, Audience.Machines);

    /// <summary>The group's mean external arrivals: an input.</summary>
    public static readonly Column<SimulatedGroup> ExternalArrivalRate = Columns.Number<SimulatedGroup>("external_arrival_rate", "external arrivals", MetricDimension.Rate, group => group.Group.ExternalArrivalsPerHour);

    /// <summary>The group's patients leaving the network after service.</summary>
    public static readonly EstimateMetric<SimulatedGroup> Throughput = new("throughput", "throughput", MetricDimension.Rate, group => group.ThroughputPerHour);

    /// <summary>Mean time in the network of the group's patients; absent when none left.</summary>
    public static readonly EstimateMetric<SimulatedGroup> MeanTimeInSystem = new("mean_time_in_system", "mean time in network", MetricDimension.Time, group => group.MeanTimeInSystemHours);

    /// <summary>The flat fields of a group's object, in the contract's order (the percentiles follow them).</summary>
    public static readonly ImmutableArray<Column<SimulatedGroup>> ForJson =
        [Id, Label, ExternalArrivalRate, .. Throughput.ForMachines, .. MeanTimeInSystem.ForMachines];
}
