using System.Globalization;
using NetSolve.Fitting.Estimation;

namespace NetSolve.Tests.Fitting.Estimation;

/// <summary>
/// How often the 95% intervals of the mean stay and the cv cover the true values over many seeded extracts: a 7-day
/// window on 5-day stays, ten admissions a day. Results in docs/movement-log.md.
/// </summary>
public sealed class IntervalCoverageLongTests
{
    private const int Seeds = 1000;
    private const double MeanHours = 120.0;
    private const double WindowHours = 168.0;
    private const double ArrivalsPerHour = 10.0 / 24.0;

    /// <summary>Below this share the intervals are too narrow to be called 95% (a 1,000-seed binomial spread is about ±1.4 points).</summary>
    private const double MinCoverage = 0.92;

    private readonly ITestOutputHelper _output;

    public IntervalCoverageLongTests(ITestOutputHelper output) => _output = output;

    [Fact(Explicit = true)]
    [Trait("Category", "Long")]
    public void Exponential_mean_intervals_cover_the_true_mean_about_95_percent_of_the_time()
    {
        int exponentialCovered = 0;
        int chosenCovered = 0;
        for (int seed = 1; seed <= Seeds; seed++)
        {
            var (unit, _) = CensoredExtract.Draw(seed, ArrivalsPerHour, WindowHours, CensoredExtract.Exponential(MeanHours), MeanHours);
            var evidence = StayEvidence.Estimate(unit);
            exponentialCovered += evidence.Exponential!.Mean.Interval.Contains(MeanHours) ? 1 : 0;
            chosenCovered += evidence.Mean!.Value.Interval.Contains(MeanHours) ? 1 : 0;
        }

        // Common practice: a 95% interval should cover the truth in about 95% of repetitions.
        Report("exponential", ("exponential fit's mean", exponentialCovered), ("chosen fit's mean", chosenCovered));
        Assert.True(exponentialCovered >= MinCoverage * Seeds);
        Assert.True(chosenCovered >= MinCoverage * Seeds);
    }

    [Fact(Explicit = true)]
    [Trait("Category", "Long")]
    public void Lognormal_mean_and_cv_intervals_cover_the_true_values_about_95_percent_of_the_time()
    {
        const double cv = 0.6;
        int meanCovered = 0;
        int cvCovered = 0;
        int chosenCovered = 0;
        for (int seed = 1; seed <= Seeds; seed++)
        {
            var (unit, _) = CensoredExtract.Draw(seed, ArrivalsPerHour, WindowHours, CensoredExtract.Lognormal(MeanHours, cv), MeanHours);
            var evidence = StayEvidence.Estimate(unit);
            meanCovered += evidence.Lognormal!.Mean.Interval.Contains(MeanHours) ? 1 : 0;
            cvCovered += evidence.Lognormal.Cv.Interval.Contains(cv) ? 1 : 0;
            chosenCovered += evidence.Mean!.Value.Interval.Contains(MeanHours) ? 1 : 0;
        }

        // Common practice: a 95% interval should cover the truth in about 95% of repetitions.
        Report("lognormal cv 0.6", ("lognormal fit's mean", meanCovered), ("lognormal fit's cv", cvCovered), ("chosen fit's mean", chosenCovered));
        Assert.True(meanCovered >= MinCoverage * Seeds);
        Assert.True(cvCovered >= MinCoverage * Seeds);
    }

    private void Report(string stays, params (string What, int Covered)[] results)
    {
        var lines = results.Select(result => string.Create(CultureInfo.InvariantCulture,
            $"{stays} stays, {result.What}: covered in {result.Covered} of {Seeds} extracts ({100.0 * result.Covered / Seeds:0.0}%)")).ToList();
        lines.ForEach(_output.WriteLine);

        // The test runner shows output only for failures: the summary also goes to a file, for docs/movement-log.md.
        File.AppendAllLines(Path.Combine(Path.GetTempPath(), "netsolve-fit-interval-coverage.txt"), lines);
    }
}
