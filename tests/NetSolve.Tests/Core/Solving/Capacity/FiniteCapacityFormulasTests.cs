using MathNet.Numerics.LinearAlgebra;
using NetSolve.Solving;

namespace NetSolve.Tests.Core.Solving.Capacity;

public sealed class FiniteCapacityFormulasTests
{
    private const double Exact = 1e-12;

    // Source: Gross, Shortle, Thompson and Harris, Fundamentals of Queueing Theory, 4th ed., section 2.5 (M/M/1/K):
    // p_n = (1 − ρ)ρ^n / (1 − ρ^(K+1)). Exact by hand at ρ = 0.5, K = 3, μ = 1/h: p = 8/15, 4/15, 2/15, 1/15;
    // L = 11/15, Lq = p2 + 2·p3 = 4/15, admitted = 0.5·14/15 = 7/15 per hour, W = 11/7 h, Wq = 4/7 h,
    // P(wait | admitted) = (p1 + p2)/(1 − p3) = 3/7, utilisation = 1 − p0 = 7/15.
    [Fact]
    public void One_server_at_half_load_holding_three_matches_the_closed_form()
    {
        var result = FiniteCapacityFormulas.Solve(1, 3, 0.5, 1.0);

        Assert.Equal(1.0 / 15.0, result.FullProbability, Exact);
        Assert.Equal(7.0 / 15.0, result.AdmittedPerHour, Exact);
        Assert.Equal(0.5 / 15.0, result.BlockedPerHour, Exact);
        Assert.Equal(7.0 / 15.0, result.Utilisation, Exact);
        Assert.Equal(3.0 / 7.0, result.WaitProbability, Exact);
        Assert.Equal(4.0 / 15.0, result.MeanQueue, Exact);
        Assert.Equal(11.0 / 15.0, result.MeanInUnit, Exact);
        Assert.Equal(4.0 / 7.0, result.MeanWaitHours, Exact);
        Assert.Equal(11.0 / 7.0, result.MeanTimeInUnitHours, Exact);
        Assert.Equal(FiniteCapacityFormulas.MarkovianMethod, result.Method);
    }

    // Source: Gross and Harris, section 2.5, M/M/1/K at ρ = 1: p_n = 1/(K + 1). Exact by hand for K = 4, λ = μ = 1/h:
    // P(full) = 1/5, L = 2, Lq = (1 + 2 + 3)/5 = 6/5, admitted 4/5 per hour, Wq = 3/2 h, W = 5/2 h.
    [Fact]
    public void One_server_at_full_load_spreads_the_patients_evenly()
    {
        var result = FiniteCapacityFormulas.Solve(1, 4, 1.0, 1.0);

        Assert.Equal(0.2, result.FullProbability, Exact);
        Assert.Equal(0.8, result.AdmittedPerHour, Exact);
        Assert.Equal(0.8, result.Utilisation, Exact);
        Assert.Equal(2.0, result.MeanInUnit, Exact);
        Assert.Equal(1.2, result.MeanQueue, Exact);
        Assert.Equal(1.5, result.MeanWaitHours, Exact);
        Assert.Equal(2.5, result.MeanTimeInUnitHours, Exact);
        Assert.Equal(0.75, result.WaitProbability, Exact);
    }

    // Exact by hand: M/M/1/2 at ρ = 2 (λ = 2/h, μ = 1/h): weights 1, 2, 4 over 7; P(full) = 4/7, L = 10/7, Lq = 4/7,
    // admitted 6/7 per hour, W = 5/3 h, Wq = 2/3 h, P(wait | admitted) = (2/7)/(3/7) = 2/3, utilisation 6/7.
    [Fact]
    public void An_overloaded_unit_blocks_patients_instead_of_being_unstable()
    {
        var result = FiniteCapacityFormulas.Solve(1, 2, 2.0, 1.0);

        Assert.Equal(4.0 / 7.0, result.FullProbability, Exact);
        Assert.Equal(6.0 / 7.0, result.AdmittedPerHour, Exact);
        Assert.Equal(8.0 / 7.0, result.BlockedPerHour, Exact);
        Assert.Equal(6.0 / 7.0, result.Utilisation, Exact);
        Assert.Equal(10.0 / 7.0, result.MeanInUnit, Exact);
        Assert.Equal(4.0 / 7.0, result.MeanQueue, Exact);
        Assert.Equal(2.0 / 3.0, result.MeanWaitHours, Exact);
        Assert.Equal(5.0 / 3.0, result.MeanTimeInUnitHours, Exact);
        Assert.Equal(2.0 / 3.0, result.WaitProbability, Exact);
    }

    // Exact by hand: M/M/2/3, λ = 2/h, μ = 1/h (a = 2): weights 1, 2, 2, 2 over 7; P(full) = 2/7, L = 12/7, Lq = 2/7,
    // busy servers 10/7 (utilisation 5/7), admitted 10/7 per hour, Wq = 1/5 h, W = 6/5 h, P(wait | admitted) = 2/5.
    [Fact]
    public void Two_servers_holding_three_match_hand_worked_values()
    {
        var result = FiniteCapacityFormulas.Solve(2, 3, 2.0, 1.0);

        Assert.Equal(2.0 / 7.0, result.FullProbability, Exact);
        Assert.Equal(10.0 / 7.0, result.AdmittedPerHour, Exact);
        Assert.Equal(5.0 / 7.0, result.Utilisation, Exact);
        Assert.Equal(12.0 / 7.0, result.MeanInUnit, Exact);
        Assert.Equal(2.0 / 7.0, result.MeanQueue, Exact);
        Assert.Equal(0.2, result.MeanWaitHours, Exact);
        Assert.Equal(1.2, result.MeanTimeInUnitHours, Exact);
        Assert.Equal(0.4, result.WaitProbability, Exact);
    }

    // From memory: the Erlang B table, B(10 servers, 5 erlangs) = 0.01838457 (8 decimals; the recurrence
    // B(k) = a·B(k−1)/(k + a·B(k−1)) reproduces it). Exact by hand: B(1, 0.5) = 0.5/1.5 = 1/3; B(2, 1) = 1/5.
    [Theory]
    [InlineData(10, 5.0, 0.01838457, 5e-9)]
    [InlineData(1, 0.5, 1.0 / 3.0, Exact)]
    [InlineData(2, 1.0, 0.2, Exact)]
    public void Capacity_equal_to_servers_is_the_Erlang_loss_system(int servers, double offeredLoad, double blocking, double tolerance)
    {
        const double meanServiceHours = 2.0;
        double arrivalsPerHour = offeredLoad / meanServiceHours;

        var result = FiniteCapacityFormulas.Solve(servers, servers, arrivalsPerHour, meanServiceHours);

        Assert.Equal(blocking, result.FullProbability, tolerance);
        Assert.Equal(arrivalsPerHour * (1.0 - blocking), result.AdmittedPerHour, tolerance);
        Assert.Equal(offeredLoad * (1.0 - blocking), result.MeanInUnit, tolerance);
        Assert.Equal(0.0, result.MeanQueue);
        Assert.Equal(0.0, result.WaitProbability);
        Assert.Equal(meanServiceHours, result.MeanTimeInUnitHours);
        Assert.Equal(FiniteCapacityFormulas.ErlangLossMethod, result.Method);
    }

    // Exact by hand: the generator of the birth–death chain (birth λ, death min(n, c)·μ) solved densely by MathNet,
    // πQ = 0 with Σπ = 1, independent of the ratio walk in the formula.
    [Theory]
    [InlineData(1, 5, 0.7, 1.0)]
    [InlineData(3, 8, 2.5, 1.0)]
    [InlineData(4, 12, 9.0, 0.5)]
    [InlineData(5, 6, 1.0, 3.0)]
    [InlineData(2, 30, 1.0, 2.0)]
    public void Every_metric_matches_a_directly_solved_birth_death_chain(int servers, int capacity, double arrivalsPerHour, double meanServiceHours)
    {
        double[] p = SolveGenerator(servers, capacity, arrivalsPerHour, 1.0 / meanServiceHours);
        double inUnit = p.Select((pn, n) => n * pn).Sum();
        double queue = p.Select((pn, n) => Math.Max(0, n - servers) * pn).Sum();
        double busy = p.Select((pn, n) => Math.Min(n, servers) * pn).Sum();
        double waitOnArrival = p.Take(capacity).Skip(servers).Sum();
        double admitted = arrivalsPerHour * (1.0 - p[capacity]);

        var result = FiniteCapacityFormulas.Solve(servers, capacity, arrivalsPerHour, meanServiceHours);

        const double Dense = 1e-10;
        Assert.Equal(p[capacity], result.FullProbability, Dense);
        Assert.Equal(admitted, result.AdmittedPerHour, Dense);
        Assert.Equal(busy / servers, result.Utilisation, Dense);
        Assert.Equal(waitOnArrival / (1.0 - p[capacity]), result.WaitProbability, Dense);
        Assert.Equal(queue, result.MeanQueue, Dense);
        Assert.Equal(inUnit, result.MeanInUnit, Dense);
        Assert.Equal(queue / admitted, result.MeanWaitHours, Dense);
        Assert.Equal(inUnit / admitted, result.MeanTimeInUnitHours, Dense);
    }

    // Exact by hand: as K → ∞ with ρ < 1, M/M/c/K tends to M/M/c; ρ^(K−c) ≈ (2/3)^2000 is far below double precision.
    // The M/M/c values come from ErlangFormulas (Erlang C, checked against its own references: c = 3, a = 2 gives C = 4/9, Lq = 8/9).
    [Theory]
    [InlineData(3, 2.0)]
    [InlineData(10, 8.5)]
    [InlineData(1, 0.9)]
    public void A_very_large_capacity_matches_the_Erlang_C_results(int servers, double offeredLoad)
    {
        var result = FiniteCapacityFormulas.Solve(servers, servers + 2000, offeredLoad, 1.0);
        double waitProbability = ErlangFormulas.WaitProbability(servers, offeredLoad);
        double utilisation = offeredLoad / servers;
        double queue = waitProbability * utilisation / (1.0 - utilisation);

        Assert.Equal(0.0, result.FullProbability, 1e-15);
        Assert.Equal(waitProbability, result.WaitProbability, 1e-9);
        Assert.Equal(queue, result.MeanQueue, 1e-7);
        Assert.Equal(queue + offeredLoad, result.MeanInUnit, 1e-7);
        Assert.Equal(utilisation, result.Utilisation, 1e-9);
    }

    // Common practice: the flow balance of a birth–death chain (carried load a(1 − p_K) equals the busy servers) and
    // Little's law, for 100,000 servers and capacities up to 200,000 at light, critical and heavy load.
    [Theory]
    [InlineData(100_000, 100_000, 0.9999)]
    [InlineData(100_000, 200_000, 0.9999)]
    [InlineData(100_000, 100_500, 1.0)]
    [InlineData(100_000, 150_000, 2.0)]
    [InlineData(1, 100_000, 1.0001)]
    [InlineData(7, 100_000, 1e6)]
    public void Huge_units_give_finite_values_that_balance(int servers, int capacity, double utilisation)
    {
        double offeredLoad = utilisation * servers;

        var result = FiniteCapacityFormulas.Solve(servers, capacity, offeredLoad, 1.0);

        double[] values =
        [
            result.FullProbability, result.AdmittedPerHour, result.BlockedPerHour, result.Utilisation, result.WaitProbability,
            result.MeanQueue, result.MeanInUnit, result.MeanWaitHours, result.MeanTimeInUnitHours,
        ];
        Assert.All(values, value => Assert.True(double.IsFinite(value) && value >= 0.0));
        Assert.InRange(result.FullProbability, 0.0, 1.0);
        Assert.InRange(result.WaitProbability, 0.0, 1.0);
        Assert.InRange(result.Utilisation, 0.0, 1.0);
        Assert.Equal(result.AdmittedPerHour, result.Utilisation * servers, 1e-9 * servers);
        Assert.Equal(offeredLoad, result.AdmittedPerHour + result.BlockedPerHour, 1e-9 * offeredLoad);
        Assert.Equal(result.MeanInUnit - result.MeanQueue, result.Utilisation * servers, 1e-9 * capacity);
    }

    // Exact by hand: with no arrivals the unit is empty; a patient who did arrive would be served at once.
    [Fact]
    public void No_arrivals_give_an_empty_unit_and_the_service_time()
    {
        var result = FiniteCapacityFormulas.Solve(2, 5, 0.0, 4.0);

        Assert.Equal(0.0, result.FullProbability);
        Assert.Equal(0.0, result.MeanInUnit);
        Assert.Equal(0.0, result.MeanWaitHours);
        Assert.Equal(4.0, result.MeanTimeInUnitHours);
    }

    [Theory]
    [InlineData(0, 1, 1.0, 1.0)]
    [InlineData(3, 2, 1.0, 1.0)]
    [InlineData(1, 1, -1.0, 1.0)]
    [InlineData(1, 1, double.NaN, 1.0)]
    [InlineData(1, 1, 1.0, 0.0)]
    [InlineData(1, 1, double.MaxValue, 10.0)]
    public void Misuse_is_refused(int servers, int capacity, double arrivalsPerHour, double meanServiceHours)
    {
        Assert.Throws<ArgumentOutOfRangeException>(() => FiniteCapacityFormulas.Solve(servers, capacity, arrivalsPerHour, meanServiceHours));
    }

    private static double[] SolveGenerator(int servers, int capacity, double birthPerHour, double deathPerServerPerHour)
    {
        int size = capacity + 1;
        var generator = Matrix<double>.Build.Dense(size, size);
        for (int n = 0; n < size; n++)
        {
            if (n < capacity)
            {
                generator[n, n + 1] = birthPerHour;
                generator[n, n] -= birthPerHour;
            }

            if (n > 0)
            {
                double death = Math.Min(n, servers) * deathPerServerPerHour;
                generator[n, n - 1] = death;
                generator[n, n] -= death;
            }
        }

        // πQ = 0 is Qᵀπᵀ = 0; the last equation is replaced by Σπ = 1.
        var system = generator.Transpose();
        var rightSide = Vector<double>.Build.Dense(size);
        for (int k = 0; k < size; k++)
        {
            system[size - 1, k] = 1.0;
        }

        rightSide[size - 1] = 1.0;
        return [.. system.Solve(rightSide)];
    }
}
