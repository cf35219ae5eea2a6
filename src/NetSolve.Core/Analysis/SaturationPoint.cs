namespace NetSolve.Analysis;

/// <summary>When one unit strains and saturates as demand grows. Utilisation is linear in the growth factor.</summary>
/// <param name="UnitId">The unit.</param>
/// <param name="UtilisationToday">Its utilisation at factor 1.</param>
/// <param name="StrainFactor">Growth factor at which its utilisation reaches the strain threshold; at most 1 when it already has.</param>
/// <param name="SaturationFactor">
/// Growth factor at which its utilisation reaches 1 (it becomes unstable); at most 1 when it already is (0 for a unit
/// unstable at every factor because the growing stream does not reach it). When every arrival grows, this is the
/// unit's headroom c/a.
/// </param>
public sealed record SaturationPoint(string UnitId, double UtilisationToday, double StrainFactor, double SaturationFactor)
{
    /// <summary>The growth factor at which the unit's utilisation reaches <paramref name="utilisation"/> (linear in the factor).</summary>
    public double FactorAt(double utilisation) => SaturationFactor <= 1.0 || UtilisationToday >= 1.0
        ? SaturationFactor
        : 1.0 + ((utilisation - UtilisationToday) / (1.0 - UtilisationToday) * (SaturationFactor - 1.0));
}
