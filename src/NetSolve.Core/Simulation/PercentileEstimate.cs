namespace NetSolve.Simulation;

/// <summary>A percentile of a time, estimated in each replication and averaged over them.</summary>
/// <param name="Percent">The percentile: 50, 90, 95 or 99.</param>
/// <param name="Hours">The time in hours below which that percentage of patients fall; null when no patient was observed.</param>
public sealed record PercentileEstimate(double Percent, Estimate? Hours);
