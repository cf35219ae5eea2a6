using System.Runtime.InteropServices;

namespace NetSolve.Solving;

/// <summary>A routing fraction between two units, by unit position.</summary>
/// <param name="From">Position of the unit patients leave, 0 to units − 1.</param>
/// <param name="To">Position of the unit they go to next, 0 to units − 1; may equal <paramref name="From"/> (a repeat visit).</param>
/// <param name="Probability">Fraction of <paramref name="From"/>'s departures that go to <paramref name="To"/>, in [0, 1].</param>
[StructLayout(LayoutKind.Auto)]
public readonly record struct ArrivalVariabilityRoute(int From, int To, double Probability);
