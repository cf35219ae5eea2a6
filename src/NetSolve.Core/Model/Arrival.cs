namespace NetSolve.Model;

/// <summary>Patients arriving at a unit from outside the network.</summary>
/// <param name="UnitId">The unit they arrive at.</param>
/// <param name="PerHour">Mean arrivals per hour; finite and not negative.</param>
public sealed record Arrival(string UnitId, double PerHour);
