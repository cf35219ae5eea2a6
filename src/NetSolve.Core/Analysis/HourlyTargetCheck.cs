using NetSolve.Solving;

namespace NetSolve.Analysis;

/// <summary>
/// How far each hour of a unit is from the targets: the largest of measure ÷ target over the targets set, so an hour
/// meets them all when it is at most 1. Mean wait and P(wait) come from <see cref="HourlyWaits"/>; P(wait &gt; t) is
/// C·exp(−t·C/Wq) (<see cref="WaitTailTarget.ShareWaitingLonger(double, double, double)"/>: exact for an M/M/c unit
/// in steady state, the hour's own C and Wq otherwise); utilisation is the hour's offered load ÷ its servers.
/// </summary>
internal static class HourlyTargetCheck
{
    /// <summary>Measure ÷ target in each hour; +∞ in every hour when <paramref name="waits"/> is unstable.</summary>
    public static double[] Ratios(HourlyWaits waits, IReadOnlyList<double> offeredLoad, IReadOnlyList<int> servers, double meanServiceHours, StaffingTargets targets)
    {
        int hours = offeredLoad.Count;
        var ratios = new double[hours];
        for (int h = 0; h < hours; h++)
        {
            if (!waits.IsStable)
            {
                ratios[h] = double.PositiveInfinity;
                continue;
            }

            double wait = waits.MeanWaitHoursByHour[h];
            double worst = 0.0;
            if (targets.MaxMeanWaitHours is double maxWait)
            {
                worst = Math.Max(worst, Ratio(wait, maxWait));
            }

            if (targets.MaxMeanTimeInUnitHours is double maxTime)
            {
                worst = Math.Max(worst, Ratio(wait + meanServiceHours, maxTime));
            }

            if (targets.WaitTail is WaitTailTarget tail)
            {
                worst = Math.Max(worst, Ratio(WaitOver(waits, h, tail), tail.MaxProbability));
            }

            if (targets.MaxUtilisation is double maxUtil)
            {
                worst = Math.Max(worst, servers[h] == 0 ? (offeredLoad[h] > 0.0 ? double.PositiveInfinity : 0.0) : Ratio(offeredLoad[h] / servers[h], maxUtil));
            }

            ratios[h] = worst;
        }

        return ratios;
    }

    /// <summary>P(wait &gt; t) of patients arriving in hour <paramref name="hour"/>.</summary>
    public static double WaitOver(HourlyWaits waits, int hour, WaitTailTarget tail) =>
        WaitTailTarget.ShareWaitingLonger(waits.WaitProbabilityByHour[hour], waits.MeanWaitHoursByHour[hour], tail.WaitHours);

    /// <summary>True when a ratio meets its target, allowing <see cref="StaffingSearch.TargetTolerance"/>.</summary>
    public static bool Meets(double ratio) => ratio <= 1.0 + StaffingSearch.TargetTolerance;

    private static double Ratio(double measure, double target) => target > 0.0
        ? measure / target
        : measure > StaffingSearch.TargetTolerance ? double.PositiveInfinity : 0.0;
}
