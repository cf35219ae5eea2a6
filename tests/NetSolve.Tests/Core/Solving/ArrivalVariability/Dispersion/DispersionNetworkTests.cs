using MathNet.Numerics.LinearAlgebra;
using NetSolve.Model;
using NetSolve.Solving;

namespace NetSolve.Tests.Core.Solving.Variability;

/// <summary>
/// Indices of dispersion through the network (docs/methods.md, "Indices of dispersion through the network"): the
/// counts' algebra against exact Markovian-arrival-process counts and visit counts, and the limits the method must keep.
/// </summary>
public sealed class DispersionNetworkTests
{
    private static readonly double[] Windows = [0.1, 2.0, 50.0];

    // Splitting is exact for counts: keeping each patient with probability p turns a MAP (D₀, D₁) into
    // (D₀ + (1 − p)D₁, pD₁) (M. F. Neuts, 1989, from memory), whose counts are computed independently by ArrivalCounts.
    // Hyperexponential gaps of SCV 4 at 2/h pass an unlimited unit unchanged, then 30% go on.
    [Fact]
    public void A_split_flow_has_the_index_of_the_thinned_process()
    {
        ArrivalVariabilityUnit[] units = [Unlimited(2.0) with { ExternalPerHour = 2.0, ExternalScv = 4.0 }, Unlimited(0.6)];
        var thinned = MarkovianArrivalProcess.Renewal(PhaseTypeDistribution.FitTwoMoments(0.5, 4.0)).Thinned(0.3).Counts();

        foreach (double hours in Windows)
        {
            Assert.Equal(thinned.IndexOfDispersion(hours), DispersionNetwork.ArrivalDispersion(units, [new(0, 1, 0.3)], hours)[1], 1e-9);
        }
    }

    // Merging independent flows is exact for counts: the superposition of two MAPs is the MAP of Kronecker sums
    // (D₀ᵃ ⊕ D₀ᵇ, D₁ᵃ ⊕ D₁ᵇ) (Neuts 1989, from memory). Gaps of SCV 4 at 1/h and of SCV ¼ (Erlang-4) at 3/h.
    [Fact]
    public void Merged_independent_flows_have_the_index_of_the_superposed_process()
    {
        ArrivalVariabilityUnit[] units =
        [
            Unlimited(1.0) with { ExternalPerHour = 1.0, ExternalScv = 4.0 },
            Unlimited(3.0) with { ExternalPerHour = 3.0, ExternalScv = 0.25 },
            Unlimited(4.0),
        ];
        var a = MarkovianArrivalProcess.Renewal(PhaseTypeDistribution.FitTwoMoments(1.0, 4.0));
        var b = MarkovianArrivalProcess.Renewal(PhaseTypeDistribution.FitTwoMoments(1.0 / 3.0, 0.25));
        var superposed = new MarkovianArrivalProcess(KroneckerSum(a.Hidden, b.Hidden), KroneckerSum(a.Marked, b.Marked)).Counts();

        foreach (double hours in Windows)
        {
            Assert.Equal(superposed.IndexOfDispersion(hours), DispersionNetwork.ArrivalDispersion(units, [new(0, 2, 1.0), new(1, 2, 1.0)], hours)[2], 1e-9);
        }
    }

    // A flow split in two and merged again is the flow it was (an identity of counts): the covariance of the two parts
    // is carried. Averaging them as if independent would give (0.3² + 0.7²)·I + 2·0.3·0.7 instead, far from I for SCV 4.
    [Fact]
    public void A_flow_split_and_merged_again_keeps_its_index()
    {
        ArrivalVariabilityUnit[] units =
        [
            Unlimited(2.0) with { ExternalPerHour = 2.0, ExternalScv = 4.0 },
            Unlimited(0.6),
            Unlimited(1.4),
            Unlimited(2.0),
        ];
        ArrivalVariabilityRoute[] routes = [new(0, 1, 0.3), new(0, 2, 0.7), new(1, 3, 1.0), new(2, 3, 1.0)];

        foreach (double hours in Windows)
        {
            var index = DispersionNetwork.ArrivalDispersion(units, routes, hours);
            double independent = (0.58 * index[0]) + 0.42;
            Assert.Equal(index[0], index[3], 1e-9);
            Assert.True(hours < 1.0 || Math.Abs(independent - index[3]) > 0.3, "the independent average would differ");
        }
    }

    // A repeat visit with probability p: each patient visits V times, V geometric, P(V = n) = (1 − p)pⁿ⁻¹. Over long
    // windows the visits of Poisson arrivals are a compound Poisson count with index E[V²]/E[V] (any probability
    // textbook), summed here from the distribution; it is (1 + p)/(1 − p). The same holds for a loop through a second
    // unit (back with probability p): every patient visits both V times.
    [Theory]
    [InlineData(0.3)]
    [InlineData(0.6)]
    public void A_loop_amplifies_the_long_run_index_to_the_visit_counts_index(double p)
    {
        double visits = 0.0;
        double squares = 0.0;
        for (int n = 1; n < 2_000; n++)
        {
            double probability = (1.0 - p) * Math.Pow(p, n - 1);
            visits += n * probability;
            squares += n * (double)n * probability;
        }

        double flow = 1.0 / (1.0 - p);
        ArrivalVariabilityUnit[] repeat = [new(flow, Servers.Of(1), 0.5, 1.0) { ExternalPerHour = 1.0 }];
        ArrivalVariabilityUnit[] loop = [new(flow, Servers.Of(2), 0.6, 1.0) { ExternalPerHour = 1.0 }, new(flow, Servers.Of(3), 0.4, 1.0)];

        Assert.Equal(squares / visits, DispersionNetwork.ArrivalDispersion(repeat, [new(0, 0, p)], double.PositiveInfinity)[0], 1e-9);
        var looped = DispersionNetwork.ArrivalDispersion(loop, [new(0, 1, 1.0), new(1, 0, p)], double.PositiveInfinity);
        Assert.Equal(squares / visits, looped[0], 1e-9);
        Assert.Equal(squares / visits, looped[1], 1e-9);
        Assert.Equal((1.0 + p) / (1.0 - p), squares / visits, 1e-9);
    }

    // Jackson's network, feed-forward: Poisson arrivals, exponential service, flows split and merged. Every flow is
    // Poisson (Burke's theorem and Poisson splitting, any queueing textbook), so the counts' algebra itself must give
    // 1 at every window; the method returns exactly 1, the Jackson answer.
    [Fact]
    public void Feed_forward_jackson_flows_have_index_1_at_every_window_and_the_method_gives_exactly_1()
    {
        ArrivalVariabilityUnit[] units =
        [
            new(2.0, Servers.Of(1), 0.8, 1.0) { ExternalPerHour = 2.0 },
            new(0.8, Servers.Of(2), 0.5, 1.0),
            new(1.2, Servers.Of(3), 0.9, 1.0),
            new(2.5, Servers.Of(1), 0.7, 1.0) { ExternalPerHour = 0.5 },
        ];
        ArrivalVariabilityRoute[] routes = [new(0, 1, 0.4), new(0, 2, 0.6), new(1, 3, 1.0), new(2, 3, 1.0)];

        foreach (double hours in (double[])[0.01, 0.5, 5.0, 80.0, double.PositiveInfinity])
        {
            Assert.All(DispersionNetwork.ArrivalDispersion(units, routes, hours), index => Assert.Equal(1.0, index, 1e-12));
        }

        Assert.All(ArrivalVariability.Solve(units, routes, ArrivalVariabilityMethod.IndicesOfDispersion).ArrivalScv, scv => Assert.Equal(1.0, scv));
    }

    // Pollaczek–Khinchine: Poisson arrivals at one server wait as M/G/1 whatever the service (exact), so the unit's
    // arrival SCV must be exactly 1 (the G/G/c formulas then give the P–K wait); its departures (service SCV 4 at load
    // 0.8) are burstier, so the next unit sees more than 1.
    [Fact]
    public void Poisson_arrivals_at_one_server_keep_scv_1_and_its_departures_are_burstier()
    {
        ArrivalVariabilityUnit[] units = [new(1.0, Servers.Of(1), 0.8, 4.0) { ExternalPerHour = 1.0 }, new(1.0, Servers.Of(1), 0.5, 1.0)];

        var solution = ArrivalVariability.Solve(units, [new(0, 1, 1.0)], ArrivalVariabilityMethod.IndicesOfDispersion);

        Assert.Equal(1.0, solution.ArrivalScv[0]);
        Assert.InRange(solution.ArrivalScv[1], 1.2, 4.0);
    }

    // Heavy traffic: a renewal flow of SCV c0² at one server near saturation is seen over a window of thousands of
    // gaps, where its index is c0² (D. R. Cox, Renewal Theory, Methuen, 1962, from memory), so the equivalent SCV is
    // c0² and the wait is within 1% of Kingman's heavy-traffic mean ρm(ca² + cs²)/(2(1 − ρ)) (J. F. C. Kingman, 1961,
    // from memory), here with m = 0.99 h and λ = 1/h.
    [Theory]
    [InlineData(2.0)]
    [InlineData(0.5)]
    public void A_renewal_flow_at_a_server_near_saturation_keeps_its_scv(double externalScv)
    {
        ArrivalVariabilityUnit[] units = [new(1.0, Servers.Of(1), 0.99, 0.5) { ExternalPerHour = 1.0, ExternalScv = externalScv }];

        var solution = ArrivalVariability.Solve(units, [], ArrivalVariabilityMethod.IndicesOfDispersion);
        double wait = GgcFormulas.Estimate(1, 1.0, 0.99, solution.ArrivalScv[0], 0.5).MeanWaitHours!.Value;
        double kingman = 0.99 * 0.99 * (externalScv + 0.5) / (2.0 * 0.01);

        Assert.Equal(externalScv, solution.ArrivalScv[0], 0.01);
        Assert.Equal(1.0, wait / kingman, 0.01);
    }

    // The asymptotic method's limit (W. Whitt, Operations Research 30(1), 1982, from memory): a unit far busier than
    // its source looks over windows so long that the source's departures are its Poisson arrivals, whatever the
    // source's service variability (SCV 4 at load 0.8): ca² → 1, where the decomposition gives 1 + 0.8²·3 = 2.92.
    [Fact]
    public void A_unit_far_busier_than_its_source_sees_the_sources_arrivals()
    {
        ArrivalVariabilityUnit[] units = [new(1.0, Servers.Of(1), 0.8, 4.0) { ExternalPerHour = 1.0 }, new(1.0, Servers.Of(1), 0.995, 1.0)];

        var solution = ArrivalVariability.Solve(units, [new(0, 1, 1.0)], ArrivalVariabilityMethod.IndicesOfDispersion);

        Assert.Equal(1.0, solution.ArrivalScv[1], 0.06);
    }

    // Dense algebra is meant for networks of up to ArrivalVariability.DenseLimit (100) reached units; beyond, and with
    // no flow at all, the decomposition's SCVs are returned unchanged (docs/methods.md). A chain of 101 units fed by a
    // bursty stream (SCV 3) is past the limit; the same chain with no arrivals has no flows.
    [Fact]
    public void Networks_past_the_dense_limit_or_without_flow_keep_the_decomposition()
    {
        var chain = Enumerable.Range(0, ArrivalVariability.DenseLimit + 1)
            .Select(i => new ArrivalVariabilityUnit(1.0, Servers.Of(1), 0.6, 0.5) { ExternalPerHour = i == 0 ? 1.0 : 0.0, ExternalScv = 3.0 })
            .ToArray();
        var routes = Enumerable.Range(0, ArrivalVariability.DenseLimit).Select(i => new ArrivalVariabilityRoute(i, i + 1, 1.0)).ToArray();
        var empty = chain.Select(unit => unit with { ArrivalsPerHour = 0.0, ExternalPerHour = 0.0 }).ToArray();

        Assert.Equal(
            ArrivalVariability.Solve(chain, routes).ArrivalScv,
            ArrivalVariability.Solve(chain, routes, ArrivalVariabilityMethod.IndicesOfDispersion).ArrivalScv);
        Assert.All(ArrivalVariability.Solve(empty, routes, ArrivalVariabilityMethod.IndicesOfDispersion).ArrivalScv, scv => Assert.Equal(1.0, scv));
    }

    private static ArrivalVariabilityUnit Unlimited(double arrivalsPerHour) => new(arrivalsPerHour, Servers.Unlimited, 0.0, 1.0);

    private static Matrix<double> KroneckerSum(Matrix<double> a, Matrix<double> b) =>
        a.KroneckerProduct(Matrix<double>.Build.DenseIdentity(b.RowCount)) + Matrix<double>.Build.DenseIdentity(a.RowCount).KroneckerProduct(b);
}
