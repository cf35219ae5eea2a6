using NetSolve.Model;
using NetSolve.Simulation;

namespace NetSolve.Analysis;

/// <summary>One metric of one unit, formula against simulation, with the verdict and the formula's relative error.</summary>
/// <param name="Name">The contract's field name (<c>utilisation</c>, <c>mean_wait</c>, ...).</param>
/// <param name="Formula">The formula's value, in hours for times; null when the formula has none (an unstable unit).</param>
/// <param name="Simulated">The simulated estimate, in hours for times.</param>
/// <param name="Dimension">What the values measure: times and rates are converted to the file's time unit, the rest decides how people read them.</param>
public sealed record ComparedMetric(string Name, double? Formula, Estimate Simulated, MetricDimension Dimension)
{
    /// <summary>
    /// <c>inside</c> when the formula lies in the simulation's 95% interval, <c>outside</c> when not,
    /// <c>no formula</c> for an unstable unit, <c>no interval</c> with a single replication.
    /// </summary>
    public string Verdict => Formula is not double value ? "no formula"
        : Simulated.HalfWidth is null ? "no interval"
        : Simulated.Contains(value) ? "inside" : "outside";

    /// <summary>True when the formula is exact for the unit as simulated (<see cref="FormulaSimulationComparison.IsExact"/>).</summary>
    public bool IsFormulaExact { get; init; }

    /// <summary>
    /// Which side an <c>outside</c> verdict points to: <c>run</c> when the formula is exact for the unit (the run is too
    /// short, its warm-up too short or its precision not reached, or it is the 1 in 20 outside by chance),
    /// <c>formula</c> when the formula is an approximation (its error is then in <see cref="RelativeError"/> ±
    /// <see cref="RelativeErrorHalfWidth"/>); null for any other verdict.
    /// </summary>
    public string? Suspect => Verdict != "outside" ? null : IsFormulaExact ? "run" : "formula";

    /// <summary>
    /// The half-width of the formula's relative error that the simulation's 95% interval allows, |formula| · h / m²
    /// to first order (the delta method on formula / m − 1); null without a relative error or an interval.
    /// </summary>
    public double? RelativeErrorHalfWidth => RelativeError is not null && Formula is double value && Simulated.HalfWidth is double half
        ? Math.Abs(value) * half / (Simulated.Mean * Simulated.Mean)
        : null;

    /// <summary>
    /// The formula's error relative to the simulated mean, (formula − simulated) / simulated, as a fraction (−0.12 is
    /// 12% low); null when the formula has no value or the simulated mean is 0 (nothing to be relative to).
    /// </summary>
    public double? RelativeError => Formula is double value && Simulated.Mean != 0.0 && double.IsFinite(Simulated.Mean)
        ? (value - Simulated.Mean) / Simulated.Mean
        : null;
}
