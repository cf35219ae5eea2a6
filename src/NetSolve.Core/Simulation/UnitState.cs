using System.Runtime.InteropServices;

namespace NetSolve.Simulation;

/// <summary>
/// One unit's mutable state and counters during a replication. The fields most events touch come first, in 64 bytes
/// (the size of a cache line); counters of rarer things (waits, full units) follow. Patients offered to the unit are
/// not counted apart: each is either accepted or finds the unit full, so offered = <see cref="Accepted"/> +
/// <see cref="Full"/>. Padded to 128 bytes, two whole lines when kept aligned (<see cref="UnitStateBlock"/>): the
/// first holds what a service start or end reads and writes, the second the rest.
/// </summary>
[StructLayout(LayoutKind.Sequential, Size = 128)]
internal struct UnitState
{
    public int Busy;
    public int Queued;
    public int QueueHead;
    public int Servers;
    public int Capacity;
    public int DivertTo;
    public double BusyArea;
    public double SojournSum;
    public long Completions;
    public long Accepted;
    public long Starts;

    public long Waited;
    public double WaitSum;
    public double QueueArea;
    public long Full;
    public long TurnedAway;
    public long Diverted;
}
