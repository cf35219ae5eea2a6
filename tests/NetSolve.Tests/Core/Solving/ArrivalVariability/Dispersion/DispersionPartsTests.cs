using MathNet.Numerics;
using NetSolve.Solving;

namespace NetSolve.Tests.Core.Solving.Variability;

/// <summary>The parts of the indices-of-dispersion method: renewal counts, the departure weight, the robust-queueing SCV.</summary>
public sealed class DispersionPartsTests
{
    // Erlang-10 gaps at 1 patient per hour (SCV 0.1, finer than the Markovian option's fits): the phase completions
    // are Poisson at 10/h and every tenth is an arrival, the stationary phase uniform, so N(t) = ⌊(M + U)/10⌋ with M
    // Poisson(10t) and U uniform on 0..9 (summed here, not by the code under test).
    [Theory]
    [InlineData(0.3)]
    [InlineData(4.0)]
    public void Erlang_10_gaps_give_the_dispersion_of_every_tenth_poisson_event(double hours)
    {
        double mean = 0.0;
        double square = 0.0;
        for (int m = 0; m < 600; m++)
        {
            double probability = Math.Exp((m * Math.Log(10.0 * hours)) - (10.0 * hours) - SpecialFunctions.GammaLn(m + 1.0));
            for (int u = 0; u < 10; u++)
            {
                int n = (m + u) / 10;
                mean += 0.1 * probability * n;
                square += 0.1 * probability * n * n;
            }
        }

        var renewal = RenewalDispersion.Of(1.0, 0.1);

        Assert.Equal(hours, mean, 1e-9);
        Assert.Equal((square - (mean * mean)) / mean, renewal.At(hours), 1e-8);
        Assert.Equal(0.1, renewal.At(double.PositiveInfinity), 1e-10);
        Assert.Equal(1.0, RenewalDispersion.Of(2.0, 1.0).At(hours));
    }

    // w*(x) = 1 − (1 − c*(x))/(2x) with c*(1) = 4(φ(1) − Φᶜ(1)) (J. Abate and W. Whitt, Stochastic Models 4(3), 1988,
    // from memory; φ(1) = 0.24197072451914337, Φᶜ(1) = 0.15865525393145707 from any normal table): 0 at x = 0 (departures
    // are service completions over short windows), (1 + c*(1))/2 at x = 1, 1 − 1/(2x) once c* has vanished.
    [Fact]
    public void The_departure_weight_rises_from_0_to_1_through_its_closed_form()
    {
        double correlationAt1 = 4.0 * (0.24197072451914337 - 0.15865525393145707);

        Assert.Equal(0.0, DepartureDispersionWeight.Canonical(0.0));
        Assert.Equal(0.5 * (1.0 + correlationAt1), DepartureDispersionWeight.Canonical(1.0), 1e-12);
        Assert.Equal(1.0 - (1.0 / 2e6), DepartureDispersionWeight.Canonical(1e6), 1e-12);
        Assert.Equal(1.0, DepartureDispersionWeight.Canonical(double.PositiveInfinity));
        Assert.True(DepartureDispersionWeight.Canonical(0.01) < DepartureDispersionWeight.Canonical(0.1));
    }

    // The robust-queueing supremum of −a·t + b·√t is b²/(4a) at t = b²/(4a²) (calculus); with a constant index I the
    // equivalent SCV is I again. Here I = 1.7 over every window from a tenth of the maximiser up, and 1 far below it,
    // where the supremum is not: the result is 1.7. For one server at load 0.75 with m = 1 h, λ = 0.75/h, cs² = 0.5
    // the maximiser is ρm(I + cs²)/(2(1 − ρ)²) = 13.2 h.
    [Fact]
    public void An_index_constant_around_the_maximising_window_is_the_equivalent_scv()
    {
        double[] windows = [.. Enumerable.Range(0, 121).Select(k => Math.Pow(10.0, (k / 20.0) - 3.0))];
        double[] index = [.. windows.Select(hours => hours < 1.32 ? 1.0 : 1.7)];

        double scv = RobustQueueingScv.Equivalent(windows, index, 0.75, 1.0, 1, 0.75, 0.5);

        Assert.Equal(1.7, scv, 1e-9);
    }
}
