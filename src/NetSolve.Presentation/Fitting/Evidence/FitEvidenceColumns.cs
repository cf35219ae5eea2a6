using System.Collections.Immutable;
using NetSolve.Model;
using NetSolve.Presentation.Metrics;

namespace NetSolve.Presentation.Fitting.Evidence;

/// <summary>
/// The registry of the fit evidence per unit: machine columns carry each number and interval end apart, people columns
/// put an estimate and its interval in one cell. Every format is a loop over these.
/// </summary>
public static class FitEvidenceColumns
{
    /// <summary>Every column, in the table's order.</summary>
    public static readonly ImmutableArray<Column<FitEvidenceRow>> All =
    [
        Columns.Words<FitEvidenceRow>("id", "unit", row => row.Unit.UnitId),
        Columns.Number<FitEvidenceRow>("stays", "stays", MetricDimension.Count, row => row.Unit.Stay.Stays),
        Columns.Number<FitEvidenceRow>("censored", "censored", MetricDimension.Count, row => row.Unit.Stay.Censored),
        Columns.Number<FitEvidenceRow>("truncated", "running at start", MetricDimension.Count, row => row.Unit.Stay.Truncated, Audience.Machines),
        Columns.Words<FitEvidenceRow>("mean_stay_shown", "mean stay (95%)", row => EvidenceWords.Time(row.Unit.Stay.Mean), Audience.People),
        Columns.Number<FitEvidenceRow>("mean_stay", "mean stay", MetricDimension.Time, row => row.Unit.Stay.Mean?.Value, Audience.Machines),
        Columns.Number<FitEvidenceRow>("mean_stay_lower", "mean stay lower", MetricDimension.Time, row => row.Unit.Stay.Mean?.Interval.Lower, Audience.Machines),
        Columns.Number<FitEvidenceRow>("mean_stay_upper", "mean stay upper", MetricDimension.Time, row => row.Unit.Stay.Mean?.Interval.Upper, Audience.Machines),
        Columns.Number<FitEvidenceRow>("curve_mean_stay", "curve mean stay", MetricDimension.Time, row => row.Unit.Stay.CurveMeanHours, Audience.Machines),
        Columns.Words<FitEvidenceRow>("stay_cv_shown", "cv (95%)", row => EvidenceWords.Number(row.Unit.Stay.Cv), Audience.People),
        Columns.Number<FitEvidenceRow>("stay_cv", "cv", MetricDimension.Plain, row => row.Unit.Stay.Cv?.Value, Audience.Machines),
        Columns.Number<FitEvidenceRow>("stay_cv_lower", "cv lower", MetricDimension.Plain, row => row.Unit.Stay.Cv?.Interval.Lower, Audience.Machines),
        Columns.Number<FitEvidenceRow>("stay_cv_upper", "cv upper", MetricDimension.Plain, row => row.Unit.Stay.Cv?.Interval.Upper, Audience.Machines),
        Columns.Words<FitEvidenceRow>("service_distribution", "distribution", row => EvidenceWords.Distribution(row.Unit.Stay.Chosen)),
        Columns.Number<FitEvidenceRow>("aic_difference", "AIC exp - logn", MetricDimension.Plain, row => row.Unit.Stay.AicDifference),
        Columns.Number<FitEvidenceRow>("largest_gap", "largest gap", MetricDimension.Plain, row => row.Unit.Stay.LargestGap),
        Columns.Words<FitEvidenceRow>("servers_shown", "servers", row => EvidenceWords.Servers(row.Unit), Audience.People),
        Columns.Number<FitEvidenceRow>("servers", "servers", MetricDimension.Count, row => row.Unit.Servers, Audience.Machines),
        Columns.Words<FitEvidenceRow>("never_queued", "never queued", row => row.Unit.NeverQueued ? "yes" : "no", Audience.Machines),
        Columns.Words<FitEvidenceRow>("observed_wait_shown", "observed wait (95%)", row => EvidenceWords.Time(row.Unit.Waits?.Mean), Audience.People),
        Columns.Number<FitEvidenceRow>("observed_wait", "observed wait", MetricDimension.Time, row => row.Unit.Waits?.Mean.Value, Audience.Machines),
        Columns.Number<FitEvidenceRow>("observed_wait_lower", "observed wait lower", MetricDimension.Time, row => row.Unit.Waits?.Mean.Interval.Lower, Audience.Machines),
        Columns.Number<FitEvidenceRow>("observed_wait_upper", "observed wait upper", MetricDimension.Time, row => row.Unit.Waits?.Mean.Interval.Upper, Audience.Machines),
        Columns.Number<FitEvidenceRow>("predicted_wait", "predicted wait", MetricDimension.Time, row => row.PredictedWaitHours),
        Columns.Number<FitEvidenceRow>("warning_count", "warnings", MetricDimension.Count, row => row.Unit.Warnings.Length),
    ];
}
