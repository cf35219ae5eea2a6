using NetSolve.Model;

namespace NetSolve.Solving;

/// <summary>
/// Per-unit steady-state metrics: M/G/inf for unlimited servers; G/G/c waits by <see cref="GgcFormulas"/> (Erlang C,
/// exactly, for Poisson arrivals and exponential service); M/M/c/K or the Erlang loss formula for a unit with a
/// capacity (<see cref="FiniteCapacityFormulas"/>). docs/methods.md gives each method, its source and its accuracy.
/// </summary>
/// <remarks>Status is left as <see cref="UnitStatus.Ok"/> or <see cref="UnitStatus.Unstable"/>; <see cref="StatusRule"/> assigns the rest.</remarks>
public static class UnitMetrics
{
    /// <summary>Metrics of <paramref name="unit"/> with Poisson arrivals and its own mean service (exponential).</summary>
    /// <param name="unit">The unit.</param>
    /// <param name="arrivalsPerHour">Total flow into the unit, finite and not negative.</param>
    /// <param name="externalArrivalsPerHour">Total external arrivals of the network, for visits per patient.</param>
    public static UnitResult Compute(Unit unit, double arrivalsPerHour, double externalArrivalsPerHour)
    {
        ArgumentNullException.ThrowIfNull(unit);
        return Compute(unit, arrivalsPerHour, externalArrivalsPerHour, unit.MeanServiceHours, 1.0, 1.0);
    }

    /// <summary>Metrics of a unit without a capacity, fed at <paramref name="arrivalsPerHour"/> with the given variability.</summary>
    /// <param name="unit">The unit.</param>
    /// <param name="arrivalsPerHour">Total flow into the unit, finite and not negative.</param>
    /// <param name="externalArrivalsPerHour">Total external arrivals of the network, for visits per patient.</param>
    /// <param name="meanServiceHours">Mean service of the patients who come (the mixture over groups), positive.</param>
    /// <param name="arrivalScv">Squared coefficient of variation of the arrivals (1: Poisson).</param>
    /// <param name="serviceScv">Squared coefficient of variation of the service time (1: exponential).</param>
    public static UnitResult Compute(Unit unit, double arrivalsPerHour, double externalArrivalsPerHour, double meanServiceHours, double arrivalScv, double serviceScv)
    {
        ArgumentNullException.ThrowIfNull(unit);
        double offeredLoad = arrivalsPerHour * meanServiceHours;
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
                MeanTimeInUnitHours = meanServiceHours,
                Headroom = null,
                Status = UnitStatus.Ok,
                Method = unlimited ? MethodNames.InfiniteServers : GgcFormulas.MethodFor(unit.Servers.Count, arrivalScv, serviceScv),
                ArrivalScv = arrivalScv,
                ServiceScv = serviceScv,
            };
        }

        int servers = unit.Servers.Count;
        // The service's shape matters only for a service more variable than exponential; otherwise no distribution is made.
        var shape = serviceScv > 1.0 ? unit.EffectiveService : null;
        var estimate = GgcFormulas.Estimate(servers, arrivalsPerHour, meanServiceHours, arrivalScv, serviceScv, shape);
        return new UnitResult
        {
            Unit = unit,
            ArrivalsPerHour = arrivalsPerHour,
            VisitsPerPatient = visits,
            OfferedLoad = offeredLoad,
            Utilisation = estimate.Utilisation,
            WaitProbability = estimate.WaitProbability,
            MeanQueue = estimate.MeanQueue,
            MeanWaitHours = estimate.MeanWaitHours,
            MeanInUnit = estimate.MeanInUnit,
            MeanTimeInUnitHours = estimate.MeanTimeInUnitHours,
            Headroom = servers / offeredLoad,
            Status = estimate.IsStable ? UnitStatus.Ok : UnitStatus.Unstable,
            Method = estimate.Method,
            ArrivalScv = arrivalScv,
            ServiceScv = serviceScv,
        };
    }

    /// <summary>
    /// Metrics of a unit with a capacity offered <paramref name="offeredPerHour"/>: the admitted patients' waits and
    /// the chance of finding it full. A full unit loses patients instead of queueing without limit, so it is never
    /// unstable and has no headroom (it does not saturate).
    /// </summary>
    /// <param name="unit">The unit; <see cref="Unit.Capacity"/> is set.</param>
    /// <param name="offeredPerHour">Patients arriving at the unit, admitted or not.</param>
    /// <param name="externalArrivalsPerHour">Total external arrivals of the network, for visits per patient.</param>
    /// <param name="meanServiceHours">Mean service of the patients who come.</param>
    /// <param name="finite">The unit's M/M/c/K or Erlang loss result at that offered rate.</param>
    /// <param name="arrivalScv">Arrival variability, reported (the capacity formulas assume Poisson arrivals).</param>
    /// <param name="serviceScv">Service variability, reported (exact for the loss formula, assumed 1 by M/M/c/K).</param>
    public static UnitResult ComputeFinite(Unit unit, double offeredPerHour, double externalArrivalsPerHour, double meanServiceHours,
        FiniteCapacityResult finite, double arrivalScv, double serviceScv)
    {
        ArgumentNullException.ThrowIfNull(unit);
        ArgumentNullException.ThrowIfNull(finite);
        double admitted = finite.AdmittedPerHour;
        bool diverts = !unit.WhenFull.IsTurnAway;
        return new UnitResult
        {
            Unit = unit,
            ArrivalsPerHour = admitted,
            VisitsPerPatient = externalArrivalsPerHour > 0.0 ? admitted / externalArrivalsPerHour : 0.0,
            OfferedLoad = admitted * meanServiceHours,
            Utilisation = finite.Utilisation,
            WaitProbability = finite.WaitProbability,
            MeanQueue = finite.MeanQueue,
            MeanWaitHours = finite.MeanWaitHours,
            MeanInUnit = finite.MeanInUnit,
            MeanTimeInUnitHours = finite.MeanTimeInUnitHours,
            Headroom = null,
            Status = UnitStatus.Ok,
            Method = finite.Method,
            ArrivalScv = arrivalScv,
            ServiceScv = serviceScv,
            PFull = finite.FullProbability,
            TurnedAwayPerHour = diverts ? 0.0 : finite.BlockedPerHour,
            DivertedPerHour = diverts ? finite.BlockedPerHour : 0.0,
        };
    }
}
