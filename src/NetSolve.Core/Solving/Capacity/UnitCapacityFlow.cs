namespace NetSolve.Solving;

/// <summary>The flows of one unit once bed limits are applied: offered, admitted, turned away and diverted.</summary>
/// <remarks>Immutable; rates per hour, finite and not negative. Offered = admitted + turned away + diverted.</remarks>
/// <param name="UnitId">The unit.</param>
/// <param name="OfferedPerHour">λ_i: patients arriving per hour (external, routed in, diverted in), before the limit.</param>
/// <param name="AdmittedPerHour">λ_i(1 − B_i): patients admitted per hour; equals offered for a unit without capacity.</param>
/// <param name="FullProbability">B_i: the chance an arriving patient finds the unit full; 0 without capacity.</param>
/// <param name="TurnedAwayPerHour">λ_i·B_i for a unit that turns patients away, else 0.</param>
/// <param name="DivertedPerHour">λ_i·B_i for a unit that diverts, else 0.</param>
/// <param name="DivertedInPerHour">Patients per hour diverted here from full units (included in the offered rate).</param>
/// <param name="Metrics">The finite-capacity metrics at the offered rate; null for a unit without capacity.</param>
public sealed record UnitCapacityFlow(
    string UnitId,
    double OfferedPerHour,
    double AdmittedPerHour,
    double FullProbability,
    double TurnedAwayPerHour,
    double DivertedPerHour,
    double DivertedInPerHour,
    FiniteCapacityResult? Metrics)
{
    /// <summary>Mean service (hours) of the patients offered to the unit: the mixture of the classes by their offered rates.</summary>
    public double MeanServiceHours { get; init; }

    /// <summary>Squared coefficient of variation of that mixture (1: exponential).</summary>
    public double ServiceScv { get; init; } = 1.0;
}
