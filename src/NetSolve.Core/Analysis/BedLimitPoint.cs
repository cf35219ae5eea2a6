namespace NetSolve.Analysis;

/// <summary>When a unit with a bed limit starts to turn away or divert a given share of its arrivals as demand grows.</summary>
/// <remarks>
/// Immutable. A unit with a capacity is never unstable: it refuses patients instead, so its growth limit is stated as the
/// factor at which P(full), the share of arrivals that find it full, passes 1% and 5%.
/// </remarks>
/// <param name="UnitId">The unit.</param>
/// <param name="Capacity">Its capacity K: most patients at once, in service and waiting.</param>
/// <param name="FullToday">P(full) at factor 1.</param>
/// <param name="Full1PercentFactor">
/// Growth factor at which P(full) reaches 1%; 0 when it already does with the growing stream removed; null when it does
/// not within <see cref="GrowthAnalysis.BedLimitSearchLimit"/> (or the growing stream does not reach the unit).
/// </param>
/// <param name="Full5PercentFactor">As <paramref name="Full1PercentFactor"/>, for 5%.</param>
public sealed record BedLimitPoint(string UnitId, int Capacity, double FullToday, double? Full1PercentFactor, double? Full5PercentFactor);
