using System.Collections.Immutable;
using NetSolve.Simulation;
using NetSolve.Solving;

namespace NetSolve.Analysis;

/// <summary>
/// The contract's status words for simulated units: a unit without a capacity whose simulated arrivals × mean service
/// reach its servers is unstable (its queue only grows with run length); the rest follow <see cref="StatusRule"/> on
/// the simulated utilisation and headroom.
/// </summary>
public static class SimulationStatus
{
    /// <summary>One status per unit of <paramref name="result"/>, in file order.</summary>
    public static ImmutableArray<UnitStatus> Of(SimulationResult result, double strainThreshold = Defaults.StrainThreshold)
    {
        ArgumentNullException.ThrowIfNull(result);
        var units = result.Units.Select(simulated =>
        {
            var unit = simulated.Unit;
            double arrivals = simulated.ArrivalsPerHour.Mean;
            double offered = arrivals * unit.EffectiveService.MeanHours;
            bool finite = !unit.Servers.IsUnlimited;
            bool unstable = finite && unit.Capacity is null && offered >= unit.Servers.Count;
            return new UnitResult
            {
                Unit = unit,
                ArrivalsPerHour = arrivals,
                VisitsPerPatient = 0.0,
                OfferedLoad = offered,
                Utilisation = simulated.Utilisation.Mean,
                WaitProbability = simulated.WaitProbability.Mean,
                MeanQueue = simulated.MeanQueue.Mean,
                MeanWaitHours = simulated.MeanWaitHours.Mean,
                MeanInUnit = simulated.MeanInUnit.Mean,
                MeanTimeInUnitHours = simulated.MeanTimeInUnitHours.Mean,
                Headroom = finite && offered > 0.0 ? unit.Servers.Count / offered : null,
                Status = unstable ? UnitStatus.Unstable : UnitStatus.Ok,
            };
        }).ToList();
        return [.. StatusRule.Apply(units, strainThreshold).Select(unit => unit.Status)];
    }
}
