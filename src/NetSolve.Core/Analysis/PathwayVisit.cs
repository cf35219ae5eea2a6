namespace NetSolve.Analysis;

/// <summary>What a patient entering at one unit does at another unit, on average.</summary>
/// <param name="UnitId">The unit visited.</param>
/// <param name="ExpectedVisits">Mean number of visits per patient entering at the start unit (the entry visit counts).</param>
/// <param name="VisitProbability">The probability of visiting this unit at least once; null when not computed.</param>
/// <param name="ExpectedTimeHours">Expected visits times the unit's mean time per visit, in hours; null when the unit is unstable.</param>
public sealed record PathwayVisit(string UnitId, double ExpectedVisits, double? VisitProbability, double? ExpectedTimeHours);
