using System.Runtime.InteropServices;

namespace NetSolve.Simulation;

/// <summary>A patient in the network: when they entered it and their current unit, and their group. Pooled by index.</summary>
[StructLayout(LayoutKind.Sequential)]
internal struct PatientRecord
{
    /// <summary>Time the patient entered the network, in hours.</summary>
    public double NetworkEntry;

    /// <summary>Time the patient arrived at the current unit, in hours.</summary>
    public double UnitArrival;

    /// <summary>Time the patient's service at the current unit started, in hours (once it has).</summary>
    public double ServiceStart;

    /// <summary>Group index: 0 for the default group.</summary>
    public int Group;
}
