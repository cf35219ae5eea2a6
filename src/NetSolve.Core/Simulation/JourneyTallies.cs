namespace NetSolve.Simulation;

/// <summary>
/// What one replication recorded for the network's journeys, per journey and group (slot journey × groups + group,
/// group 0 the patients of no named group), kept whole so that replications can be pooled like the units' times.
/// </summary>
/// <param name="Times">Each slot's journey times, in hours.</param>
/// <param name="Counts">Each slot's journeys recorded.</param>
/// <param name="SumHours">Each slot's total journey time, in hours.</param>
/// <param name="Over">Each slot's journeys longer than each of the journey's times t, in the journey's order.</param>
internal sealed record JourneyTallies(
    IReadOnlyList<DurationHistogram> Times,
    IReadOnlyList<long> Counts,
    IReadOnlyList<double> SumHours,
    IReadOnlyList<long[]> Over);
