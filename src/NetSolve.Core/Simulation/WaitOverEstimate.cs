namespace NetSolve.Simulation;

/// <summary>The chance that a patient starting service at a unit waited longer than a given time.</summary>
/// <param name="WaitHours">The time t in hours.</param>
/// <param name="Probability">P(wait &gt; t) among patients who started service.</param>
public sealed record WaitOverEstimate(double WaitHours, Estimate Probability);
