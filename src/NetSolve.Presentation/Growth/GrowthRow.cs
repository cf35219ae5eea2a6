using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Solving;

namespace NetSolve.Presentation.Growth;

/// <summary>One unit at one growth factor: a row of the long-format CSV.</summary>
/// <param name="Factor">The multiple of today's demand.</param>
/// <param name="Result">The unit's result at that factor.</param>
/// <param name="TimeUnit">The network's time unit, written on every row so each row stands on its own when filtered.</param>
/// <param name="BedLimit">The unit's bed limit as demand grows; null when it has no capacity.</param>
public sealed record GrowthRow(double Factor, UnitResult Result, TimeUnit TimeUnit, BedLimitPoint? BedLimit = null);
