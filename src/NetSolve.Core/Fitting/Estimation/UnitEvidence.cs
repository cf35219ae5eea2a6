using System.Collections.Immutable;

namespace NetSolve.Fitting.Estimation;

/// <summary>The evidence behind one fitted unit: counts, estimates with their 95% intervals, and warnings.</summary>
/// <param name="UnitId">The unit.</param>
/// <param name="Stay">The stay (service time) evidence, censoring taken into account.</param>
/// <param name="Entries">Patients entering the hospital here, as a rate with its exact Poisson interval.</param>
/// <param name="Arrivals">Stays that began inside the extract, as a rate (all arrivals to the unit, routed ones included).</param>
/// <param name="Routes">Routing fractions out of the unit with their Wilson intervals, by destination id.</param>
/// <param name="Waits">Observed waits; null when the extract records no start of service.</param>
/// <param name="Servers">The servers given or estimated; null when unknown.</param>
/// <param name="NeverQueued">No patient waited here, so <paramref name="Servers"/> is only a lower bound.</param>
/// <param name="Load">The load on <paramref name="Servers"/>; null without servers or a mean stay.</param>
/// <param name="Profile">The hour-of-day and day-of-week profiles of the unit's entries.</param>
/// <param name="Warnings">Thin-data warnings, in a fixed order.</param>
public sealed record UnitEvidence(
    string UnitId,
    StayEvidence Stay,
    RateEvidence Entries,
    RateEvidence Arrivals,
    ImmutableArray<RouteEvidence> Routes,
    WaitEvidence? Waits,
    int? Servers,
    bool NeverQueued,
    LoadEvidence? Load,
    ArrivalProfileEstimate Profile,
    ImmutableArray<FitWarning> Warnings);
