namespace NetSolve.Analysis;

/// <summary>When one unit strains and saturates as demand grows.</summary>
/// <param name="UnitId">The unit.</param>
/// <param name="StrainFactor">Growth factor at which its utilisation reaches the strain threshold; at most 1 when it already has.</param>
/// <param name="SaturationFactor">
/// Growth factor at which its utilisation reaches 1 (it becomes unstable); at most 1 when it already is. When
/// every arrival grows, this is the unit's headroom c/a.
/// </param>
public sealed record SaturationPoint(string UnitId, double StrainFactor, double SaturationFactor);
