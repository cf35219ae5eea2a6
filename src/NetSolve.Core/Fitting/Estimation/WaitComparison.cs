using System.Collections.Immutable;

namespace NetSolve.Fitting.Estimation;

/// <summary>A unit's observed mean wait set beside the wait the fitted network predicts.</summary>
/// <param name="UnitId">The unit.</param>
/// <param name="Observed">The observed waits; null when the extract records no start of service.</param>
/// <param name="PredictedHours">The solver's mean wait for the fitted network; null when it has none (unstable or not solved).</param>
public sealed record WaitComparison(string UnitId, WaitEvidence? Observed, double? PredictedHours)
{
    /// <summary>Whether the prediction lies inside the observed mean's 95% interval; null when either is missing.</summary>
    public bool? PredictedInside => Observed is not null && PredictedHours is double predicted ? Observed.Mean.Interval.Contains(predicted) : null;

    /// <summary>
    /// One comparison per unit of <paramref name="evidence"/>, in its order, with the predictions looked up by unit id
    /// (the fitted network solved by the caller: Fitting does not solve).
    /// </summary>
    public static ImmutableArray<WaitComparison> Compare(NetworkEvidence evidence, IReadOnlyDictionary<string, double?> predictedWaitHours)
    {
        ArgumentNullException.ThrowIfNull(evidence);
        ArgumentNullException.ThrowIfNull(predictedWaitHours);
        return [.. evidence.Units.Select(unit => new WaitComparison(unit.UnitId, unit.Waits, predictedWaitHours.GetValueOrDefault(unit.UnitId)))];
    }
}
