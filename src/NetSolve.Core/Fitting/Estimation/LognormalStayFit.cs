using MathNet.Numerics.LinearAlgebra;
using MathNet.Numerics.Optimization;

namespace NetSolve.Fitting.Estimation;

/// <summary>
/// The lognormal stay distribution (ln stay ~ Normal(μ, σ²)) fitted by maximum likelihood to right-censored and
/// left-truncated stays (Klein and Moeschberger, Survival Analysis, 2nd ed., 2003, sections 3.5 and 12.4): an ended
/// stay adds ln f(x), a censored one ln S(x), and a stay already running at the extract's start subtracts ln S(a).
/// A stay recorded as 0 (shorter than the timestamps' resolution δ) is interval-censored in (0, δ] and adds ln F(δ).
/// </summary>
/// <param name="Mu">μ, the mean of ln(hours).</param>
/// <param name="Sigma">σ, the standard deviation of ln(hours).</param>
/// <param name="Mean">
/// The mean stay exp(μ + σ²/2) in hours, with its 95% interval by the delta method on the log scale: ln mean = μ + σ²/2
/// has gradient (1, σ²) in (μ, ln σ), and the covariance of (μ, ln σ) is the inverse of the observed information (the
/// Hessian of −ln L by central differences at the optimum).
/// </param>
/// <param name="Cv">The coefficient of variation √(exp(σ²) − 1), with the interval carried from ln σ ± 1.96·SE (cv rises with σ).</param>
/// <param name="LogLikelihood">The maximised log-likelihood (densities in hours, comparable with the exponential fit's).</param>
public sealed record LognormalStayFit(double Mu, double Sigma, IntervalEstimate Mean, IntervalEstimate Cv, double LogLikelihood)
{
    /// <summary>Parameters estimated (for the AIC).</summary>
    public const int Parameters = 2;

    /// <summary>Relative change of −ln L at which the simplex search stops.</summary>
    private const double SearchTolerance = 1e-12;

    /// <summary>Most simplex iterations; two parameters converge in a few hundred.</summary>
    private const int MaxIterations = 10_000;

    /// <summary>Newton steps after the simplex search; each at least doubles the correct digits near the maximum.</summary>
    private const int NewtonSteps = 5;

    /// <summary>Step in μ and ln σ for the central differences of the Hessian (both are on a log scale, so an absolute step).</summary>
    private const double HessianStep = 1e-4;

    /// <summary>Floor of the starting variance of the logs, so that rounding cannot start the search at σ = 0.</summary>
    private const double SmallestStartVariance = 1e-6;

    /// <summary>The chance a stay lasts beyond <paramref name="hours"/> under this fit.</summary>
    public double Survival(double hours) => hours <= 0.0 ? 1.0 : Math.Exp(NormalTail.LogUpper((Math.Log(hours) - Mu) / Sigma));

    /// <summary>
    /// The fit, or null when it cannot be made: fewer than 2 ended stays, fewer than 2 distinct ended lengths, no
    /// ended stay longer than 0, or a likelihood with no clear maximum.
    /// </summary>
    public static LognormalStayFit? Fit(ReadOnlySpan<double> stayHours, ReadOnlySpan<bool> censored, ReadOnlySpan<double> ageAtStartHours) =>
        Fit(StayGroups.Of(stayHours, censored, ageAtStartHours));

    /// <summary>The fit of the grouped <paramref name="groups"/>, or null when it cannot be made (as above).</summary>
    public static LognormalStayFit? Fit(StayGroups groups)
    {
        ArgumentNullException.ThrowIfNull(groups);
        var stays = new Stays(groups);
        // Starting values: the mean and spread of the ended stays' logs, a stay of 0 taken at half the resolution.
        double count = 0.0;
        double sum = 0.0;
        double squares = 0.0;
        var lengths = new HashSet<double>();
        bool anyPositive = false;
        for (int g = 0; g < groups.Count; g++)
        {
            int ended = groups.Ended[g];
            if (ended > 0)
            {
                double log = groups.Hours[g] > 0.0 ? stays.LogHours[g] : Math.Log(groups.ResolutionHours / 2.0);
                count += ended;
                sum += ended * log;
                squares += ended * log * log;
                lengths.Add(groups.Hours[g]);
                anyPositive |= groups.Hours[g] > 0.0;
            }
        }

        if (count < 2 || lengths.Count < 2 || !anyPositive)
        {
            return null;
        }

        double startMu = sum / count;
        double startSd = Math.Sqrt(Math.Max((squares - (sum * startMu)) / (count - 1), SmallestStartVariance));
        var objective = ObjectiveFunction.Value(point => -stays.LogLikelihood(point[0], point[1]));
        MinimizationResult result;
        try
        {
            result = NelderMeadSimplex.Minimum(objective, Vector<double>.Build.Dense([startMu, Math.Log(startSd)]), SearchTolerance, MaxIterations);
        }
        catch (MaximumIterationsException)
        {
            return null;
        }

        var (mu, logSigma) = Polish(stays, result.MinimizingPoint[0], result.MinimizingPoint[1]);
        double sigma = Math.Exp(logSigma);
        var covariance = Covariance(stays, mu, logSigma);
        double logLikelihood = stays.LogLikelihood(mu, logSigma);
        if (covariance is not { } c || !double.IsFinite(logLikelihood))
        {
            return null;
        }

        double sigmaSquared = sigma * sigma;
        double logMeanVariance = c.MuMu + (2.0 * sigmaSquared * c.MuLogSigma) + (sigmaSquared * sigmaSquared * c.LogSigmaLogSigma);
        double mean = Math.Exp(mu + (sigmaSquared / 2.0));
        double meanSpread = Math.Exp(EvidenceThresholds.NormalQuantile * Math.Sqrt(Math.Max(0.0, logMeanVariance)));
        double sigmaSpread = Math.Exp(EvidenceThresholds.NormalQuantile * Math.Sqrt(c.LogSigmaLogSigma));
        return new LognormalStayFit(mu, sigma,
            new IntervalEstimate(mean, new Interval(mean / meanSpread, mean * meanSpread)),
            new IntervalEstimate(CvOf(sigma), new Interval(CvOf(sigma / sigmaSpread), CvOf(sigma * sigmaSpread))),
            logLikelihood);
    }

    private static double CvOf(double sigma) => Math.Sqrt(Math.Exp(sigma * sigma) - 1.0);

    /// <summary>
    /// Newton steps from the simplex's answer, with the gradient and the inverse Hessian by central differences: the
    /// simplex stops on a flat valley floor, Newton's method then lands on the maximum itself. A step that lowers the
    /// likelihood is not taken.
    /// </summary>
    private static (double Mu, double LogSigma) Polish(Stays stays, double mu, double logSigma)
    {
        const double h = HessianStep;
        for (int step = 0; step < NewtonSteps; step++)
        {
            if (Covariance(stays, mu, logSigma) is not { } c)
            {
                break;
            }

            double gradientMu = -(stays.LogLikelihood(mu + h, logSigma) - stays.LogLikelihood(mu - h, logSigma)) / (2.0 * h);
            double gradientSigma = -(stays.LogLikelihood(mu, logSigma + h) - stays.LogLikelihood(mu, logSigma - h)) / (2.0 * h);
            double nextMu = mu - ((c.MuMu * gradientMu) + (c.MuLogSigma * gradientSigma));
            double nextLogSigma = logSigma - ((c.MuLogSigma * gradientMu) + (c.LogSigmaLogSigma * gradientSigma));
            if (!(stays.LogLikelihood(nextMu, nextLogSigma) >= stays.LogLikelihood(mu, logSigma)))
            {
                break;
            }

            (mu, logSigma) = (nextMu, nextLogSigma);
        }

        return (mu, logSigma);
    }

    /// <summary>The inverse of the observed information in (μ, ln σ); null when it is not positive definite.</summary>
    private static (double MuMu, double MuLogSigma, double LogSigmaLogSigma)? Covariance(Stays stays, double mu, double logSigma)
    {
        const double h = HessianStep;
        double F(double a, double b) => -stays.LogLikelihood(a, b);
        double centre = F(mu, logSigma);
        double aa = (F(mu + h, logSigma) - (2.0 * centre) + F(mu - h, logSigma)) / (h * h);
        double bb = (F(mu, logSigma + h) - (2.0 * centre) + F(mu, logSigma - h)) / (h * h);
        double ab = (F(mu + h, logSigma + h) - F(mu + h, logSigma - h) - F(mu - h, logSigma + h) + F(mu - h, logSigma - h)) / (4.0 * h * h);
        double determinant = (aa * bb) - (ab * ab);
        if (!(aa > 0.0 && determinant > 0.0) || !double.IsFinite(determinant))
        {
            return null;
        }

        return (bb / determinant, -ab / determinant, aa / determinant);
    }

    /// <summary>
    /// The grouped stays with each length's log worked out once, so the search's objective can read them. A stay that
    /// ended at length 0 is interval-censored: it ended somewhere in (0, δ], δ the recording's resolution, and adds
    /// ln F(δ) = ln Φ((ln δ − μ)/σ) (Klein and Moeschberger, Survival Analysis, 2nd ed., 2003, section 3.5, the
    /// likelihood of an interval-censored observation, F(R) − F(L) with L = 0).
    /// </summary>
    private sealed class Stays
    {
        public Stays(StayGroups groups)
        {
            Groups = groups;
            LogHours = [.. groups.Hours.Select(hours => hours > 0.0 ? Math.Log(hours) : double.NegativeInfinity)];
            LogAges = [.. groups.AgeHours.Select(age => age > 0.0 ? Math.Log(age) : double.NegativeInfinity)];
            LogResolution = Math.Log(groups.ResolutionHours);
        }

        public StayGroups Groups { get; }

        public double[] LogHours { get; }

        private double[] LogAges { get; }

        private double LogResolution { get; }

        public double LogLikelihood(double mu, double logSigma)
        {
            double sigma = Math.Exp(logSigma);
            double sum = 0.0;
            for (int g = 0; g < LogHours.Length; g++)
            {
                double logHours = LogHours[g];
                int ended = Groups.Ended[g];
                int censored = Groups.Censored[g];
                if (ended > 0)
                {
                    sum += ended * (Groups.Hours[g] > 0.0
                        ? NormalTail.LogDensity((logHours - mu) / sigma) - logSigma - logHours
                        : NormalTail.LogUpper((mu - LogResolution) / sigma));
                }

                if (censored > 0 && Groups.Hours[g] > 0.0)
                {
                    sum += censored * NormalTail.LogUpper((logHours - mu) / sigma);
                }

                if (Groups.AgeHours[g] > 0.0)
                {
                    sum -= (ended + censored) * NormalTail.LogUpper((LogAges[g] - mu) / sigma);
                }
            }

            return sum;
        }
    }
}
