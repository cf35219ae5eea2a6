using System.Collections.Immutable;

namespace NetSolve.Rendering.Staffing;

/// <summary>One line of the roster chart, in data coordinates: hours since the cycle's start against servers or erlangs.</summary>
/// <param name="UnitIndex">The unit's place among the units drawn (0-based): it picks the line's colour.</param>
/// <param name="Quantity">What the line shows.</param>
/// <param name="Legend">The legend's text for the line.</param>
/// <param name="Hours">x: hours since the cycle's start.</param>
/// <param name="Values">y: erlangs for demand, servers otherwise.</param>
public sealed record RosterChartSeries(int UnitIndex, RosterChartQuantity Quantity, string Legend, ImmutableArray<double> Hours, ImmutableArray<double> Values);
