using NetSolve.Fitting.Estimation;

namespace NetSolve.Presentation.Fitting.Evidence;

/// <summary>One unit's row of the fit evidence table: its evidence and the predicted wait set beside the observed one.</summary>
/// <param name="Unit">The unit's evidence.</param>
/// <param name="PredictedWaitHours">The mean wait the fitted network predicts; null when not solved or unstable.</param>
public sealed record FitEvidenceRow(UnitEvidence Unit, double? PredictedWaitHours)
{
    /// <summary>Rows for every unit of <paramref name="evidence"/>, predictions looked up by unit id.</summary>
    public static IReadOnlyList<FitEvidenceRow> For(NetworkEvidence evidence, IReadOnlyDictionary<string, double?>? predictedWaitHours = null)
    {
        ArgumentNullException.ThrowIfNull(evidence);
        return [.. evidence.Units.Select(unit => new FitEvidenceRow(unit, predictedWaitHours?.GetValueOrDefault(unit.UnitId)))];
    }
}
