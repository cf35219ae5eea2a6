using NetSolve.Parsing;
using NetSolve.Simulation;
using NetSolve.Solving;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Accuracy;

/// <summary>Issue 11's measured case: Harbourside imaging (3 servers, service cv 0.6), two-moment formula against the simulator.</summary>
public sealed class HarboursideImagingTests
{
    /// <summary>Relative: the two-moment mean wait must lie this close to the short simulation (the accuracy goal, 15%).</summary>
    private const double Tolerance = 0.15;

    private static readonly SimulationOptions ShortRun = new() { Seed = 11, Replications = 4, WarmupHours = 100, DurationHours = 2_000 };

    // Source: the project's simulator (seed 11, 4 replications of 2,000 h); issue 11 measured 0.160 ± 0.005 h with a long
    // run, the exponential formula 0.217 h (36% high) and a two-moment approximation about 0.147 h.
    [Fact]
    public void Two_moment_wait_of_imaging_is_closer_to_the_simulation_than_the_exponential_formula()
    {
        var network = NetworkReader.ReadFile(TestFiles.Network("harbourside")).Network!;
        int imaging = network.BuildIndex()["imaging"];

        double twoMoment = NetworkSolver.Solve(network).Units[imaging].MeanWaitHours!.Value;
        double exponential = NetworkSolver.Solve(AccuracyNetworks.Exponential(network)).Units[imaging].MeanWaitHours!.Value;
        double simulated = Simulator.Run(network, ShortRun, cancellation: TestContext.Current.CancellationToken).Units[imaging].MeanWaitHours.Mean;

        string values = FormattableString.Invariant($"simulated {simulated:G4} h, two-moment {twoMoment:G4} h, exponential {exponential:G4} h");
        Assert.True(Math.Abs(twoMoment - simulated) <= Tolerance * simulated, values);
        Assert.True(Math.Abs(twoMoment - simulated) < Math.Abs(exponential - simulated), values);
        // Source: issue 11, the exponential (Erlang C) formula before the solver followed variability: 0.217 h.
        Assert.Equal(0.217, exponential, 0.0005);
    }
}
