namespace NetSolve.Simulation;

/// <summary>
/// Whether the replications so far estimate every unit's mean wait and mean number in unit to a relative precision,
/// and how many replications would, for the sequential procedure of <see cref="Simulator"/>.
/// </summary>
/// <remarks>
/// Law, Simulation Modeling and Analysis, 5th ed., 2015, chapter 9 (the sequential procedure for a relative precision
/// γ): stop when the 95% half-width is at most γ' = γ / (1 + γ) times the mean, which makes the achieved relative
/// error of the interval at most γ. A unit's mean wait is left out when it is negligible (below
/// <see cref="NegligibleWaitShare"/> of its mean service time): a relative precision of almost nothing is not a
/// question a planner asks, and it would keep the run going for ever.
/// </remarks>
internal static class PrecisionCheck
{
    /// <summary>A mean wait below this share of the unit's mean service time is negligible.</summary>
    public const double NegligibleWaitShare = 0.01;

    /// <summary>
    /// The largest relative half-width, half-width / mean, among the key means of every unit (0 when no key mean has
    /// a value; +∞ when one has no interval yet).
    /// </summary>
    public static double WorstRelativeHalfWidth(MetricLayout layout, IReadOnlyList<double[]> rows, IReadOnlyList<double> meanServiceHours)
    {
        double worst = 0.0;
        for (int u = 0; u < layout.Units; u++)
        {
            var inUnit = Estimate.From(rows.Select(row => row[layout.Unit(u, MetricLayout.MeanInUnit)]));
            var wait = Estimate.From(rows.Select(row => row[layout.Unit(u, MetricLayout.MeanWaitHours)]));
            worst = Math.Max(worst, Relative(inUnit, 0.0));
            worst = Math.Max(worst, Relative(wait, NegligibleWaitShare * meanServiceHours[u]));
        }

        return worst;
    }

    /// <summary>Law's adjusted target γ / (1 + γ) for a requested relative precision γ.</summary>
    public static double AdjustedTarget(double precision) => precision / (1.0 + precision);

    /// <summary>
    /// How many replications in all the next step should reach: the count the present relative half-width points to
    /// (it shrinks as 1 / √n), at least one more and at most twice the present count or <paramref name="most"/>.
    /// </summary>
    public static int NextCount(int present, double worstRelative, double target, int most)
    {
        // A plain square (no platform pow), so the stopping count is the same on every machine.
        double ratio = worstRelative / target;
        double needed = double.IsFinite(worstRelative) ? present * ratio * ratio : 2.0 * present;
        int next = (int)Math.Ceiling(Math.Min(needed, 2.0 * present));
        return Math.Clamp(next, present + 1, most);
    }

    private static double Relative(Estimate? estimate, double negligible)
    {
        if (estimate is not Estimate value || Math.Abs(value.Mean) <= negligible)
        {
            return 0.0;
        }

        return value.HalfWidth is double half ? half / Math.Abs(value.Mean) : double.PositiveInfinity;
    }
}
