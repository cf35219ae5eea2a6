using System.Collections.Immutable;
using NetSolve.Model;

namespace NetSolve.Solving;

/// <summary>Steady-state metrics of one unit. Times in hours, rates per hour; never NaN or infinite.</summary>
/// <remarks>For an unstable unit the queue and time metrics are null (they do not exist).</remarks>
public sealed record UnitResult
{
    /// <summary>The unit these metrics describe.</summary>
    public required Unit Unit { get; init; }

    /// <summary>Total flow into the unit (λ), from the traffic equations.</summary>
    public required double ArrivalsPerHour { get; init; }

    /// <summary>Mean visits per patient entering the network: λ / total external arrivals.</summary>
    public required double VisitsPerPatient { get; init; }

    /// <summary>Offered load a = λ / μ in erlangs.</summary>
    public required double OfferedLoad { get; init; }

    /// <summary>ρ = a / c; 0 for unlimited servers.</summary>
    public required double Utilisation { get; init; }

    /// <summary>Erlang C: the chance an arriving patient waits; 1 when unstable, 0 for unlimited servers.</summary>
    public required double WaitProbability { get; init; }

    /// <summary>Mean number waiting (Lq); null when unstable.</summary>
    public required double? MeanQueue { get; init; }

    /// <summary>Mean wait before service (Wq) in hours; null when unstable.</summary>
    public required double? MeanWaitHours { get; init; }

    /// <summary>Mean number in the unit, waiting or in service (L); null when unstable.</summary>
    public required double? MeanInUnit { get; init; }

    /// <summary>Mean time in the unit (W) in hours; null when unstable.</summary>
    public required double? MeanTimeInUnitHours { get; init; }

    /// <summary>c / a: how far all external arrivals can grow before this unit saturates; null if unlimited or unreached.</summary>
    public required double? Headroom { get; init; }

    /// <summary>The method the metrics come from (<see cref="MethodNames"/>); docs/methods.md says when each applies.</summary>
    public string Method { get; init; } = MethodNames.ErlangC;

    /// <summary>Squared coefficient of variation of the arrivals the unit sees (1 for Poisson).</summary>
    public double ArrivalScv { get; init; } = 1.0;

    /// <summary>Squared coefficient of variation of the service time the formulas used (1 for exponential).</summary>
    public double ServiceScv { get; init; } = 1.0;

    /// <summary>The chance an arriving patient finds the unit at its capacity; 0 for a unit without a capacity.</summary>
    public double PFull { get; init; }

    /// <summary>Patients turned away per hour because the unit is full (they leave the network).</summary>
    public double TurnedAwayPerHour { get; init; }

    /// <summary>Patients diverted per hour to another unit because this one is full.</summary>
    public double DivertedPerHour { get; init; }

    /// <summary>Status under the contract's rules.</summary>
    public required UnitStatus Status { get; init; }

    /// <summary>The unit's targets (<see cref="Unit.Targets"/>) it misses, in <see cref="TargetKind"/> order; empty when none is set or all are met.</summary>
    public ImmutableArray<TargetKind> TargetsBreached { get; init; } = [];

    /// <summary>True when utilisation is below 1 (always for unlimited servers).</summary>
    public bool IsStable => Status != UnitStatus.Unstable;
}
