using System.Runtime.InteropServices;

namespace NetSolve.Simulation;

/// <summary>
/// A patient waiting in a unit's queue, with what starting their service reads: 16 bytes, four to a cache line.
/// </summary>
/// <remarks>
/// Kept in the queue itself rather than in a record per patient: the service starts when the patient reaches the
/// head of the queue, long after they joined it, so a separate record would have left the cache by then and cost a
/// miss, where the queue's head is read anyway.
/// </remarks>
/// <param name="Patient">The patient's index in the engine's pool.</param>
/// <param name="Group">The patient's group: 0 for the default group.</param>
/// <param name="UnitArrival">When the patient arrived at the unit, in hours.</param>
[StructLayout(LayoutKind.Sequential)]
internal readonly record struct QueuedPatient(int Patient, int Group, double UnitArrival);
