using NetSolve.Solving;

namespace NetSolve.Analysis;

/// <summary>
/// Chooses a simulation's warm-up and run length from the network's slowest unit, so that a ward with stays of days
/// at high load gets a run long enough for its means, while a network of fast units keeps a year's run.
/// </summary>
/// <remarks>
/// With τ the slowest unit's relaxation time (<see cref="RelaxationTime"/>): the warm-up is
/// <see cref="WarmupRelaxations"/>·τ, after which a queue started empty is within e⁻⁵ (under 1%) of its steady-state
/// start; the run is <see cref="DurationRelaxations"/>·τ, so that each replication's mean averages many
/// independent stretches (its bias from the start falls as τ / run). Both are whole weeks, so every hour and weekday
/// of an arrival profile counts equally, with at least a week of warm-up and 52 weeks of run, and at most
/// <see cref="MostHours"/> each (the effort bound; a longer run is asked for explicitly or as more replications).
/// Given values are kept exactly.
/// </remarks>
public static class RunLengthPlanner
{
    /// <summary>Warm-up in relaxation times of the slowest unit.</summary>
    public const double WarmupRelaxations = 5.0;

    /// <summary>Run length in relaxation times of the slowest unit.</summary>
    public const double DurationRelaxations = 20.0;

    /// <summary>A unit is warned about when the run measures fewer than this many of its relaxation times.</summary>
    public const double RelaxationsWarned = 10.0;

    /// <summary>The shortest warm-up chosen: one week.</summary>
    public const double LeastWarmupHours = 7 * 24;

    /// <summary>The shortest run chosen: 52 whole weeks, as the earlier fixed default.</summary>
    public const double LeastDurationHours = 364 * 24;

    /// <summary>The longest warm-up or run chosen: 3,640 days (520 weeks, about ten years), the bound on effort.</summary>
    public const double MostHours = 3640 * 24;

    private const double WeekHours = 7 * 24;

    /// <summary>The plan for <paramref name="formula"/>'s network; a given warm-up or run length is kept exactly.</summary>
    public static RunLengthPlan Plan(NetworkSolution formula, double? warmupHours = null, double? durationHours = null)
    {
        ArgumentNullException.ThrowIfNull(formula);
        var relaxations = formula.Units.Select(unit => new UnitRelaxation(unit.Unit, RelaxationTime.Hours(unit))).ToList();
        double slowest = relaxations.Select(unit => unit.Hours).DefaultIfEmpty(0.0).Max();
        double warmup = warmupHours ?? Weeks(WarmupRelaxations * slowest, LeastWarmupHours);
        double duration = durationHours ?? Weeks(DurationRelaxations * slowest, LeastDurationHours);
        var slow = relaxations
            .Where(unit => unit.Hours * RelaxationsWarned > duration || unit.Hours * WarmupRelaxations > warmup)
            .OrderByDescending(unit => unit.Hours)
            .ToList();
        return new RunLengthPlan(warmup, duration, warmupHours is null, durationHours is null, [.. slow]);
    }

    private static double Weeks(double hours, double least)
    {
        double bounded = double.IsFinite(hours) ? Math.Clamp(hours, least, MostHours) : MostHours;
        return Math.Min(MostHours, Math.Ceiling(bounded / WeekHours) * WeekHours);
    }
}
