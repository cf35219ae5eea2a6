using System.Collections.Immutable;

namespace NetSolve.Analysis;

/// <summary>A unit that patients come back to so often that its routes apply several times per patient.</summary>
/// <param name="UnitId">The unit patients return to.</param>
/// <param name="VisitsPerPatient">Mean visits to the unit per patient who comes to it at all, 1 / (1 − chance of returning).</param>
/// <param name="Cycle">The likeliest way back: the unit, the units on the way, the unit again.</param>
/// <param name="CycleProbability">The chance that a patient leaving the unit comes back along <see cref="Cycle"/> (product of its routes).</param>
/// <param name="OtherUnits">Other units of the same loop that are also over the threshold, with their visits per patient.</param>
public sealed record ReturnLoop(
    string UnitId,
    double VisitsPerPatient,
    ImmutableArray<string> Cycle,
    double CycleProbability,
    ImmutableArray<(string UnitId, double VisitsPerPatient)> OtherUnits);
