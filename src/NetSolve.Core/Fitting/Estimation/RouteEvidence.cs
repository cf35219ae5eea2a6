namespace NetSolve.Fitting.Estimation;

/// <summary>A routing fraction out of a unit with its Wilson 95% interval.</summary>
/// <param name="ToUnitId">The unit moved to.</param>
/// <param name="Count">Moves seen.</param>
/// <param name="Total">
/// Departures: stays in the unit that ended inside the extract with a known next step (a move or leaving the hospital).
/// Stays still running are left out (their next step is not known yet), and so are side visits (they return to the
/// stay they interrupt). The fitted network's fraction has the same denominator.
/// </param>
/// <param name="Fraction">Count / total, with the Wilson interval of count successes in total trials.</param>
public sealed record RouteEvidence(string ToUnitId, int Count, int Total, IntervalEstimate Fraction)
{
    /// <summary>Whether fewer than <see cref="EvidenceThresholds.MinRouteTransitions"/> moves were seen.</summary>
    public bool IsThin => Count < EvidenceThresholds.MinRouteTransitions;

    /// <summary>The fraction <paramref name="count"/> / <paramref name="total"/> with its Wilson interval.</summary>
    /// <exception cref="ArgumentOutOfRangeException">No departures, or a count outside [0, total].</exception>
    public static RouteEvidence Of(string toUnitId, int count, int total) =>
        new(toUnitId, count, total, new IntervalEstimate((double)count / total, ConfidenceIntervals.Wilson(count, total)));
}
