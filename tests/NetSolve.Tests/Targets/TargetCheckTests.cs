using NetSolve.Model;
using NetSolve.Solving;
using NetSolve.Tests.Analysis;

namespace NetSolve.Tests.Targets;

public sealed class TargetCheckTests
{
    private static UnitResult Imaging(UnitTargets targets)
    {
        // Two scanners, 2 patients an hour, 20 minutes each: a = 2/3, ρ = 1/3.
        var network = SmallNetworks.Build([("imaging", 2, 1.0 / 3.0)], [("imaging", 2.0)]);
        network = network with { Units = [network.Units[0] with { Targets = targets }] };
        return NetworkSolver.Solve(network).Units[0];
    }

    [Fact]
    public void A_mean_wait_target_met_exactly_on_paper_is_met_and_a_tighter_one_is_breached()
    {
        // Exact by hand: Erlang C(2, 2/3) = (a²/2)/(1 − ρ) / (1 + a + (a²/2)/(1 − ρ)) = (1/3)/2 = 1/6;
        // Wq = C / (cμ − λ) = (1/6) / (6 − 2) = 1/24 h = 2.5 min.
        Assert.Empty(Imaging(new UnitTargets(MaxMeanWaitHours: 2.5 / 60.0)).TargetsBreached);
        Assert.Equal([TargetKind.MeanWait], Imaging(new UnitTargets(MaxMeanWaitHours: 2.4 / 60.0)).TargetsBreached);
    }

    [Fact]
    public void A_mean_time_in_unit_target_counts_the_service_too()
    {
        // Exact by hand: W = Wq + 1/μ = 2.5 min + 20 min = 22.5 min.
        Assert.Empty(Imaging(new UnitTargets(MaxMeanTimeInUnitHours: 22.5 / 60.0)).TargetsBreached);
        Assert.Equal([TargetKind.MeanTimeInUnit], Imaging(new UnitTargets(MaxMeanTimeInUnitHours: 22.4 / 60.0)).TargetsBreached);
    }

    [Fact]
    public void A_wait_over_target_uses_the_erlang_c_tail()
    {
        // Exact by hand: P(Wq > t) = C · exp(−(cμ − λ)t) = (1/6) · exp(−4 · 0.25) = 0.0613 at t = 15 min.
        double share = 1.0 / 6.0 * Math.Exp(-1.0);
        var met = Imaging(new UnitTargets(WaitOver: new WaitOverTarget(0.25, share * 1.0001)));
        var breached = Imaging(new UnitTargets(WaitOver: new WaitOverTarget(0.25, share * 0.9999)));

        Assert.Equal(share, TargetCheck.ShareWaitingLonger(met, 0.25)!.Value, 1e-12);
        Assert.Empty(met.TargetsBreached);
        Assert.Equal([TargetKind.WaitOver], breached.TargetsBreached);
    }

    [Fact]
    public void An_unstable_unit_breaches_every_wait_target_it_has()
    {
        // Exact by hand: a = 3 erlangs on 2 servers is unstable, so no mean wait exists.
        var network = SmallNetworks.Build([("ward", 2, 1.0)], [("ward", 3.0)]);
        network = network with { Units = [network.Units[0] with { Targets = new UnitTargets(1.0, 2.0, new WaitOverTarget(1.0, 0.5)) }] };

        Assert.Equal([TargetKind.MeanWait, TargetKind.MeanTimeInUnit, TargetKind.WaitOver], NetworkSolver.Solve(network).Units[0].TargetsBreached);
    }

    [Fact]
    public void A_unit_without_targets_breaches_none_however_long_its_wait()
    {
        var network = SmallNetworks.Build([("ward", 2, 1.0)], [("ward", 1.9)]);

        Assert.Empty(NetworkSolver.Solve(network).Units[0].TargetsBreached);
    }
}
