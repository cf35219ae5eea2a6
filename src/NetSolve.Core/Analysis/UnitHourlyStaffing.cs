using System.Collections.Immutable;

namespace NetSolve.Analysis;

/// <summary>One unit's roster from <see cref="HourlyStaffingSearch"/> and how it does hour by hour. Immutable.</summary>
/// <remarks>Arrays run over the cycle: 24 hours (00–01 first), or 168 from Monday 00:00 when arrivals vary by day.</remarks>
public sealed record UnitHourlyStaffing
{
    /// <summary>The unit's id.</summary>
    public required string UnitId { get; init; }

    /// <summary>How the waits were found: the exact chain (up to 50 servers) or MOL (more).</summary>
    public required string Method { get; init; }

    /// <summary>Mean offered load in each hour, in erlangs.</summary>
    public required ImmutableArray<double> OfferedLoadByHour { get; init; }

    /// <summary>Mean arrivals per hour in each hour.</summary>
    public required ImmutableArray<double> ArrivalsPerHourByHour { get; init; }

    /// <summary>The fewest servers in each hour found to meet the targets.</summary>
    public required ImmutableArray<int> ServersByHour { get; init; }

    /// <summary>Predicted mean wait in hours of patients arriving in each hour.</summary>
    public required ImmutableArray<double> MeanWaitHoursByHour { get; init; }

    /// <summary>Predicted share of patients arriving in each hour who wait longer than the tail target's time; empty without one.</summary>
    public required ImmutableArray<double> WaitOverByHour { get; init; }

    /// <summary>Whether each hour meets every target by the method; all true unless the search ran out of evaluations.</summary>
    public required ImmutableArray<bool> MeetsByHour { get; init; }

    /// <summary>The fewest servers, the same all day, with which every hour meets the targets by the same method.</summary>
    public required int FlatServers { get; init; }

    /// <summary>Solves of the whole cycle the search made for this unit (at most <see cref="HourlyStaffingOptions.MaxEvaluations"/>).</summary>
    public int Evaluations { get; init; }

    /// <summary>Server-hours over the cycle with the roster.</summary>
    public int StaffHours => ServersByHour.Sum();

    /// <summary>Server-hours over the cycle with <see cref="FlatServers"/> all the time.</summary>
    public int FlatStaffHours => FlatServers * ServersByHour.Length;

    /// <summary>Simulated mean wait in hours by hour, with the half-width of its 95% interval; empty when not simulated.</summary>
    public ImmutableArray<(double Mean, double? HalfWidth)> SimulatedMeanWaitHoursByHour { get; init; } = [];

    /// <summary>Whether each hour meets the targets in simulation within its interval; empty when not simulated.</summary>
    public ImmutableArray<bool> SimulationMeetsByHour { get; init; } = [];
}
