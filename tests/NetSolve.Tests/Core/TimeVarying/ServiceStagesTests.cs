using NetSolve.Solving;

namespace NetSolve.Tests.Core.TimeVarying;

public class ServiceStagesTests
{
    // Exact by hand: a phase-type time's mean and second moment follow from its stages (mean of stage i is 1/r_i);
    // the fit keeps the mean and cv asked (Tijms, A First Course in Stochastic Models, 2003, section 5.9), and for
    // cv below 1/√20 gives Erlang(20), cv = 1/√20.
    [Theory]
    [InlineData(2.0, 1.0, 1.0)]
    [InlineData(2.0, 0.5, 0.5)]
    [InlineData(3.0, 0.6, 0.6)]
    [InlineData(0.25, 0.3, 0.3)]
    [InlineData(1.5, 2.0, 2.0)]
    [InlineData(4.0, 0.0, 0.22360679774997896)]
    public void The_stages_keep_the_mean_and_the_coefficient_of_variation(double meanHours, double cv, double fittedCv)
    {
        var stages = ServiceStages.Fit(meanHours, cv);

        var (mean, secondMoment) = Moments(stages);

        Assert.Equal(meanHours, mean, 1e-12 * meanHours);
        double variance = secondMoment - (mean * mean);
        Assert.Equal(fittedCv, Math.Sqrt(Math.Max(0.0, variance)) / mean, 1e-9);
    }

    // The time from entering stage i to leaving: T_i = X_i + (continue) T_(i+1), X_i exponential of rate r_i.
    private static (double Mean, double SecondMoment) Moments(ServiceStages stages)
    {
        int n = stages.Count;
        var first = new double[n + 1];
        var second = new double[n + 1];
        for (int i = n - 1; i >= 0; i--)
        {
            double r = stages.RatesPerHour[i];
            double q = stages.ContinueProbabilities[i];
            first[i] = (1.0 / r) + (q * first[i + 1]);
            second[i] = (2.0 / (r * r)) + (q * ((2.0 / r * first[i + 1]) + second[i + 1]));
        }

        double mean = 0.0;
        double secondMoment = 0.0;
        for (int i = 0; i < n; i++)
        {
            mean += stages.EntryProbabilities[i] * first[i];
            secondMoment += stages.EntryProbabilities[i] * second[i];
        }

        return (mean, secondMoment);
    }
}
