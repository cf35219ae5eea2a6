using System.Globalization;
using System.Text;
using NetSolve.Model;
using NetSolve.Parsing;
using NetSolve.Simulation;
using NetSolve.Solving;
using NetSolve.Tests.Support;

namespace NetSolve.Tests.Accuracy;

/// <summary>
/// The accuracy study of issue 11: each unit's mean wait from the two-moment formulas and from the exponential formula
/// against a long simulation, on the bundled networks and on generated ones. Minutes of simulation, so it is
/// explicit and under the Long category: run it with
/// <c>dotnet test --project tests/NetSolve.Tests -- --filter-trait "Category=Long" --explicit only</c>.
/// The table it measures is in docs/methods.md, "Measured accuracy against the simulator".
/// </summary>
[Trait("Category", "Long")]
public sealed class FormulaAccuracyTests
{
    /// <summary>The goal: a unit's two-moment mean wait within this relative error of the simulated mean...</summary>
    private const double GoalError = 0.15;

    /// <summary>
    /// ...for at least 90% of the units that count (<see cref="AccuracyRow.Counts"/>): met. Measured 119 of 124 (96.0%,
    /// seed 2026) with Cosmetatos' ratio for regular service, the light-heavy traffic interpolation for variable
    /// service on several servers, the M/G/c/K truncation for bed limits with waiting places and the diverted-overflow
    /// model for a unit fed by a full unit's diversions; the misses are light-load units (ρ 0.33-0.46, docs/methods.md).
    /// Asserted at 95% (the measured 96.0% rounded down: 0.96 × 124 is just above 119), so a regression of two units fails.
    /// </summary>
    private const double MeasuredShare = 0.95;

    /// <summary>
    /// Goal: closer than the exponential formula wherever a cv differs from 1, i.e. 0 exceptions: NOT MET. Measured 2
    /// of 113 units not closer (generated-6 u3, generated-12 u1): units in loops of routes fed by correlated flows,
    /// where the exponential formula happens to be within 2% by two errors of opposite sign (docs/methods.md). They
    /// stay "not closer" also when judged beyond the simulation's 95% interval (every value in the interval is nearer
    /// the exponential formula than the two-moment one), so no looser rule is applied. Held at today's count so a
    /// regression fails.
    /// </summary>
    private const int MeasuredNotBetter = 2;

    /// <summary>Generated networks in the study, seeds 1 to this.</summary>
    private const int GeneratedNetworks = 20;

    private static readonly SimulationOptions Run = new() { Seed = 2026, Replications = 10, WarmupHours = 2_000, DurationHours = 50_000 };

    private static readonly string[] Bundled = ["harbourside", "kestrel-general", "millbrook-clinic", "fenwick-winter-surge", "larkspur-simulation"];

    // Source: the project's simulator (seed 2026, 10 replications of 50,000 h after 2,000 h) against NetworkSolver;
    // the goal is issue 11's: two-moment waits within 15% of simulation for at least 90% of units, and closer than the
    // exponential formula wherever an arrival or service cv differs from 1. The first is met (119 of 124), the second
    // not quite (111 of 113): see MeasuredNotBetter.
    [Fact(Explicit = true)]
    public void Two_moment_waits_meet_the_accuracy_goal_against_the_simulator()
    {
        var networks = Bundled
            .Select(name => (name, AccuracyNetworks.Steady(NetworkReader.ReadFile(TestFiles.Network(name)).Network!)))
            .Concat(Enumerable.Range(1, GeneratedNetworks).Select(seed => ("generated-" + seed.ToString(CultureInfo.InvariantCulture), AccuracyNetworks.Generate(seed))))
            .ToList();
        var rows = networks.SelectMany(pair => Measure(pair.Item1, pair.Item2)).ToList();

        var counted = rows.Where(row => row.Counts).ToList();
        int within = counted.Count(row => Math.Abs(row.TwoMomentError) <= GoalError);
        var differing = counted.Where(row => row.CvDiffers).ToList();
        var notBetter = differing.Where(row => Math.Abs(row.TwoMomentError) >= Math.Abs(row.ExponentialError)).ToList();
        string table = Table(rows, counted.Count, within, differing.Count, notBetter.Count);
        File.WriteAllText(Path.Combine(AppContext.BaseDirectory, "accuracy-table.md"), table);
        TestContext.Current.TestOutputHelper?.WriteLine(table);

        Assert.True(within >= MeasuredShare * counted.Count, Invariant($"{within} of {counted.Count} units within 15%"));
        Assert.True(notBetter.Count <= MeasuredNotBetter, "not closer than the exponential formula: " + string.Join(", ", notBetter.Select(row => row.Network + "/" + row.UnitId)));
    }

    private static IEnumerable<AccuracyRow> Measure(string name, Network network)
    {
        var twoMoment = NetworkSolver.Solve(network);
        var exponential = NetworkSolver.Solve(AccuracyNetworks.Exponential(network));
        var simulated = Simulator.Run(network, Run, cancellation: TestContext.Current.CancellationToken);
        for (int i = 0; i < network.Units.Length; i++)
        {
            var unit = network.Units[i];
            var formula = twoMoment.Units[i];
            if (unit.Servers.IsUnlimited || formula.MeanWaitHours is not double wait || exponential.Units[i].MeanWaitHours is not double exponentialWait)
            {
                continue;
            }

            double meanService = formula.ArrivalsPerHour > 0.0 ? formula.OfferedLoad / formula.ArrivalsPerHour : unit.MeanServiceHours;
            yield return new AccuracyRow(name, unit.Id, formula.ArrivalScv, formula.ServiceScv, unit.Servers.Count, formula.Utilisation,
                meanService, simulated.Units[i].MeanWaitHours, wait, exponentialWait, formula.Method)
            {
                Family = network.Groups.Any(group => group.Services.Any(service => service.UnitId == unit.Id))
                    ? "group mixture"
                    : unit.EffectiveService.Kind.ToString().ToLowerInvariant(),
            };
        }
    }

    private static string Table(List<AccuracyRow> rows, int counted, int within, int differing, int notBetter)
    {
        var text = new StringBuilder();
        text.Append("| network | unit | servers | service | arrival cv | service cv | utilisation | simulated wait (h) | two-moment (h) | error | exponential (h) | error | method |\n");
        text.Append("|---|---|---|---|---|---|---|---|---|---|---|---|---|\n");
        foreach (var row in rows)
        {
            string mark = row.Counts ? "" : " (tiny)";
            text.Append(Invariant($"| {row.Network} | {row.UnitId}{mark} | {row.Servers} | {row.Family} | {Math.Sqrt(row.ArrivalScv):0.00} | {Math.Sqrt(row.ServiceScv):0.00} | {row.Utilisation:0.00} | "))
                .Append(Invariant($"{row.Simulated.Mean:0.0000} ± {row.Simulated.HalfWidth ?? 0.0:0.0000} | {row.TwoMoment:0.0000} | {Percent(row.TwoMomentError)} | "))
                .Append(Invariant($"{row.Exponential:0.0000} | {Percent(row.ExponentialError)} | {row.Method} |\n"));
        }

        text.Append(Invariant($"\n{within} of {counted} units within 15% ({(double)within / counted:0.0%}); {rows.Count - counted} units with a tiny wait left out; "))
            .Append(Invariant($"{differing - notBetter} of {differing} units with a cv different from 1 closer than the exponential formula.\n"));
        return text.ToString();
    }

    private static string Percent(double error) => double.IsFinite(error)
        ? Math.Round(error * 100.0, 1).ToString("+0.0;-0.0;0.0", CultureInfo.InvariantCulture) + "%"
        : "-";

    private static string Invariant(FormattableString text) => text.ToString(CultureInfo.InvariantCulture);
}
