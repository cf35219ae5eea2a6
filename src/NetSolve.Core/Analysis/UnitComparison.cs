using NetSolve.Solving;

namespace NetSolve.Analysis;

/// <summary>One unit in the base network and in a scenario.</summary>
/// <param name="UnitId">The unit.</param>
/// <param name="Before">Its result in the base; null when the scenario added it.</param>
/// <param name="After">Its result in the scenario; null when the scenario closed it.</param>
public sealed record UnitComparison(string UnitId, UnitResult? Before, UnitResult? After)
{
    /// <summary>Servers (null for unlimited or absent).</summary>
    public MetricChange Servers => new(ServersOf(Before), ServersOf(After));

    /// <summary>Total flow into the unit per hour.</summary>
    public MetricChange ArrivalsPerHour => new(Before?.ArrivalsPerHour, After?.ArrivalsPerHour);

    /// <summary>Utilisation.</summary>
    public MetricChange Utilisation => new(Before?.Utilisation, After?.Utilisation);

    /// <summary>Mean wait before service, hours.</summary>
    public MetricChange MeanWaitHours => new(Before?.MeanWaitHours, After?.MeanWaitHours);

    /// <summary>Mean time in the unit, hours.</summary>
    public MetricChange MeanTimeInUnitHours => new(Before?.MeanTimeInUnitHours, After?.MeanTimeInUnitHours);

    /// <summary>Mean number present.</summary>
    public MetricChange MeanInUnit => new(Before?.MeanInUnit, After?.MeanInUnit);

    /// <summary>True when the status differs, or the unit was added or closed.</summary>
    public bool StatusChanged => Before?.Status != After?.Status;

    private static double? ServersOf(UnitResult? result) =>
        result is null || result.Unit.Servers.IsUnlimited ? null : result.Unit.Servers.Count;
}
