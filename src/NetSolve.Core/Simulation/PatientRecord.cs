using System.Runtime.InteropServices;

namespace NetSolve.Simulation;

/// <summary>
/// A patient in the network: when they entered it, when they joined the queue they wait in, and their group. Pooled
/// by index. A patient in service is described by their service-end event instead (<see cref="SimulationEvent"/>).
/// </summary>
[StructLayout(LayoutKind.Sequential)]
internal struct PatientRecord
{
    /// <summary>Time the patient entered the network, in hours.</summary>
    public double NetworkEntry;

    /// <summary>Time the patient arrived at the unit where they wait, in hours (written only when they queue).</summary>
    public double UnitArrival;

    /// <summary>Group index: 0 for the default group.</summary>
    public int Group;
}
