using NetSolve.Diagnostics;

namespace NetSolve.Scenarios;

/// <summary>Closes a unit, sending its patients elsewhere.</summary>
/// <remarks>
/// Every route into the closed unit is redirected to <see cref="SendTo"/> (added to any route already there), and
/// its external arrivals move there too; with <see cref="SendTo"/> null those patients leave the network instead.
/// The closed unit's own routes disappear with it.
/// </remarks>
/// <param name="Location">Where the change was written.</param>
/// <param name="UnitId">The unit to close.</param>
/// <param name="SendTo">Where its patients go instead, or null when they leave the network.</param>
public sealed record CloseUnit(SourceLocation Location, string UnitId, string? SendTo) : NetworkChange(Location);
