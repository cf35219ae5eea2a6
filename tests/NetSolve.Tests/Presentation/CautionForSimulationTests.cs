using NetSolve.Presentation;
using NetSolve.Tests.Rendering;

namespace NetSolve.Tests.Presentation;

public sealed class CautionForSimulationTests
{
    // Exact by hand from networks/larkspur-simulation.yaml: lognormal emergency and ward stays, an hour-of-day and
    // day-of-week profile, capacity 30 (divert) and 240 (turn away), one patient group with its own ward stay.
    [Fact]
    public void A_simulation_with_lognormal_stays_a_profile_and_capacity_lists_them()
    {
        var modelled = CautionForSimulation.Modelled(RenderingFixtures.Example("larkspur-simulation"));

        Assert.Contains(modelled, line => line.StartsWith("service times: emergency lognormal, mean 2.500 h, cv 0.8;", StringComparison.Ordinal));
        Assert.Contains(modelled, line => line.Contains("ward lognormal, mean 4.500 d, cv 1.1", StringComparison.Ordinal));
        Assert.Contains("arrivals: Poisson, the rate varying by hour of day and day of week by the file's profile", modelled, StringComparer.Ordinal);
        Assert.Contains("capacity: emergency 30 places, when full diverted to urgent_care; ward 240 places, when full turned away", modelled, StringComparer.Ordinal);
        Assert.Contains(modelled, line => line.StartsWith("patient groups: frail_elderly with own routes", StringComparison.Ordinal));
    }

    [Fact]
    public void A_plain_network_says_what_it_does_not_model()
    {
        var modelled = CautionForSimulation.Modelled(RenderingFixtures.Example("kestrel-general"));

        Assert.Contains("arrivals: Poisson at a constant rate", modelled, StringComparer.Ordinal);
        Assert.Contains("capacity: none set, so waiting room is unlimited and nobody is turned away", modelled, StringComparer.Ordinal);
        Assert.DoesNotContain(modelled, line => line.StartsWith("patient groups", StringComparison.Ordinal));
    }

    [Fact]
    public void The_simulations_caution_does_not_claim_the_formulas_steady_state_assumptions()
    {
        Assert.DoesNotContain("steady state", CautionForSimulation.Text, StringComparison.OrdinalIgnoreCase);
        Assert.DoesNotContain("exponential", CautionForSimulation.Text, StringComparison.OrdinalIgnoreCase);
        Assert.Contains("safe-staffing", CautionForSimulation.Text, StringComparison.Ordinal);
    }
}
