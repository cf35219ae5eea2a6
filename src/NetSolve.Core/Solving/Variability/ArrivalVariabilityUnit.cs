using NetSolve.Model;

namespace NetSolve.Solving;

/// <summary>What the arrival-variability equations need to know about one unit.</summary>
/// <remarks>
/// Rates are per hour; squared coefficients of variation (SCV, variance / mean²) are dimensionless. 1 is the value of
/// Poisson arrivals and exponential service. <see cref="ArrivalVariability.Solve(IReadOnlyList{ArrivalVariabilityUnit}, IReadOnlyList{ArrivalVariabilityRoute})"/> checks every field.
/// </remarks>
/// <param name="ArrivalsPerHour">Total flow into the unit from the traffic equations; finite and not negative.</param>
/// <param name="Servers">The unit's servers; for <see cref="Servers.Unlimited"/> <paramref name="Utilisation"/> is not used.</param>
/// <param name="Utilisation">Load per server ρ, finite and not negative; 1 or more is treated as exactly 1 (a saturated unit).</param>
/// <param name="ServiceScv">Squared coefficient of variation of the service time, finite and not negative; 1 is exponential.</param>
public sealed record ArrivalVariabilityUnit(double ArrivalsPerHour, Servers Servers, double Utilisation, double ServiceScv)
{
    /// <summary>Patients per hour arriving at the unit from outside the network; finite and not negative; 0 by default.</summary>
    public double ExternalPerHour { get; init; }

    /// <summary>Squared coefficient of variation of the external inter-arrival times; finite and not negative; 1 (Poisson) by default.</summary>
    public double ExternalScv { get; init; } = 1.0;
}
