namespace NetSolve.Analysis;

/// <summary>A percentile of a journey's time by the formula.</summary>
/// <param name="Percent">50, 90, 95 or 99.</param>
/// <param name="Hours">The time below which that percentage of journeys end.</param>
public sealed record JourneyPercentile(double Percent, double Hours);
