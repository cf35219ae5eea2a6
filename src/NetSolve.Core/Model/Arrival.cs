namespace NetSolve.Model;

/// <summary>Patients arriving at a unit from outside the network.</summary>
/// <param name="UnitId">The unit they arrive at.</param>
/// <param name="PerHour">Mean arrivals per hour; finite and not negative.</param>
public sealed record Arrival(string UnitId, double PerHour)
{
    /// <summary>
    /// Coefficient of variation of the times between arrivals (standard deviation / mean); finite and not negative.
    /// 1, the default, is Poisson arrivals; 0 is arrivals exactly evenly spaced. From the file's <c>arrival_cv</c>.
    /// </summary>
    public double Cv { get; init; } = 1.0;
}
