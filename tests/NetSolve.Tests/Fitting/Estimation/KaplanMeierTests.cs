using NetSolve.Fitting.Estimation;

namespace NetSolve.Tests.Fitting.Estimation;

public sealed class KaplanMeierTests
{
    private const double Tolerance = 1e-9;

    // The 6-MP group of Freireich et al. (Blood 21, 1963), weeks in remission; true marks a censored time.
    private static readonly (double Weeks, bool Censored)[] SixMp =
    [
        (6, false), (6, false), (6, false), (6, true), (7, false), (9, true), (10, false), (10, true), (11, true), (13, false),
        (16, false), (17, true), (19, true), (20, true), (22, false), (23, false), (25, true), (32, true), (32, true), (34, true), (35, true),
    ];

    [Theory]
    // Source: Klein and Moeschberger, Survival Analysis, 2nd ed., Springer 2003, Example 4.1, Table 4.1A (p. 94 from
    // memory): the product-limit estimate and Greenwood standard error of the 6-MP group, printed to 3 decimals.
    [InlineData(6, 0.857, 0.076)]
    [InlineData(7, 0.807, 0.087)]
    [InlineData(10, 0.753, 0.096)]
    [InlineData(13, 0.690, 0.107)]
    [InlineData(16, 0.627, 0.114)]
    [InlineData(22, 0.538, 0.128)]
    [InlineData(23, 0.448, 0.135)]
    public void The_six_mp_remission_data_give_the_published_curve_and_greenwood_errors(double weeks, double survival, double standardError)
    {
        var curve = Estimate(SixMp);
        int step = curve.Times.IndexOf(weeks);

        Assert.True(step >= 0);
        Assert.Equal(survival, curve.Survival[step], 0.0005);
        Assert.Equal(standardError, curve.StandardError[step], 0.0005);
    }

    [Fact]
    public void The_six_mp_mean_restricted_to_35_weeks_is_the_published_one()
    {
        var (mean, error) = Estimate(SixMp).RestrictedMean(35.0);

        // Source: Klein and Moeschberger, Survival Analysis, 2nd ed., 2003, section 4.5 (Example 4.2 from memory): the
        // 6-MP mean restricted to 35 weeks is 23.287 with standard error 2.827.
        Assert.Equal(23.287, mean, 0.0005);
        Assert.Equal(2.827, error, 0.0005);
    }

    [Fact]
    public void A_curve_ending_on_a_censored_stay_is_continued_by_the_exponential_tail_through_its_last_point()
    {
        var curve = Estimate(SixMp);

        // Exact by hand: S(35) = 0.448179 (the last step), so the tail adds S·35 / (−ln S) to the area up to 35.
        double last = curve.Survival[^1];
        Assert.True(curve.LastIsCensored);
        Assert.Equal(curve.RestrictedMean(35.0).MeanHours + (last * 35.0 / -Math.Log(last)), curve.MeanWithTail()!.Value, Tolerance);
    }

    [Fact]
    public void Without_censoring_the_curve_is_the_empirical_one_and_its_mean_the_sample_mean()
    {
        var curve = Estimate([(1, false), (2, false), (2, false), (5, false)]);

        // Exact by hand: S = 3/4 after 1, 1/4 after 2, 0 after 5; the area under it is the sample mean 10/4.
        Assert.Equal([0.75, 0.25, 0.0], curve.Survival);
        Assert.Equal([4, 3, 1], curve.AtRisk);
        Assert.Equal(2.5, curve.MeanWithTail()!.Value, Tolerance);
        Assert.False(curve.LastIsCensored);
    }

    [Fact]
    public void A_stay_already_running_at_the_start_joins_the_risk_set_only_after_its_age()
    {
        // Exact by hand: ends at 2, 4, 6; the stay of age 3 is at risk at 4 and 6 but not at 2.
        // At 2: n = 2 (the two stays from 0), S = 1/2. At 4: n = 2 (the stay ending at 6 and the late one), S = 1/4.
        // At 6: n = 1, S = 0.
        double[] hours = [2, 6, 4];
        bool[] censored = [false, false, false];
        double[] ages = [0, 0, 3];

        var curve = KaplanMeier.Estimate(hours, censored, ages);

        Assert.Equal([2.0, 4.0, 6.0], curve.Times);
        Assert.Equal([2, 2, 1], curve.AtRisk);
        Assert.Equal([0.5, 0.25, 0.0], curve.Survival);
    }

    [Fact]
    public void A_stay_censored_at_an_end_time_is_still_at_risk_then()
    {
        var curve = Estimate([(3, false), (3, true), (4, false)]);

        // Exact by hand: at 3 all three are at risk and one ends, S = 2/3; at 4 one is at risk, S = 0.
        Assert.Equal([3, 1], curve.AtRisk);
        Assert.Equal(2.0 / 3.0, curve.Survival[0], Tolerance);
    }

    [Fact]
    public void No_ended_stay_gives_an_empty_curve_and_no_mean()
    {
        var curve = Estimate([(3, true), (4, true)]);

        Assert.Empty(curve.Times);
        Assert.Null(curve.MeanWithTail());
        Assert.Equal(1.0, curve.SurvivalAt(10.0));
    }

    private static KaplanMeierCurve Estimate((double Hours, bool Censored)[] stays) =>
        KaplanMeier.Estimate(stays.Select(stay => stay.Hours).ToArray(), stays.Select(stay => stay.Censored).ToArray(), []);
}
