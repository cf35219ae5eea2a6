using NetSolve.Solving;

namespace NetSolve.Analysis;

/// <summary>The network at one growth factor.</summary>
/// <param name="Factor">The factor the grown arrivals are multiplied by (1 is today's demand).</param>
/// <param name="Solution">The solution at that factor, from the scaled flows (the traffic equations are not solved again), or, when
/// the network has bed limits, solved afresh so that the turn-away and diversion fixed point is found at that demand.</param>
public sealed record GrowthStep(double Factor, NetworkSolution Solution);
