using System.Collections.Immutable;

namespace NetSolve.Fitting.Estimation;

/// <summary>Entries counted per slot (hour of day or day of week) beside the hours of extract each slot covered.</summary>
/// <param name="Entries">Entries per slot.</param>
/// <param name="ExposureHours">Hours of extract per slot.</param>
/// <param name="Decision">Whether the slots' shape is written.</param>
/// <param name="PValue">The chi-squared test's p-value against a constant rate; null when not tested (too little data).</param>
public sealed record ProfileSlots(ImmutableArray<int> Entries, ImmutableArray<double> ExposureHours, ProfileDecision Decision, double? PValue)
{
    /// <summary>Each slot's rate (entries per hour of exposure), 0 for a slot the extract never covered.</summary>
    public ImmutableArray<double> RatesPerHour =>
        [.. Entries.Select((count, slot) => ExposureHours[slot] > 0.0 ? count / ExposureHours[slot] : 0.0)];
}
