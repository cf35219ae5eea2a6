using System.Collections.Immutable;
using NetSolve.Analysis;
using NetSolve.Simulation;
using NetSolve.Solving;

namespace NetSolve.Presentation.Simulation;

/// <summary>One simulated unit with what its row needs from the rest of the run: its status and the network's entry rate.</summary>
/// <param name="Simulated">The unit's simulated metrics.</param>
/// <param name="Status">The contract's status of the simulated unit (<see cref="SimulationStatus"/>).</param>
/// <param name="EnteredPerHour">Patients entering the network per hour, as simulated: the base of visits per patient.</param>
public sealed record SimulatedUnitRow(SimulatedUnit Simulated, UnitStatus Status, double EnteredPerHour)
{
    /// <summary>Simulated arrivals times the mean service time, in erlangs.</summary>
    public double OfferedLoad => Simulated.ArrivalsPerHour.Mean * Simulated.Unit.EffectiveService.MeanHours;

    /// <summary>Mean visits per patient entering the network; 0 when nobody entered.</summary>
    public double VisitsPerPatient => EnteredPerHour > 0.0 ? Simulated.ArrivalsPerHour.Mean / EnteredPerHour : 0.0;

    /// <summary>Servers over offered load; absent for unlimited servers or no load.</summary>
    public double? Headroom => !Simulated.Unit.Servers.IsUnlimited && OfferedLoad > 0.0 ? Simulated.Unit.Servers.Count / OfferedLoad : null;

    /// <summary>The rows of <paramref name="result"/>, in file order.</summary>
    public static ImmutableArray<SimulatedUnitRow> Of(SimulationResult result, double strainThreshold = Defaults.StrainThreshold)
    {
        ArgumentNullException.ThrowIfNull(result);
        var statuses = SimulationStatus.Of(result, strainThreshold);
        double entered = result.Totals?.EnteredPerHour.Mean ?? 0.0;
        return [.. result.Units.Select((unit, i) => new SimulatedUnitRow(unit, statuses[i], entered))];
    }
}
