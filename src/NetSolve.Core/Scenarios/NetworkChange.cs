using NetSolve.Diagnostics;

namespace NetSolve.Scenarios;

/// <summary>One what-if change to a network, with the place it was written (a scenario file line or a <c>--set</c> text).</summary>
/// <remarks>Immutable. Applied in order by <see cref="NetworkEditor"/>, which checks unit names and re-validates the result.</remarks>
/// <param name="Location">Where the change was written; a location with line 0 prints as its text alone.</param>
public abstract record NetworkChange(SourceLocation Location);
