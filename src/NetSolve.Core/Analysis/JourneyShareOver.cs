namespace NetSolve.Analysis;

/// <summary>The formula's chance that a journey takes longer than a given time.</summary>
/// <param name="Hours">The time t.</param>
/// <param name="Probability">P(journey time &gt; t), in [0, 1].</param>
public sealed record JourneyShareOver(double Hours, double Probability);
