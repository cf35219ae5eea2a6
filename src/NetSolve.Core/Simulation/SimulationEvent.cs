using System.Runtime.InteropServices;

namespace NetSolve.Simulation;

/// <summary>
/// One pending event: a service completion, the next candidate arrival of a patient group, or the next change of
/// hour for a unit with a roster.
/// </summary>
/// <param name="Time">Simulation time in hours.</param>
/// <param name="Unit">The unit finishing service or changing its servers, or the group for an arrival.</param>
/// <param name="Patient">
/// The patient finishing service, <see cref="ArrivalMarker"/> for an arrival or <see cref="RosterMarker"/> for a change of hour.
/// </param>
/// <remarks>
/// A service completion also carries what its handling reads of the patient (<see cref="Group"/>,
/// <see cref="UnitArrival"/>, <see cref="ServiceStart"/>): the event's own slot is read anyway, and the patient's
/// record, written long before, would be a second cache miss on every service end, one that the next event waits for
/// since the group decides the route.
/// </remarks>
[StructLayout(LayoutKind.Sequential)]
internal readonly record struct SimulationEvent(double Time, int Unit, int Patient)
{
    /// <summary>The <see cref="Patient"/> value of a group-arrival event.</summary>
    public const int ArrivalMarker = -1;

    /// <summary>The <see cref="Patient"/> value of a roster's change-of-hour event.</summary>
    public const int RosterMarker = -2;

    /// <summary>The group of the patient finishing service; 0 for other events.</summary>
    public int Group { get; init; }

    /// <summary>When the patient finishing service arrived at the unit, in hours; 0 for other events.</summary>
    public double UnitArrival { get; init; }

    /// <summary>
    /// Where the patient finishing service goes next: a unit, or −1 to leave the network; drawn when the service
    /// started. 0 for other events.
    /// </summary>
    public int NextUnit { get; init; }

    /// <summary>When the service ending started, in hours; 0 for other events.</summary>
    public double ServiceStart { get; init; }

    /// <summary>True for a group-arrival event.</summary>
    public bool IsArrival => Patient == ArrivalMarker;

    /// <summary>True for a service completion: a patient leaves a server.</summary>
    public bool IsServiceEnd => Patient >= 0;
}
