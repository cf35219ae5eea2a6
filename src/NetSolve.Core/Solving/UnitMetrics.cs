using NetSolve.Model;

namespace NetSolve.Solving;

/// <summary>Per-unit steady-state metrics: M/M/c by Erlang C, M/M/inf for unlimited servers.</summary>
/// <remarks>Status is left as <see cref="UnitStatus.Ok"/> or <see cref="UnitStatus.Unstable"/>; <see cref="StatusRule"/> assigns the rest.</remarks>
public static class UnitMetrics
{
    /// <summary>Metrics of <paramref name="unit"/> when patients arrive at <paramref name="arrivalsPerHour"/>.</summary>
    /// <param name="unit">The unit.</param>
    /// <param name="arrivalsPerHour">Total flow into the unit, finite and not negative.</param>
    /// <param name="externalArrivalsPerHour">Total external arrivals of the network, for visits per patient.</param>
    public static UnitResult Compute(Unit unit, double arrivalsPerHour, double externalArrivalsPerHour)
    {
        ArgumentNullException.ThrowIfNull(unit);
        double offeredLoad = arrivalsPerHour * unit.MeanServiceHours;
        double visits = externalArrivalsPerHour > 0.0 ? arrivalsPerHour / externalArrivalsPerHour : 0.0;

        if (unit.Servers.IsUnlimited || arrivalsPerHour <= 0.0)
        {
            bool unlimited = unit.Servers.IsUnlimited;
            return new UnitResult
            {
                Unit = unit,
                ArrivalsPerHour = arrivalsPerHour,
                VisitsPerPatient = visits,
                OfferedLoad = offeredLoad,
                Utilisation = unlimited ? 0.0 : offeredLoad / unit.Servers.Count,
                WaitProbability = 0.0,
                MeanQueue = 0.0,
                MeanWaitHours = 0.0,
                MeanInUnit = offeredLoad,
                MeanTimeInUnitHours = unit.MeanServiceHours,
                Headroom = null,
                Status = UnitStatus.Ok,
                Method = unlimited ? MethodNames.InfiniteServers : MethodNames.ErlangC,
            };
        }

        int servers = unit.Servers.Count;
        double utilisation = offeredLoad / servers;
        double headroom = servers / offeredLoad;
        if (utilisation >= 1.0)
        {
            return new UnitResult
            {
                Unit = unit,
                ArrivalsPerHour = arrivalsPerHour,
                VisitsPerPatient = visits,
                OfferedLoad = offeredLoad,
                Utilisation = utilisation,
                WaitProbability = 1.0,
                MeanQueue = null,
                MeanWaitHours = null,
                MeanInUnit = null,
                MeanTimeInUnitHours = null,
                Headroom = headroom,
                Status = UnitStatus.Unstable,
            };
        }

        double waitProbability = ErlangFormulas.WaitProbability(servers, offeredLoad);
        double meanQueue = waitProbability * utilisation / (1.0 - utilisation);
        double meanWaitHours = meanQueue / arrivalsPerHour;
        return new UnitResult
        {
            Unit = unit,
            ArrivalsPerHour = arrivalsPerHour,
            VisitsPerPatient = visits,
            OfferedLoad = offeredLoad,
            Utilisation = utilisation,
            WaitProbability = waitProbability,
            MeanQueue = meanQueue,
            MeanWaitHours = meanWaitHours,
            MeanInUnit = meanQueue + offeredLoad,
            MeanTimeInUnitHours = meanWaitHours + unit.MeanServiceHours,
            Headroom = headroom,
            Status = UnitStatus.Ok,
        };
    }
}
