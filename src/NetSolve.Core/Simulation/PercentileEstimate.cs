namespace NetSolve.Simulation;

/// <summary>
/// A percentile of a time: read from the histogram pooling every replication's observations, with a sectioning
/// interval from the spread of each replication's own percentile around it (<see cref="Estimate.Sectioned"/>).
/// The histogram resolves any positive time to within <see cref="DurationHistogram.RelativeResolution"/> (0.78%).
/// </summary>
/// <param name="Percent">The percentile: 50, 90, 95 or 99.</param>
/// <param name="Hours">The time in hours below which that percentage of patients fall; null when no patient was observed.</param>
public sealed record PercentileEstimate(double Percent, Estimate? Hours);
