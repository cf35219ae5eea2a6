using System.Collections.Immutable;
using NetSolve.Fitting.Reading;
using NodaTime;

namespace NetSolve.Fitting;

/// <summary>
/// A movement log as read: its units, its stays held compactly (about 40 bytes a stay, see <see cref="StayRow"/>) in
/// journeys, the extract's window, and the messy rows found. Immutable once read.
/// </summary>
public sealed class MovementLog
{
    internal MovementLog(ImmutableArray<LogUnit> units, StayTable rows, JourneyBuilder journeys, int patients, bool hasStartTimes,
        Instant extractStart, Instant extractEnd, MovementLogOptions options, LogProblemCounts problems)
    {
        Units = units;
        Rows = rows;
        Order = journeys.Order;
        Next = journeys.Next;
        Enters = journeys.Enters;
        Journeys = journeys.Journeys;
        Patients = patients;
        HasStartTimes = hasStartTimes;
        ExtractStart = extractStart;
        ExtractEnd = extractEnd;
        Options = options;
        Problems = problems;
    }

    /// <summary>The units, ordered by id.</summary>
    public ImmutableArray<LogUnit> Units { get; }

    /// <summary>Patients in the log.</summary>
    public int Patients { get; }

    /// <summary>Journeys: a patient readmitted after the new-journey gap has two.</summary>
    public long Journeys { get; }

    /// <summary>Stays kept (duplicates, stays of no length or running backwards, and stays outside the extract left out).</summary>
    public int Stays => Order.Length;

    /// <summary>Whether the log records start of service; without it waits count as service.</summary>
    public bool HasStartTimes { get; }

    /// <summary>When the extract begins: <c>--extract-start</c>, or the earliest arrival.</summary>
    public Instant ExtractStart { get; }

    /// <summary>When the extract was taken: <c>--extract-end</c>, or the latest time in the file.</summary>
    public Instant ExtractEnd { get; }

    /// <summary>The options the log was read with.</summary>
    public MovementLogOptions Options { get; }

    /// <summary>The messy rows found, counted by kind.</summary>
    public LogProblemCounts Problems { get; }

    internal StayTable Rows { get; }

    /// <summary>Row numbers of the stays kept, by patient and then time.</summary>
    internal int[] Order { get; }

    /// <summary>Per position in <see cref="Order"/>: the next unit or a <see cref="StayOutcome"/>.</summary>
    internal int[] Next { get; }

    /// <summary>Per position in <see cref="Order"/>: whether the stay begins a journey inside the extract.</summary>
    internal bool[] Enters { get; }

    internal long ExtractStartMs => ExtractStart.ToUnixTimeMilliseconds();

    internal long ExtractEndMs => ExtractEnd.ToUnixTimeMilliseconds();
}
