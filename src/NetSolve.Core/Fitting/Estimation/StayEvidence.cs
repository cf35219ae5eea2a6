using NetSolve.Model;

namespace NetSolve.Fitting.Estimation;

/// <summary>What a unit's stays say about its service time, censoring taken into account.</summary>
/// <param name="Stays">Stays seen.</param>
/// <param name="Censored">Stays still running at the extract's end.</param>
/// <param name="Truncated">Stays already running at the extract's start.</param>
/// <param name="Curve">The Kaplan–Meier curve.</param>
/// <param name="CurveMeanHours">The curve's mean, with the exponential tail when the longest stay was still running; null when no stay ended.</param>
/// <param name="Exponential">The exponential fit; null when no stay ended.</param>
/// <param name="Lognormal">The lognormal fit; null when it cannot be made (see <see cref="LognormalStayFit.Fit(StayGroups)"/>).</param>
/// <param name="AicDifference">AIC of the exponential minus AIC of the lognormal: positive favours the lognormal; null without both fits.</param>
/// <param name="LargestGap">
/// The largest distance between the Kaplan–Meier curve and the chosen fit's survival, checked on both sides of every
/// step (a Kolmogorov–Smirnov distance that respects censoring); shown as a figure of fit, with no p-value, because the
/// usual critical values hold neither for censored data nor for fitted parameters. Null without a fit.
/// </param>
/// <param name="Chosen">The service distribution to write: <see cref="ServiceKind.Lognormal"/> or <see cref="ServiceKind.Exponential"/>.</param>
/// <param name="Mean">The mean stay in hours with its 95% interval, from the chosen fit; null when no stay ended.</param>
/// <param name="Cv">The coefficient of variation with its 95% interval; the exponential's is 1 by its form, with a zero-width interval.</param>
public sealed record StayEvidence(
    int Stays,
    int Censored,
    int Truncated,
    KaplanMeierCurve Curve,
    double? CurveMeanHours,
    ExponentialStayFit? Exponential,
    LognormalStayFit? Lognormal,
    double? AicDifference,
    double? LargestGap,
    ServiceKind Chosen,
    IntervalEstimate? Mean,
    IntervalEstimate? Cv)
{
    /// <summary>Estimates the stay evidence of <paramref name="unit"/>.</summary>
    public static StayEvidence Estimate(UnitObservations unit)
    {
        ArgumentNullException.ThrowIfNull(unit);
        var stays = unit.Stays;
        var curve = KaplanMeier.Estimate(stays);
        var exponential = ExponentialStayFit.Fit(stays);
        var lognormal = LognormalStayFit.Fit(stays);
        double? aicDifference = exponential is not null && lognormal is not null
            ? Aic(exponential.LogLikelihood, ExponentialStayFit.Parameters) - Aic(lognormal.LogLikelihood, LognormalStayFit.Parameters)
            : null;
        bool lognormalChosen = aicDifference > EvidenceThresholds.AicMargin;
        IntervalEstimate? mean = lognormalChosen ? lognormal!.Mean : exponential?.Mean;
        IntervalEstimate? cv = lognormalChosen ? lognormal!.Cv : exponential is null ? null : new IntervalEstimate(1.0, new Interval(1.0, 1.0));
        Func<double, double>? survival = lognormalChosen ? lognormal!.Survival : exponential is null ? null : exponential.Survival;
        return new StayEvidence(stays.Stays, stays.CensoredStays, stays.TruncatedStays, curve, curve.MeanWithTail(),
            exponential, lognormal, aicDifference, survival is null ? null : GapToCurve(curve, survival),
            lognormalChosen ? ServiceKind.Lognormal : ServiceKind.Exponential, mean, cv);
    }

    /// <summary>Akaike's information criterion, 2k − 2 ln L (Akaike, IEEE Transactions on Automatic Control 19(6), 1974, 716–723).</summary>
    private static double Aic(double logLikelihood, int parameters) => (2.0 * parameters) - (2.0 * logLikelihood);

    private static double GapToCurve(KaplanMeierCurve curve, Func<double, double> survival)
    {
        double gap = 0.0;
        double before = 1.0;
        for (int j = 0; j < curve.Times.Length; j++)
        {
            double fitted = survival(curve.Times[j]);
            gap = Math.Max(gap, Math.Max(Math.Abs(before - fitted), Math.Abs(curve.Survival[j] - fitted)));
            before = curve.Survival[j];
        }

        return gap;
    }
}
