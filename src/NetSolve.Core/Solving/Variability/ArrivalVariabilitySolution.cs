using System.Collections.Immutable;

namespace NetSolve.Solving;

/// <summary>The squared coefficients of variation of the flows into and out of every unit, by unit position.</summary>
/// <remarks>
/// Every value is finite and lies in [0, <see cref="ArrivalVariability.MaxScv"/>]. A unit no patient reaches has 1
/// for both. Immutable.
/// </remarks>
/// <param name="ArrivalScv">SCV of the inter-arrival times at each unit (all streams merged): ca².</param>
/// <param name="DepartureScv">SCV of the inter-departure times from each unit: cd².</param>
/// <param name="Dense">True when the system was solved by dense LU, false when by Gauss–Seidel sweeps (or their fallback).</param>
public sealed record ArrivalVariabilitySolution(ImmutableArray<double> ArrivalScv, ImmutableArray<double> DepartureScv, bool Dense);
