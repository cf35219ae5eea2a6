using MathNet.Numerics;

namespace NetSolve.Fitting.Estimation;

/// <summary>
/// The exponential stay distribution fitted by maximum likelihood to right-censored and left-truncated stays
/// (Klein and Moeschberger, Survival Analysis, 2nd ed., 2003, section 3.5 and 12.2): with d ended stays and exposure
/// T = Σ (x_i − a_i), the rate is d / T and the mean T / d.
/// </summary>
/// <param name="Mean">The mean stay in hours with its 95% interval by the delta method on the log scale: the log of the
/// estimated mean has standard error 1/√d, so the interval is mean·exp(±1.96/√d).</param>
/// <param name="Ended">Stays that ended inside the extract (d).</param>
/// <param name="ExposureHours">Hours of stay observed (T).</param>
/// <param name="LogLikelihood">The maximised log-likelihood, d·ln(d/T) − d, for comparing fits.</param>
public sealed record ExponentialStayFit(IntervalEstimate Mean, int Ended, double ExposureHours, double LogLikelihood)
{
    /// <summary>Parameters estimated (for the AIC).</summary>
    public const int Parameters = 1;

    /// <summary>The chance a stay lasts beyond <paramref name="hours"/> under this fit.</summary>
    public double Survival(double hours) => Math.Exp(-hours / Mean.Value);

    /// <summary>The fit, or null when no stay ended or no time was observed (the mean has no estimate then).</summary>
    public static ExponentialStayFit? Fit(ReadOnlySpan<double> stayHours, ReadOnlySpan<bool> censored, ReadOnlySpan<double> ageAtStartHours) =>
        Fit(StayGroups.Of(stayHours, censored, ageAtStartHours));

    /// <summary>The fit of the grouped <paramref name="stays"/>, or null when no stay ended or no time was observed.</summary>
    /// <remarks>
    /// The log-likelihood, used only to compare fits, treats a stay recorded as 0 as the lognormal fit does: ended
    /// somewhere below the recording's resolution δ, adding ln(1 − e^(−δ/mean)) rather than the density's ln(1/mean)
    /// (see <see cref="LognormalStayFit"/>), so that the two likelihoods are of the same data. It is taken at d / T,
    /// the maximum of the likelihood with exact times; each such stay moves the maximum by a relative O(δ/mean).
    /// </remarks>
    public static ExponentialStayFit? Fit(StayGroups stays)
    {
        ArgumentNullException.ThrowIfNull(stays);
        int ended = 0;
        int endedAtZero = 0;
        double exposure = 0.0;
        for (int g = 0; g < stays.Count; g++)
        {
            ended += stays.Ended[g];
            endedAtZero += stays.Hours[g] == 0.0 ? stays.Ended[g] : 0;
            exposure += stays.StaysIn(g) * (stays.Hours[g] - stays.AgeHours[g]);
        }

        if (ended == 0 || !(exposure > 0.0))
        {
            return null;
        }

        double mean = exposure / ended;
        double spread = Math.Exp(EvidenceThresholds.NormalQuantile / Math.Sqrt(ended));
        double logLikelihood = (ended * Math.Log(ended / exposure)) - ended;
        if (endedAtZero > 0)
        {
            // Swap each zero stay's ln(1/mean) (its exposure is 0) for the log-probability of ending within δ.
            logLikelihood += endedAtZero * (Math.Log(-SpecialFunctions.Expm1(-stays.ResolutionHours / mean)) + Math.Log(mean));
        }

        return new ExponentialStayFit(new IntervalEstimate(mean, new Interval(mean / spread, mean * spread)), ended, exposure, logLikelihood);
    }
}
