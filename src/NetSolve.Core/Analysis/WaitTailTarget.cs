namespace NetSolve.Analysis;

/// <summary>A target on long waits: at most <see cref="MaxProbability"/> of patients wait longer than <see cref="WaitHours"/>.</summary>
/// <param name="WaitHours">The wait t in hours; not negative.</param>
/// <param name="MaxProbability">The largest acceptable P(wait &gt; t), in [0, 1].</param>
public sealed record WaitTailTarget(double WaitHours, double MaxProbability);
