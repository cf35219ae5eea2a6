namespace NetSolve.Model;

/// <summary>A target on long waits: at most <see cref="AtMost"/> of patients wait longer than <see cref="WaitHours"/>.</summary>
/// <param name="WaitHours">The wait t, in hours; positive.</param>
/// <param name="AtMost">The largest acceptable P(wait &gt; t), in [0, 1].</param>
public sealed record WaitOverTarget(double WaitHours, double AtMost);
