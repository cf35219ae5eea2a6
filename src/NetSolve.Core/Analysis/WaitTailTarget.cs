using NetSolve.Solving;

namespace NetSolve.Analysis;

/// <summary>A target on long waits: at most <see cref="MaxProbability"/> of patients wait longer than <see cref="WaitHours"/>.</summary>
/// <param name="WaitHours">The wait t in hours; not negative.</param>
/// <param name="MaxProbability">The largest acceptable P(wait &gt; t), in [0, 1].</param>
public sealed record WaitTailTarget(double WaitHours, double MaxProbability)
{
    /// <summary>
    /// The share of patients at <paramref name="result"/>'s unit who wait longer than <see cref="WaitHours"/>, by the
    /// unit's own method: <see cref="GgcFormulas.WaitLongerThan"/> with the result's arrival and service SCVs (the exact
    /// M/M/c tail when both are 1); for a unit with a capacity, <see cref="ShareWaitingLonger(double, double, double)"/>
    /// of its admitted patients. 0 where nobody waits (unlimited servers, no arrivals); null for an unstable unit,
    /// where it does not exist.
    /// </summary>
    public double? ShareWaitingLonger(UnitResult result)
    {
        ArgumentNullException.ThrowIfNull(result);
        if (!result.IsStable)
        {
            return null;
        }

        var unit = result.Unit;
        if (unit.Capacity is not null)
        {
            return ShareWaitingLonger(result.WaitProbability, result.MeanWaitHours ?? 0.0, WaitHours);
        }

        if (unit.Servers.IsUnlimited || !(result.ArrivalsPerHour > 0.0))
        {
            return 0.0;
        }

        // The mean service the solver used: the unit's own, or the patient groups' mixture (then a = λ·E[S] differs).
        double meanServiceHours = result.ArrivalsPerHour * unit.MeanServiceHours == result.OfferedLoad
            ? unit.MeanServiceHours
            : result.OfferedLoad / result.ArrivalsPerHour;
        return GgcFormulas.WaitLongerThan(unit.Servers.Count, result.ArrivalsPerHour, meanServiceHours, result.ArrivalScv, result.ServiceScv, WaitHours);
    }

    /// <summary>
    /// P(Wq &gt; t) ≈ C · exp(−t · C / Wq) from the chance of waiting C and the mean wait Wq: the wait of a patient who
    /// waits taken as exponential with the mean Wq / C, as <see cref="GgcFormulas.WaitLongerThan"/> does. Used for a unit
    /// with a capacity (M/M/c/K), where it is an approximation: the exact conditional wait there is a mixture of Erlang
    /// distributions cut off at the capacity, so the approximation overstates the far tail. 0 when Wq is 0.
    /// </summary>
    /// <param name="waitProbability">C, in [0, 1].</param>
    /// <param name="meanWaitHours">Wq in hours, not negative.</param>
    /// <param name="waitHours">t in hours, not negative.</param>
    public static double ShareWaitingLonger(double waitProbability, double meanWaitHours, double waitHours) =>
        meanWaitHours > 0.0 && waitProbability > 0.0 ? waitProbability * Math.Exp(-waitHours * waitProbability / meanWaitHours) : 0.0;
}
