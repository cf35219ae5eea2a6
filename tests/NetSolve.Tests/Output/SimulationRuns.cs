using NetSolve.Simulation;
using NetSolve.Solving;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Output;

/// <summary>Short seeded simulations of the bundled example with groups, an arrival profile and capacities.</summary>
internal static class SimulationRuns
{
    /// <summary>The larkspur example, two replications of a week after a day's warm-up, P(wait &gt; 1 h), and its formula solution.</summary>
    public static (SimulationResult Simulated, NetworkSolution Formula) Larkspur(int replications = 2)
    {
        var network = TestNetworks.Example("larkspur-simulation.yaml");
        var options = new SimulationOptions { Seed = 5, Replications = replications, WarmupHours = 24, DurationHours = 7 * 24, WaitThresholdsHours = [1.0] };
        return (Simulator.Run(network, options, cancellation: TestContext.Current.CancellationToken), NetworkSolver.Solve(network));
    }
}
