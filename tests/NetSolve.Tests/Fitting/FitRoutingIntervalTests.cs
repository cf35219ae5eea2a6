using System.Globalization;
using System.Text;
using NetSolve.Fitting;
using NetSolve.Model;

namespace NetSolve.Tests.Fitting;

public sealed class FitRoutingIntervalTests
{
    private const string Header = "patient,unit,arrived,started,left\n";

    private static readonly DateTime Origin = new(2026, 3, 2, 0, 0, 0, DateTimeKind.Utc);

    [Fact]
    public void The_written_fraction_and_its_interval_share_the_departures_as_denominator()
    {
        // Four patients go from the X-ray to the ward; twelve ward patients have an X-ray inside their ward stay (side
        // visits: they return to the ward, so they choose no route).
        var rows = new StringBuilder(Header);
        for (int i = 0; i < 4; i++)
        {
            Row(rows, string.Create(CultureInfo.InvariantCulture, $"Q{i}"), "xray", i * 3.0, (i * 3.0) + 0.5);
            Row(rows, string.Create(CultureInfo.InvariantCulture, $"Q{i}"), "ward", (i * 3.0) + 0.5, (i * 3.0) + 40.0);
        }

        for (int i = 0; i < 12; i++)
        {
            Row(rows, string.Create(CultureInfo.InvariantCulture, $"S{i}"), "ward", 20.0 + i, 60.0 + i);
            Row(rows, string.Create(CultureInfo.InvariantCulture, $"S{i}"), "xray", 22.0 + i, 22.5 + i);
        }

        var fitted = Fit(rows.ToString());

        var route = fitted.Evidence.Units.Single(unit => unit.UnitId == "xray").Routes.Single();
        double written = fitted.Network.Routes.Single(r => r.From == "xray").Probability;
        // Exact by hand: 4 moves out of 4 departures (the 12 side visits are no departures), so 1; the Wilson interval
        // of 4 in 4 is [n/(n + z²), 1] = [0.510, 1] (Wilson, JASA 22, 1927, 209–212). Over all 16 ended X-ray stays the
        // interval would end at 0.49, below the written fraction.
        Assert.Equal(1.0, written);
        Assert.Equal((4, 4), (route.Count, route.Total));
        Assert.Equal(written, route.Fraction.Value);
        Assert.True(route.Fraction.Interval.Contains(written));
        Assert.Equal(4.0 / (4.0 + (1.959963984540054 * 1.959963984540054)), route.Fraction.Interval.Lower, 1e-9);
    }

    [Fact]
    public void Routing_intervals_cover_the_true_fraction_about_95_percent_of_the_time()
    {
        const double TrueFraction = 0.3;
        const int Seeds = 200;
        int covered = 0;
        for (int seed = 0; seed < Seeds; seed++)
        {
            var fitted = Fit(SeededLog(seed, TrueFraction, patients: 40));
            var route = fitted.Evidence.Units.Single(unit => unit.UnitId == "xray").Routes.Single();
            double written = fitted.Network.Routes.Single(r => r.From == "xray").Probability;
            Assert.Equal(written, route.Fraction.Value, 1e-12);
            Assert.True(route.Fraction.Interval.Contains(written));
            covered += route.Fraction.Interval.Contains(TrueFraction) ? 1 : 0;
        }

        // Source: Brown, Cai and DasGupta, "Interval estimation for a binomial proportion", Statistical Science 16(2),
        // 2001, 101–133, Figure 4 (from memory): the Wilson interval's coverage at n = 40 stays within about 93–97%.
        // 200 logs add a sampling error of about 1.5 points, so 90–99% is allowed.
        Assert.InRange(covered / (double)Seeds, 0.90, 0.99);
    }

    /// <summary>
    /// <paramref name="patients"/> enter at the X-ray and move to the ward with chance <paramref name="fraction"/>, else
    /// leave; half the ward patients have an X-ray side visit, which the routing must not count as a departure.
    /// </summary>
    private static string SeededLog(int seed, double fraction, int patients)
    {
        var random = new Random(seed);
        var rows = new StringBuilder(Header);
        for (int i = 0; i < patients; i++)
        {
            double arrived = i * 2.0;
            Row(rows, string.Create(CultureInfo.InvariantCulture, $"P{i}"), "xray", arrived, arrived + 0.5);
            if (random.NextDouble() < fraction)
            {
                Row(rows, string.Create(CultureInfo.InvariantCulture, $"P{i}"), "ward", arrived + 0.5, arrived + 30.0);
                if (random.NextDouble() < 0.5)
                {
                    Row(rows, string.Create(CultureInfo.InvariantCulture, $"P{i}"), "xray", arrived + 5.0, arrived + 5.25);
                }
            }
        }

        // One ward stay for every log, so the ward exists even when nobody moved there.
        Row(rows, "W", "ward", 0.0, 10.0);
        return rows.ToString();
    }

    private static void Row(StringBuilder rows, string patient, string unit, double arrivedHours, double leftHours)
    {
        string arrived = Origin.AddHours(arrivedHours).ToString("yyyy-MM-dd'T'HH:mm:ss", CultureInfo.InvariantCulture);
        string left = Origin.AddHours(leftHours).ToString("yyyy-MM-dd'T'HH:mm:ss", CultureInfo.InvariantCulture);
        rows.Append(CultureInfo.InvariantCulture, $"{patient},{unit},{arrived},{arrived},{left}\n");
    }

    private static FittedNetwork Fit(string text)
    {
        var (log, diagnostics) = MovementLogReader.Read(text, "log.csv");
        Assert.DoesNotContain(diagnostics, d => d.IsError);
        return NetworkFitter.Fit(log!, "test", TimeUnit.Hour);
    }
}
