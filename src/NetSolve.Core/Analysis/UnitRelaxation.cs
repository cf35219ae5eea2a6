using NetSolve.Model;

namespace NetSolve.Analysis;

/// <summary>A unit and its relaxation time (<see cref="RelaxationTime"/>), in hours.</summary>
/// <param name="Unit">The unit.</param>
/// <param name="Hours">Its relaxation time; +∞ for an unstable unit without a capacity.</param>
public sealed record UnitRelaxation(Unit Unit, double Hours);
