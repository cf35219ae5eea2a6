namespace NetSolve.Analysis;

/// <summary>A metric before and after a change, with the absolute and relative difference where both exist.</summary>
/// <param name="Before">The base value; null when it does not exist (an unstable unit's wait, a unit added by the scenario).</param>
/// <param name="After">The scenario value; null when it does not exist.</param>
public sealed record MetricChange(double? Before, double? After)
{
    /// <summary>After minus before; null unless both exist.</summary>
    public double? Absolute => Before is double before && After is double after ? after - before : null;

    /// <summary>(After − before) / before; null unless both exist and before is not 0.</summary>
    public double? Relative => Before is double before && After is double after && before != 0.0 ? (after - before) / Math.Abs(before) : null;

    /// <summary>True when both are absent, or both exist and are equal to the last bit.</summary>
    /// <remarks>Exact on purpose: the same network solved twice gives the same bits, and any other difference is a change.</remarks>
    public bool IsUnchanged => Before == After;
}
