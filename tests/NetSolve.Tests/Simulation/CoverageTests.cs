using System.Globalization;
using System.Text;
using NetSolve.Analysis;
using NetSolve.Simulation;
using NetSolve.Solving;

namespace NetSolve.Tests.Simulation;

/// <summary>
/// How often the simulator's 95% intervals, under the default options (run lengths and replications
/// from the relaxation time), cover the exact steady-state values of single M/M/c units, over 40 seeds: the goal is at least 90%
/// for the mean wait, the mean number in unit and the 95th and 99th percentiles of time in unit.
/// </summary>
/// <remarks>
/// Run with <c>dotnet test -- --filter-trait "Category=Long" --explicit only --filter-class '*CoverageTests*'</c>;
/// the table is written to <c>coverage-table.md</c> beside the test assembly and the results go in docs/simulation.md.
/// </remarks>
[Trait("Category", "Long")]
public sealed class CoverageTests
{
    private const int Seeds = 40;

    private const double Goal = 0.90;

    /// <summary>(label, servers, utilisation, mean service in hours).</summary>
    private static readonly (string Label, int Servers, double Utilisation, double ServiceHours)[] Cases =
    [
        ("M/M/1 at 0.5, 1-hour service", 1, 0.5, 1.0),
        ("M/M/1 at 0.8, 1-hour service", 1, 0.8, 1.0),
        ("M/M/1 at 0.9, 1-hour service", 1, 0.9, 1.0),
        ("M/M/1 at 0.5, 1-day service", 1, 0.5, 24.0),
        ("M/M/1 at 0.8, 1-day service", 1, 0.8, 24.0),
        ("M/M/1 at 0.9, 1-day service", 1, 0.9, 24.0),
        ("M/M/5 at 0.85, 1-hour service", 5, 0.85, 1.0),
        ("30-bed ward (M/M/30) at 0.9, 5-day stays", 30, 0.9, 120.0),
    ];

    [Fact(Explicit = true)]
    public void The_default_intervals_cover_the_exact_values_in_at_least_90_percent_of_seeds()
    {
        var table = new StringBuilder("| case | warm-up (d) | run (d) | replications | mean wait | mean in unit | p95 time in unit | p99 time in unit |\n|---|---|---|---|---|---|---|---|\n");
        var misses = new List<string>();
        var diagnosis = new StringBuilder("\n| case (relative: bias / mean half-width / 1.96 x spread over seeds) | mean wait | mean in unit | p95 | p99 |\n|---|---|---|---|---|\n");
        foreach (var (label, servers, utilisation, serviceHours) in Cases)
        {
            double arrivalsPerHour = utilisation * servers / serviceHours;
            var network = TestNetworks.Single(TestNetworks.Unit("unit", servers, serviceHours), arrivalsPerHour);
            var plan = RunLengthPlanner.Plan(NetworkSolver.Solve(network));
            var exact = ExactMmc.Of(servers, arrivalsPerHour, serviceHours);
            var covered = new int[4];
            var spread = new List<double>[] { [], [], [], [] };
            var halves = new List<double>[] { [], [], [], [] };
            for (int seed = 1; seed <= Seeds; seed++)
            {
                var options = new SimulationOptions { Seed = (ulong)seed, Replications = plan.Replications, WarmupHours = plan.WarmupHours, DurationHours = plan.DurationHours };
                var unit = Simulator.Run(network, options, cancellation: TestContext.Current.CancellationToken).Units[0];
                Estimate?[] estimates = [unit.MeanWaitHours, unit.MeanInUnit, unit.TimeInUnitPercentiles[2].Hours, unit.TimeInUnitPercentiles[3].Hours];
                double[] values = [exact.MeanWaitHours, exact.MeanInUnit, exact.TimeInUnitQuantileHours(0.95), exact.TimeInUnitQuantileHours(0.99)];
                for (int m = 0; m < 4; m++)
                {
                    covered[m] += estimates[m] is Estimate estimate && estimate.Contains(values[m]) ? 1 : 0;
                    if (estimates[m] is Estimate { HalfWidth: double half } found)
                    {
                        spread[m].Add((found.Mean - values[m]) / values[m]);
                        halves[m].Add(half / values[m]);
                    }
                }
            }

            string[] names = ["mean wait", "mean in unit", "p95", "p99"];
            table.Append(CultureInfo.InvariantCulture, $"| {label} | {plan.WarmupHours / 24.0:0} | {plan.DurationHours / 24.0:0} | {plan.Replications} |");
            for (int m = 0; m < 4; m++)
            {
                double share = (double)covered[m] / Seeds;
                table.Append(CultureInfo.InvariantCulture, $" {covered[m]}/{Seeds} ({share:0%}) |");
                if (share < Goal)
                {
                    misses.Add(string.Create(CultureInfo.InvariantCulture, $"{label}: {names[m]} covered in {share:0%} of seeds"));
                }
            }

            table.Append('\n');
            diagnosis.Append(CultureInfo.InvariantCulture, $"| {label} |");
            for (int m = 0; m < 4; m++)
            {
                double bias = spread[m].Average();
                double deviation = Math.Sqrt(spread[m].Sum(e => (e - bias) * (e - bias)) / (spread[m].Count - 1));
                diagnosis.Append(CultureInfo.InvariantCulture, $" {bias:+0.0%;-0.0%;0.0%} / {halves[m].Average():0.0%} / {1.96 * deviation:0.0%} |");
            }

            diagnosis.Append('\n');
        }

        table.Append(diagnosis);
        File.WriteAllText(Path.Combine(AppContext.BaseDirectory, "coverage-table.md"), table.ToString());
        TestContext.Current.TestOutputHelper?.WriteLine(table.ToString());
        Assert.True(misses.Count == 0, string.Join("\n", misses) + "\n\n" + table);
    }
}
