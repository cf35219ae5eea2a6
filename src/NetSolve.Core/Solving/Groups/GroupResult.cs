using System.Collections.Immutable;

namespace NetSolve.Solving;

/// <summary>One patient group's results: its arrivals, its throughput, its time and patients in the network, its visits.</summary>
/// <remarks>
/// Immutable. Rates per hour, times in hours; no value is NaN or infinite. Computed as in docs/methods.md, "Patient
/// groups": T_g = Σ_i v_g,i (W_i + m_g,i) with each unit's mean wait W_i, and L_g = Λ_g T_g by Little's law.
/// </remarks>
/// <param name="Id">The group id: <see cref="GroupTraffic.DefaultGroupId"/> for the network's top-level arrivals and routes.</param>
/// <param name="Label">The group's display name.</param>
/// <param name="ExternalArrivalsPerHour">Λ_g: the group's external arrivals per hour, all units together.</param>
/// <param name="ThroughputPerHour">The group's patients leaving the network per hour: Λ_g in steady state.</param>
/// <param name="MeanTimeInNetworkHours">T_g; null when the group visits a unit that has no mean wait (an unstable unit).</param>
/// <param name="MeanInNetwork">L_g, the group's mean number of patients in the network; null where T_g is.</param>
/// <param name="VisitsPerPatient">v_g,i: mean visits per patient of the group to each unit, by unit position.</param>
public sealed record GroupResult(
    string Id,
    string Label,
    double ExternalArrivalsPerHour,
    double ThroughputPerHour,
    double? MeanTimeInNetworkHours,
    double? MeanInNetwork,
    ImmutableArray<double> VisitsPerPatient);
