using System.Runtime.InteropServices;

namespace NetSolve.Simulation;

/// <summary>
/// One unit's mutable state and counters during a replication, kept together so an event touches one or two cache
/// lines per unit: the fields every event reads come first.
/// </summary>
[StructLayout(LayoutKind.Sequential)]
internal struct UnitState
{
    public int Busy;
    public int Queued;
    public int QueueHead;
    public int Servers;
    public int Capacity;
    public int DivertTo;
    public double BusyArea;
    public double QueueArea;
    public double InverseScale;
    public double WaitSum;
    public double SojournSum;
    public long Offered;
    public long Accepted;
    public long Full;
    public long TurnedAway;
    public long Diverted;
    public long Starts;
    public long Waited;
    public long Completions;
}
