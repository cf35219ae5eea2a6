using System.Collections.Immutable;
using NetSolve.Model;

namespace NetSolve.Analysis;

/// <summary>
/// A journey's time per patient by the formula (<see cref="JourneyFormula"/>): the absorption time of a phase-type
/// distribution over the routing chain restricted to the journey's units. Times in hours, rates per hour. Immutable.
/// </summary>
/// <param name="Journey">The journey.</param>
/// <param name="Group">The patient group these figures are for; null for every patient.</param>
/// <param name="PerHour">Journeys started per hour: the flow into the set from outside it.</param>
/// <param name="MeanHours">Mean journey time; null when a unit of the set is unstable or no patient enters the set.</param>
/// <param name="Percentiles">The 50th, 90th, 95th and 99th percentiles; empty where <paramref name="MeanHours"/> is null.</param>
/// <param name="Over">P(journey time &gt; t) for each of the journey's times t; empty where <paramref name="MeanHours"/> is null.</param>
public sealed record JourneyEstimate(
    Journey Journey,
    PatientGroup? Group,
    double PerHour,
    double? MeanHours,
    ImmutableArray<JourneyPercentile> Percentiles,
    ImmutableArray<JourneyShareOver> Over);
