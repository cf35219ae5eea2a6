namespace NetSolve.Model;

/// <summary>What a compared metric measures, so it can be converted to the network's time unit.</summary>
public enum MetricDimension
{
    /// <summary>A count or a fraction: printed as is.</summary>
    Plain,

    /// <summary>A time in hours.</summary>
    Time,

    /// <summary>A rate per hour.</summary>
    Rate,
}
