namespace NetSolve.Fitting.Estimation;

/// <summary>A routing fraction out of a unit with its Wilson 95% interval.</summary>
/// <param name="ToUnitId">The unit moved to.</param>
/// <param name="Count">Moves seen.</param>
/// <param name="Total">Stays in the unit that ended inside the extract: every one chose a route or left.</param>
/// <param name="Fraction">Count / total, with its Wilson interval.</param>
public sealed record RouteEvidence(string ToUnitId, int Count, int Total, IntervalEstimate Fraction)
{
    /// <summary>Whether fewer than <see cref="EvidenceThresholds.MinRouteTransitions"/> moves were seen.</summary>
    public bool IsThin => Count < EvidenceThresholds.MinRouteTransitions;
}
