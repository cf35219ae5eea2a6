using System.Collections.Immutable;
using NetSolve.Solving;

namespace NetSolve.Analysis;

/// <summary>One scenario set against the base: every unit of either, and the network totals.</summary>
/// <param name="Name">The scenario's name.</param>
/// <param name="Solution">The scenario solved.</param>
/// <param name="Units">Base units in base order, then units the scenario added.</param>
public sealed record ScenarioComparison(string Name, NetworkSolution Solution, ImmutableArray<UnitComparison> Units)
{
    /// <summary>Units whose status changed, were added or were closed.</summary>
    public IEnumerable<UnitComparison> StatusChanges => Units.Where(unit => unit.StatusChanged);

    /// <summary>The scenario's bottleneck unit(s), in file order.</summary>
    public ImmutableArray<string> Bottlenecks => [.. Solution.Units.Where(unit => unit.Status == UnitStatus.Bottleneck).Select(unit => unit.Unit.Id)];

    /// <summary>Mean number of patients in the network; null values where unstable.</summary>
    public MetricChange MeanInSystem => new(BaseTotals.MeanInSystem, Solution.Totals.MeanInSystem);

    /// <summary>Mean time from entry to exit, hours.</summary>
    public MetricChange MeanTimeInSystemHours => new(BaseTotals.MeanTimeInSystemHours, Solution.Totals.MeanTimeInSystemHours);

    /// <summary>External arrivals per hour.</summary>
    public MetricChange ExternalArrivalsPerHour => new(BaseTotals.ExternalArrivalsPerHour, Solution.Totals.ExternalArrivalsPerHour);

    /// <summary>The base network's totals, for the changes above.</summary>
    public required NetworkTotals BaseTotals { get; init; }
}
