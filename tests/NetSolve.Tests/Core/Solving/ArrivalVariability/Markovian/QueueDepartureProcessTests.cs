using MathNet.Numerics.LinearAlgebra;
using NetSolve.Solving;

namespace NetSolve.Tests.Core.Solving.Variability;

/// <summary>The departure processes of queues as Markovian arrival processes.</summary>
public sealed class QueueDepartureProcessTests
{
    // Burke's theorem (P. J. Burke, Operations Research 4(6), 1956, pp. 699–704): the departures of a stable M/M/c queue
    // are Poisson at the arrival rate, so their index of dispersion is 1 at every window.
    [Theory]
    [InlineData(1, 0.8)]
    [InlineData(3, 0.6)]
    public void The_departures_of_a_markovian_queue_are_poisson(int servers, double load)
    {
        var gaps = PhaseTypeDistribution.FitTwoMoments(1.0, 1.0);
        var service = PhaseTypeDistribution.FitTwoMoments(load * servers, 1.0);
        var counts = QueueDepartureProcess.Build(gaps, service, servers, servers + 150).Counts();

        Assert.Equal(1.0, counts.RatePerHour, 1e-9);
        Assert.All((double[])[0.5, 5.0, 50.0, 500.0], hours => Assert.Equal(1.0, counts.IndexOfDispersion(hours), 1e-6));
    }

    // A stable queue passes on every patient, so over long windows its departures vary as its arrivals do: the
    // long-run index of departures is the arrivals' (here a Poisson flow, 1), whatever the service. Over windows
    // short against the busy periods a very variable service (SCV 4) shows through, as runs of departures after
    // long services (W. Whitt, Management Science 41(10), 1995, pp. 1704–1715, from memory).
    [Fact]
    public void A_variable_service_shows_in_short_windows_and_the_arrivals_in_long_ones()
    {
        var gaps = PhaseTypeDistribution.FitTwoMoments(1.0, 1.0);
        var service = PhaseTypeDistribution.FitTwoMoments(0.7, 4.0);
        var counts = QueueDepartureProcess.Build(gaps, service, 1, 400).Counts();

        Assert.Equal(1.0, counts.AsymptoticDispersion, 1e-6);
        Assert.True(counts.IndexOfDispersion(5.0) > 1.5, "runs of departures over a few services");
    }

    // The gap between two departures of a stable M/G/1 queue is a service if the first left someone behind
    // (probability ρ), else an idle gap and a service, so its SCV is 1 − ρ² + ρ²cs², exactly (by hand from the
    // moments; the decomposition's departure formula is exact here, W. Whitt, BSTJ 62(9), 1983). The gap of a MAP
    // in stationarity is phase-type with initial vector πD₁/λ and generator D₀ (Neuts 1989, from memory): its
    // moments are worked out here from the built matrices.
    [Theory]
    [InlineData(0.5, 4.0)]
    [InlineData(0.8, 0.5)]
    public void The_gaps_between_departures_of_an_m_g_1_queue_have_their_closed_form_scv(double load, double serviceScv)
    {
        var gaps = PhaseTypeDistribution.FitTwoMoments(1.0, 1.0);
        var service = PhaseTypeDistribution.FitTwoMoments(load, serviceScv);
        var process = QueueDepartureProcess.Build(gaps, service, 1, 300);

        var generator = process.Hidden + process.Marked;
        int n = process.States;
        var system = Matrix<double>.Build.DenseOfMatrix(generator.Transpose());
        system.SetRow(n - 1, Vector<double>.Build.Dense(n, 1.0));
        var normalising = Vector<double>.Build.Dense(n);
        normalising[n - 1] = 1.0;
        var stationary = system.Solve(normalising);
        var start = process.Marked.TransposeThisAndMultiply(stationary);
        start /= start.Sum();
        var inverse = (-Matrix<double>.Build.DenseOfMatrix(process.Hidden)).Inverse();
        var ones = Vector<double>.Build.Dense(n, 1.0);
        double mean = start * inverse * ones;
        double second = 2.0 * (start * inverse * inverse * ones);

        Assert.Equal(1.0, mean, 1e-8);
        Assert.Equal(1.0 - (load * load) + (load * load * serviceScv), second - 1.0, 1e-7);
    }
}
