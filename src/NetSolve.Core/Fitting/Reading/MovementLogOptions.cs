using System.Collections.Immutable;
using NodaTime;

namespace NetSolve.Fitting.Reading;

/// <summary>How a movement log is read: its window, its clock, how journeys split, and how names become units.</summary>
public sealed record MovementLogOptions
{
    /// <summary>Default gap between two stays of one patient past which the second starts a new journey: 24 hours.</summary>
    public static readonly Duration DefaultNewJourneyAfter = Duration.FromHours(24);

    /// <summary>Reading with every default: UTC, the window the file spans, 24-hour journeys, names as written.</summary>
    public static readonly MovementLogOptions Default = new();

    /// <summary>When the extract begins; stays that arrived earlier were already running. Null: the earliest arrival.</summary>
    public Instant? ExtractStart { get; init; }

    /// <summary>When the extract was taken; an empty <c>left</c> means still in the unit then. Null: the latest time in the file.</summary>
    public Instant? ExtractEnd { get; init; }

    /// <summary>The zone local times (those without an offset) are read in.</summary>
    public DateTimeZone TimeZone { get; init; } = DateTimeZone.Utc;

    /// <summary>A gap between a patient's stays longer than this starts a new journey (a readmission).</summary>
    public Duration NewJourneyAfter { get; init; } = DefaultNewJourneyAfter;

    /// <summary>Whether unit names differing only in letter case (<c>ED</c>, <c>ed</c>) are one unit.</summary>
    public bool IgnoreCase { get; init; }

    /// <summary>Whether any messy row (duplicate, readmission, overlap, zero or negative stay, unknown column, row out of order) is an error.</summary>
    public bool Strict { get; init; }

    /// <summary>Names in the log mapped to the unit id (and label) to use; names not listed get an id made from the name.</summary>
    public ImmutableDictionary<string, UnitMapEntry> UnitMap { get; init; } = ImmutableDictionary<string, UnitMapEntry>.Empty;
}
