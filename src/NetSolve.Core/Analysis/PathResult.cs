using System.Collections.Immutable;

namespace NetSolve.Analysis;

/// <summary>A named sequence of units: the mean time spent along it and the chance of following it step by step.</summary>
/// <param name="UnitIds">The sequence as given.</param>
/// <param name="MeanTimesHours">Mean time in each unit per visit (wait plus service), in hours; null for an unstable unit.</param>
/// <param name="StepProbability">
/// The chance that a patient finishing at the first unit goes through the rest in this order: the product of the
/// routing fractions between consecutive units (1 for a single unit).
/// </param>
public sealed record PathResult(ImmutableArray<string> UnitIds, ImmutableArray<double?> MeanTimesHours, double StepProbability)
{
    /// <summary>Sum of the mean times in unit along the sequence, in hours; null when any unit on it is unstable.</summary>
    public double? MeanTimeHours => MeanTimesHours.Any(time => time is null) ? null : MeanTimesHours.Sum(time => time!.Value);
}
