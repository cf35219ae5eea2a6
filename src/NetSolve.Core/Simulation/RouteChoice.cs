using System.Runtime.InteropServices;

namespace NetSolve.Simulation;

/// <summary>One route of a <see cref="GroupPlan"/>: taken by a uniform draw below <paramref name="Cumulative"/> that is
/// not below the previous route's.</summary>
/// <param name="Cumulative">Probability of this route and those before it in its row.</param>
/// <param name="Target">Destination unit.</param>
[StructLayout(LayoutKind.Sequential)]
internal readonly record struct RouteChoice(double Cumulative, int Target);
