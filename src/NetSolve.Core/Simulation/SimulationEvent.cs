using System.Runtime.InteropServices;

namespace NetSolve.Simulation;

/// <summary>
/// One pending event, 16 bytes: a service completion, the next candidate arrival of a patient group, or the next
/// change of hour for a unit with a roster.
/// </summary>
/// <param name="Time">Simulation time in hours.</param>
/// <param name="Unit">The unit finishing service or changing its servers, or the group for an arrival.</param>
/// <param name="Patient">
/// The patient finishing service, <see cref="ArrivalMarker"/> for an arrival or <see cref="RosterMarker"/> for a change of hour.
/// </param>
[StructLayout(LayoutKind.Sequential)]
internal readonly record struct SimulationEvent(double Time, int Unit, int Patient)
{
    /// <summary>The <see cref="Patient"/> value of a group-arrival event.</summary>
    public const int ArrivalMarker = -1;

    /// <summary>The <see cref="Patient"/> value of a roster's change-of-hour event.</summary>
    public const int RosterMarker = -2;

    /// <summary>True for a group-arrival event.</summary>
    public bool IsArrival => Patient == ArrivalMarker;

    /// <summary>True for a service completion: a patient leaves a server.</summary>
    public bool IsServiceEnd => Patient >= 0;
}
