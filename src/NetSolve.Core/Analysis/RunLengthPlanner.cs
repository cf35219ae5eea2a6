using NetSolve.Solving;
using NetSolve.Simulation;

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
/// When the run is bounded before <see cref="DurationRelaxations"/>·τ (a stable unit relaxing in over half a year),
/// the replications grow as the square of the shortfall (20τ / run), so that the run as a whole measures more than
/// <see cref="DurationRelaxations"/> × <see cref="SimulationOptions.DefaultReplications"/>
/// relaxation times of the slowest unit: the 99th percentile of an M/M/1 unit at 0.9 with 1-day service needed it
/// (its intervals covered in under 90% of seeds with 10 bounded replications). Such units have few events, so this
/// is cheap; the replications stay within <see cref="MostReplications"/> and about <see cref="MostPlannedEvents"/>
/// events. An unstable unit (τ = +∞) never settles and adds none.
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

    /// <summary>The most replications chosen.</summary>
    public const int MostReplications = 100;

    /// <summary>The most events (two per visit) the added replications may bring the run to: about 20 s of one core.</summary>
    public const double MostPlannedEvents = 2e8;

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
        return new RunLengthPlan(warmup, duration, warmupHours is null, durationHours is null, [.. slow],
            durationHours is null ? Replications(formula, relaxations, warmup, duration) : SimulationOptions.DefaultReplications);
    }

    /// <summary>The default replications, or more when the slowest stable unit wants a longer run than the bound allowed.</summary>
    private static int Replications(NetworkSolution formula, List<UnitRelaxation> relaxations, double warmup, double duration)
    {
        int least = SimulationOptions.DefaultReplications;
        double slowestStable = relaxations.Select(unit => unit.Hours).Where(double.IsFinite).DefaultIfEmpty(0.0).Max();
        double wanted = DurationRelaxations * slowestStable;
        if (wanted <= duration)
        {
            return least;
        }

        double visitsPerHour = formula.Units.Sum(unit => double.IsFinite(unit.ArrivalsPerHour) ? unit.ArrivalsPerHour : 0.0);
        double eventsPerReplication = 2.0 * visitsPerHour * (warmup + duration);
        int affordable = eventsPerReplication > 0.0 ? (int)Math.Min(MostReplications, Math.Floor(MostPlannedEvents / eventsPerReplication)) : MostReplications;
        // As the square of the shortfall, not in proportion: each bounded replication measures fewer relaxation times,
        // so its mean is more skewed (one long excursion of the queue weighs more) and the Student t interval over
        // replications needs more of them to be as honest. Measured: in proportion (21 replications for M/M/1 at 0.9
        // with 1-day service) covered in 88% of 40 seeds; see docs/simulation.md, "Coverage with the default options".
        double shortfall = wanted / duration;
        int needed = (int)Math.Ceiling(least * shortfall * shortfall);
        return Math.Max(least, Math.Min(needed, affordable));
    }

    private static double Weeks(double hours, double least)
    {
        double bounded = double.IsFinite(hours) ? Math.Clamp(hours, least, MostHours) : MostHours;
        return Math.Min(MostHours, Math.Ceiling(bounded / WeekHours) * WeekHours);
    }
}
