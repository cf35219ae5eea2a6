namespace NetSolve.Solving;

/// <summary>One patient group's traffic at one unit: its flow, its visits per patient and its service time there.</summary>
/// <remarks>Immutable. Rates per hour, times in hours; every value finite and not negative.</remarks>
/// <param name="ArrivalsPerHour">λ_g,i: the group's flow into the unit from its own traffic equations; 0 when the group never reaches it.</param>
/// <param name="VisitsPerPatient">λ_g,i / Λ_g: mean visits to the unit per patient of the group; 0 when the group has no external arrivals.</param>
/// <param name="MeanServiceHours">m_g,i: the group's mean service at the unit (its own service there, else the unit's).</param>
/// <param name="ServiceScv">cs²_g,i: the squared coefficient of variation of that service time (1 is exponential).</param>
public sealed record GroupUnitFlow(double ArrivalsPerHour, double VisitsPerPatient, double MeanServiceHours, double ServiceScv);
