using MathNet.Numerics.Distributions;
using NetSolve.Fitting.Estimation;
using NetSolve.Model;

namespace NetSolve.Tests.Fitting.Estimation;

public sealed class StayEvidenceTests
{
    private const double FiveDaysHours = 120.0;
    private const double SevenDaysHours = 168.0;

    /// <summary>Ten admissions a day.</summary>
    private const double ArrivalsPerHour = 10.0 / 24.0;

    [Fact]
    public void A_seven_day_window_on_five_day_exponential_stays_recovers_the_mean_within_its_interval()
    {
        var (unit, naive) = CensoredExtract.Draw(seed: 7, ArrivalsPerHour, SevenDaysHours, CensoredExtract.Exponential(FiveDaysHours), FiveDaysHours);

        var evidence = StayEvidence.Estimate(unit);

        // Exact by hand: the stays were drawn with mean 120 h. Complete stays alone are far short (the issue measured 61%).
        Assert.True(evidence.Censored > 0 && evidence.Truncated > 0);
        Assert.True(evidence.Mean!.Value.Interval.Contains(FiveDaysHours));
        Assert.True(evidence.Exponential!.Mean.Interval.Contains(FiveDaysHours));
        Assert.True(naive < 0.6 * FiveDaysHours);
    }

    [Fact]
    public void A_seven_day_window_on_five_day_lognormal_stays_recovers_the_mean_within_its_interval()
    {
        var (unit, naive) = CensoredExtract.Draw(seed: 11, ArrivalsPerHour, SevenDaysHours, CensoredExtract.Lognormal(FiveDaysHours, 0.6), FiveDaysHours);

        var evidence = StayEvidence.Estimate(unit);

        // Exact by hand: drawn with mean 120 h and cv 0.6.
        Assert.True(evidence.Lognormal!.Mean.Interval.Contains(FiveDaysHours));
        Assert.True(evidence.Lognormal.Cv.Interval.Contains(0.6));
        Assert.True(evidence.Mean!.Value.Interval.Contains(FiveDaysHours));
        Assert.True(naive < 0.7 * FiveDaysHours);
    }

    [Fact]
    public void Clearly_lognormal_stays_choose_the_lognormal()
    {
        var (unit, _) = CensoredExtract.Draw(seed: 1, 10 * ArrivalsPerHour, 4 * SevenDaysHours, CensoredExtract.Lognormal(FiveDaysHours, 0.5), FiveDaysHours);

        var evidence = StayEvidence.Estimate(unit);

        // Exact by hand: drawn lognormal with cv 0.5; an exponential (cv 1) is far off with about 3,000 stays.
        Assert.Equal(ServiceKind.Lognormal, evidence.Chosen);
        Assert.True(evidence.AicDifference > EvidenceThresholds.AicMargin);
        Assert.True(evidence.Cv!.Value.Interval.Contains(0.5));
        Assert.True(evidence.LargestGap < 0.05);
    }

    [Fact]
    public void Exponential_stays_keep_the_exponential_with_its_cv_of_one()
    {
        var (unit, _) = CensoredExtract.Draw(seed: 5, 10 * ArrivalsPerHour, 4 * SevenDaysHours, CensoredExtract.Exponential(FiveDaysHours), FiveDaysHours);

        var evidence = StayEvidence.Estimate(unit);

        // Exact by hand: drawn exponential, whose cv is 1 by its form.
        Assert.Equal(ServiceKind.Exponential, evidence.Chosen);
        Assert.Equal(1.0, evidence.Cv!.Value.Value);
        Assert.True(evidence.Mean!.Value.Interval.Contains(FiveDaysHours));
    }

    [Fact]
    public void The_exponential_fit_is_ended_stays_over_exposure_with_a_log_scale_interval()
    {
        // Exact by hand: stays 2, 4 (ended) and 6 (censored), one of them 1 h old at the start: exposure 2 + 4 + 6 − 1 = 11 h,
        // 2 ended, mean 5.5 h; interval 5.5·exp(±1.96/√2).
        var fit = ExponentialStayFit.Fit([2.0, 4.0, 6.0], [false, false, true], [0.0, 1.0, 0.0])!;

        Assert.Equal(5.5, fit.Mean.Value, 1e-12);
        Assert.Equal(5.5 / Math.Exp(EvidenceThresholds.NormalQuantile / Math.Sqrt(2.0)), fit.Mean.Interval.Lower, 1e-12);
        Assert.Equal(5.5 * Math.Exp(EvidenceThresholds.NormalQuantile / Math.Sqrt(2.0)), fit.Mean.Interval.Upper, 1e-12);
        Assert.Equal((2.0 * Math.Log(2.0 / 11.0)) - 2.0, fit.LogLikelihood, 1e-12);
    }

    [Fact]
    public void Without_censoring_the_lognormal_fit_is_the_mean_and_spread_of_the_logs()
    {
        double[] hours = [1.0, 2.0, 4.0, 8.0, 3.0];
        var logs = hours.Select(x => Math.Log(x)).ToArray();
        double mu = logs.Average();
        double sigma = Math.Sqrt(logs.Sum(x => (x - mu) * (x - mu)) / logs.Length);

        var fit = LognormalStayFit.Fit(hours, new bool[hours.Length], [])!;

        // Exact by hand: with every stay ended, the maximum-likelihood μ and σ are the mean and the (1/n) standard
        // deviation of the logs.
        Assert.Equal(mu, fit.Mu, 1e-5);
        Assert.Equal(sigma, fit.Sigma, 1e-5);
        Assert.Equal(Math.Exp(mu + (sigma * sigma / 2.0)), fit.Mean.Value, 1e-4);
    }

    [Fact]
    public void A_lognormal_cannot_be_fitted_to_stays_of_one_length_or_to_stays_of_no_length_only()
    {
        Assert.Null(LognormalStayFit.Fit([2.0, 2.0, 5.0], [false, false, true], []));
        Assert.Null(LognormalStayFit.Fit([0.0, 0.0, 5.0], [false, false, true], []));
        Assert.Null(ExponentialStayFit.Fit([2.0, 5.0], [true, true], []));
    }

    [Fact]
    public void A_stay_of_no_length_counts_as_ended_below_the_resolution()
    {
        var stays = StayGroups.Of([0.0, 1.0, 2.0, 4.0], [false, false, false, false], [], resolutionHours: 0.5);

        var fit = LognormalStayFit.Fit(stays)!;

        // Exact by hand: the log-likelihood is ln Φ((ln 0.5 − μ)/σ) for the stay of 0 (interval-censored in (0, 0.5],
        // Klein and Moeschberger 2003, section 3.5) plus ln φ((ln x − μ)/σ) − ln σ − ln x for the others.
        double expected = Math.Log(Normal.CDF(0.0, 1.0, (Math.Log(0.5) - fit.Mu) / fit.Sigma));
        foreach (double x in new[] { 1.0, 2.0, 4.0 })
        {
            expected += Math.Log(Normal.PDF(0.0, 1.0, (Math.Log(x) - fit.Mu) / fit.Sigma)) - Math.Log(fit.Sigma) - Math.Log(x);
        }

        Assert.Equal(expected, fit.LogLikelihood, 1e-9);
        // The stay of 0 pulls μ below the mean of the other three logs (ln 2).
        Assert.True(fit.Mu < Math.Log(2.0));
    }

    [Fact]
    public void Lognormal_stays_cut_to_zero_below_the_resolution_are_recovered_within_their_intervals()
    {
        // Drawn lognormal with mean 0.5 h and cv 1.5 (about 8% of stays below 3 minutes), recorded as 0 when shorter
        // than 3 minutes: left out, or taken as exact zeros, they would bias μ; interval-censored, the truth is covered.
        const double Resolution = 0.05;
        var draw = CensoredExtract.Lognormal(0.5, 1.5);
        var random = new Random(23);
        double[] hours = [.. Enumerable.Range(0, 2_000).Select(_ => draw(random)).Select(x => x < Resolution ? 0.0 : x)];

        var evidence = StayEvidence.Estimate(new UnitObservations("xray", StayGroups.Of(hours, new bool[hours.Length], [], Resolution), [], [], []));

        // Exact by hand: the stays were drawn with mean 0.5 h and cv 1.5.
        Assert.True(hours.Count(x => x == 0.0) > 50);
        Assert.NotNull(evidence.AicDifference);
        Assert.Equal(ServiceKind.Lognormal, evidence.Chosen);
        Assert.True(evidence.Lognormal!.Mean.Interval.Contains(0.5));
        Assert.True(evidence.Lognormal.Cv.Interval.Contains(1.5));
    }

    [Fact]
    public void Stays_given_one_by_one_take_the_shortest_ended_stay_as_their_resolution()
    {
        // Exact by hand: the shortest ended stay longer than 0 is 0.5 h (the censored 0.25 h does not count).
        var stays = StayGroups.Of([0.0, 0.25, 0.5, 2.0], [false, true, false, false], []);

        Assert.Equal(0.5, stays.ResolutionHours);
    }
}
