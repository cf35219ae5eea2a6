using System.Runtime.InteropServices;

namespace NetSolve.Simulation;

/// <summary>One pending event, 16 bytes: a service completion, or the next candidate arrival of a patient group.</summary>
/// <param name="Time">Simulation time in hours.</param>
/// <param name="Unit">The unit finishing service, or the group for an arrival.</param>
/// <param name="Patient">The patient finishing service, or <see cref="ArrivalMarker"/> for an arrival.</param>
[StructLayout(LayoutKind.Sequential)]
internal readonly record struct SimulationEvent(double Time, int Unit, int Patient)
{
    /// <summary>The <see cref="Patient"/> value of a group-arrival event.</summary>
    public const int ArrivalMarker = -1;

    /// <summary>True for a group-arrival event.</summary>
    public bool IsArrival => Patient == ArrivalMarker;
}
