using NetSolve.Presentation;
using static NetSolve.Tests.Support.CliRun;
using static NetSolve.Tests.Support.TestFiles;

namespace NetSolve.Tests.Cli;

/// <summary><c>simulate</c>'s table ends with what it modelled and its own caution, not the formulas' assumptions.</summary>
public sealed class SimulateModelledListTests
{
    [Fact]
    public void The_simulate_table_lists_lognormal_stays_the_profile_and_capacity_then_ends_with_the_simulations_caution_once()
    {
        var (code, output, error) = Run("simulate", Network("larkspur-simulation"), "-r", "2", "--duration", "2d", "--warmup", "0");

        Assert.True(code == 0, error);
        // Exact by hand from networks/larkspur-simulation.yaml (lognormal emergency, hour and weekday profile, capacity 30).
        Assert.Contains("\nModelled:\n  service times: emergency lognormal, mean 2.500 h, cv 0.8;", output, StringComparison.Ordinal);
        Assert.Contains("  arrivals: Poisson, the rate varying by hour of day and day of week", output, StringComparison.Ordinal);
        Assert.Contains("  capacity: emergency 30 places, when full diverted to urgent_care;", output, StringComparison.Ordinal);
        Assert.EndsWith("\n\n" + CautionForSimulation.Text + "\n", output, StringComparison.Ordinal);
        Assert.DoesNotContain(Caution.Text, output, StringComparison.Ordinal);
    }
}
