namespace NetSolve.Solving;

/// <summary>All groups together at one unit: the total flow and the service-time mixture that flow brings.</summary>
/// <remarks>
/// Immutable. Rates per hour, times in hours; every value finite and not negative. With no flow the unit's own mean
/// and squared coefficient of variation are given, so a unit nobody reaches still has a defined service time.
/// </remarks>
/// <param name="ArrivalsPerHour">λ_i = Σ_g λ_g,i.</param>
/// <param name="MeanServiceHours">E[S] = Σ_g (λ_g,i / λ_i) m_g,i.</param>
/// <param name="ServiceScv">cs² = E[S²] / E[S]² − 1 with E[S²] = Σ_g (λ_g,i / λ_i) m_g,i² (1 + cs²_g,i).</param>
public sealed record UnitTraffic(double ArrivalsPerHour, double MeanServiceHours, double ServiceScv);
