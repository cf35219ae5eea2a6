using NetSolve.Diagnostics;

namespace NetSolve.Scenarios;

/// <summary>Sets the fraction of patients going from one unit to another; 0 removes the route.</summary>
/// <remarks>
/// Only this fraction changes: the difference is taken from (or given to) the remainder that leaves the network.
/// If the routes out of <see cref="From"/> then add up to more than 1, the edit is an error.
/// </remarks>
/// <param name="Location">Where the change was written.</param>
/// <param name="From">The unit patients leave.</param>
/// <param name="To">The unit they go to next.</param>
/// <param name="Probability">In [0, 1].</param>
public sealed record SetRoute(SourceLocation Location, string From, string To, double Probability) : NetworkChange(Location);
