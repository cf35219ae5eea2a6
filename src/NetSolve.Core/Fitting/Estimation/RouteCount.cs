namespace NetSolve.Fitting.Estimation;

/// <summary>How many patients went straight from a unit to <paramref name="ToUnitId"/>.</summary>
/// <param name="ToUnitId">The unit moved to.</param>
/// <param name="Count">Moves seen; not negative.</param>
public readonly record struct RouteCount(string ToUnitId, int Count);
