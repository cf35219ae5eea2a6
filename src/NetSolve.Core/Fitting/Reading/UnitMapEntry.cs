namespace NetSolve.Fitting.Reading;

/// <summary>One line of a unit map: the unit a log name stands for.</summary>
/// <param name="Id">The unit id to write (letters, digits, '_' and '-', starting with a letter).</param>
/// <param name="Label">The label to write; null: the name as the log spells it.</param>
public sealed record UnitMapEntry(string Id, string? Label);
