namespace NetSolve.Fitting.Reading;

/// <summary>A unit found in a movement log.</summary>
/// <param name="Id">A valid unit id, made from the name or taken from the unit map.</param>
/// <param name="Label">The name as the log spells it (or the map's label).</param>
public sealed record LogUnit(string Id, string Label);
