namespace NetSolve.Solving;

/// <summary>The mean wait and the chance of waiting of a unit fed by Poisson arrivals and interrupted Poisson streams.</summary>
/// <param name="MeanWaitHours">Mean wait of an arriving patient, in hours.</param>
/// <param name="WaitProbability">The share of arriving patients who find every server busy.</param>
public sealed record OverflowQueueResult(double MeanWaitHours, double WaitProbability);
