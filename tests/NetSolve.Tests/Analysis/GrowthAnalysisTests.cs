using NetSolve.Analysis;
using NetSolve.Solving;

namespace NetSolve.Tests.Analysis;

public sealed class GrowthAnalysisTests
{
    private const double Tolerance = 1e-12;

    [Fact]
    public void Saturation_factors_equal_each_units_headroom_in_headroom_order()
    {
        // Source: docs/model.md — growing every arrival by g scales every flow by g, so unit i saturates at g = c_i/a_i.
        var solution = NetworkSolver.Solve(SmallNetworks.Example("harbourside.yaml"));
        var growth = GrowthAnalysis.Run(solution);
        var expected = solution.Units.Where(u => u.Headroom is not null).OrderBy(u => u.Headroom).ToList();
        Assert.Equal(expected.Select(u => u.Unit.Id), growth.Saturation.Select(p => p.UnitId), StringComparer.Ordinal);
        foreach (var point in growth.Saturation)
        {
            var unit = solution.Units.Single(u => u.Unit.Id == point.UnitId);
            Assert.Equal(unit.Headroom!.Value, point.SaturationFactor, Tolerance);
            // Utilisation is linear in g: ρ(g) = g·ρ, so it reaches the threshold at g = threshold / ρ = threshold · headroom.
            Assert.Equal(Defaults.StrainThreshold * unit.Headroom.Value, point.StrainFactor, Tolerance);
        }

        // The contract's example: the ward is the bottleneck with headroom 1.142.
        Assert.Equal("ward", growth.FirstUnstable!.UnitId);
        Assert.Equal(1.142, growth.FirstUnstable.SaturationFactor, 0.001);
    }

    [Fact]
    public void Each_step_equals_solving_the_network_with_every_arrival_scaled()
    {
        // Source: linearity of the traffic equations; the check re-solves from scratch at each factor.
        var network = SmallNetworks.Example("kestrel-general.yaml");
        var growth = GrowthAnalysis.Run(NetworkSolver.Solve(network), [1.0, 1.05, 1.1, 1.2]);
        foreach (var step in growth.Steps)
        {
            var scaled = network with { Arrivals = [.. network.Arrivals.Select(a => a with { PerHour = a.PerHour * step.Factor })] };
            AssertSameMetrics(NetworkSolver.Solve(scaled), step.Solution);
        }
    }

    [Fact]
    public void Growing_one_stream_equals_solving_with_that_stream_scaled()
    {
        // Source: linearity: λ(f) = λ_rest + f·λ_stream; the check re-solves the edited network from scratch.
        var network = SmallNetworks.Example("harbourside.yaml");
        var growth = GrowthAnalysis.RunStream(NetworkSolver.Solve(network), "ward", [1.0, 1.3, 1.6]);
        foreach (var step in growth.Steps)
        {
            var scaled = network with { Arrivals = [.. network.Arrivals.Select(a => a.UnitId == "ward" ? a with { PerHour = a.PerHour * step.Factor } : a)] };
            AssertSameMetrics(NetworkSolver.Solve(scaled), step.Solution);
        }
    }

    [Fact]
    public void A_stream_saturation_factor_puts_that_unit_at_utilisation_one()
    {
        // Exact by hand: ward capacity is 300 beds / 72 h = 4.1667 patients/h. Its flow from emergency is
        // 0.12·λ_E + 0.10·λ_I with λ_E = 11.5/0.615 and λ_I = 0.35·λ_E, i.e. 0.155·11.5/0.615 = 2.8984/h,
        // plus the direct stream 18/d = 0.75/h grown by f: f = (4.1667 − 2.8984) / 0.75 = 1.6911.
        var network = SmallNetworks.Example("harbourside.yaml");
        var growth = GrowthAnalysis.RunStream(NetworkSolver.Solve(network), "ward", []);
        var ward = growth.Saturation.Single(p => p.UnitId == "ward");
        double fromEmergency = 0.155 * 11.5 / 0.615;
        Assert.Equal(((300.0 / 72.0) - fromEmergency) / 0.75, ward.SaturationFactor, 1e-9);
        Assert.Single(growth.Saturation); // no other finite unit is fed by direct ward admissions (the lounge is unlimited)
    }

    [Fact]
    public void Default_table_runs_twenty_steps_from_today_to_98_percent_at_the_first_unit()
    {
        // Exact by hand: one unit, c = 2, S = 1 h, λ = 1/h: ρ = 0.5, saturates at g = 2; ρ(g) = g/2 = 0.98 at g = 1.96.
        var network = SmallNetworks.Build([("clinic", 2, 1.0)], [("clinic", 1.0)]);
        var growth = GrowthAnalysis.Run(NetworkSolver.Solve(network));
        Assert.Equal(GrowthAnalysis.DefaultSteps, growth.Steps.Length);
        Assert.Equal(1.0, growth.Steps[0].Factor, Tolerance);
        Assert.Equal(1.96, growth.Steps[^1].Factor, Tolerance);
        Assert.Equal(0.98, growth.Steps[^1].Solution.Units[0].Utilisation, Tolerance);
        Assert.Equal(1.7, growth.FirstStrained!.StrainFactor, Tolerance); // 0.85 / 0.5
    }

    [Fact]
    public void An_already_unstable_network_gets_only_todays_row_and_a_factor_below_one()
    {
        // Exact by hand: c = 1, S = 1 h, λ = 1.25/h: ρ = 1.25, saturates at g = 1/1.25 = 0.8.
        var network = SmallNetworks.Build([("ward", 1, 1.0)], [("ward", 1.25)]);
        var growth = GrowthAnalysis.Run(NetworkSolver.Solve(network));
        Assert.Equal([1.0], growth.Steps.Select(s => s.Factor));
        Assert.Equal(0.8, growth.FirstUnstable!.SaturationFactor, Tolerance);
    }

    [Fact]
    public void Nothing_saturates_when_every_unit_has_unlimited_servers()
    {
        var network = SmallNetworks.Build([("lounge", 0, 2.0)], [("lounge", 3.0)]);
        var growth = GrowthAnalysis.Run(NetworkSolver.Solve(network));
        Assert.Empty(growth.Saturation);
        Assert.Null(growth.FirstUnstable);
        Assert.Equal(GrowthAnalysis.NoSaturationLastFactor, growth.Steps[^1].Factor, Tolerance);
    }

    internal static void AssertSameMetrics(NetworkSolution expected, NetworkSolution actual)
    {
        Assert.Equal(expected.Units.Length, actual.Units.Length);
        for (int i = 0; i < expected.Units.Length; i++)
        {
            var e = expected.Units[i];
            var a = actual.Units[i];
            Assert.Equal(e.Unit.Id, a.Unit.Id);
            Assert.Equal(e.ArrivalsPerHour, a.ArrivalsPerHour, 1e-9 * Math.Max(1.0, e.ArrivalsPerHour));
            Assert.Equal(e.Utilisation, a.Utilisation, 1e-9);
            Assert.Equal(e.Status, a.Status);
            Assert.Equal(e.MeanWaitHours is null, a.MeanWaitHours is null);
            if (e.MeanWaitHours is double wait)
            {
                Assert.Equal(wait, a.MeanWaitHours!.Value, 1e-9 * Math.Max(1.0, wait));
            }
        }

        Assert.Equal(expected.Totals.ExternalArrivalsPerHour, actual.Totals.ExternalArrivalsPerHour, 1e-12);
        Assert.Equal(expected.Totals.MeanTimeInSystemHours is null, actual.Totals.MeanTimeInSystemHours is null);
        if (expected.Totals.MeanTimeInSystemHours is double time)
        {
            Assert.Equal(time, actual.Totals.MeanTimeInSystemHours!.Value, 1e-9 * time);
        }
    }
}
