using NetSolve.Model;
using NetSolve.Simulation;
using NetSolve.Solving;

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
    /// <summary>
    /// Goal: two-moment mean waits within <see cref="AccuracyStudy.GoalError"/> of the simulated mean for at least 90%
    /// of the units that count (<see cref="AccuracyRow.Counts"/>): met. Measured 119 of 124 (96.0%,
    /// seed 2026) with Cosmetatos' ratio for regular service, the light-heavy traffic interpolation for variable
    /// service on several servers, the M/G/c/K truncation for bed limits with waiting places and the diverted-overflow
    /// model for a unit fed by a full unit's diversions; the misses are light-load units (ρ 0.33-0.46, docs/methods.md).
    /// Measured again after the simulator's draws changed order (2026-12-03: next unit drawn at service start, entry
    /// units by an alias table): 116 of 125 (92.8%), the misses again light-load units (ρ 0.33-0.49) near 15%, where
    /// the simulation's own interval (±3-10%) decides the side. Asserted at 92% (the measured share rounded down), so a
    /// regression of two units fails.
    /// </summary>
    private const double MeasuredShare = 0.92;

    /// <summary>
    /// Goal: closer than the exponential formula wherever a cv differs from 1, i.e. 0 exceptions: NOT MET. Measured 2
    /// of 113 units not closer (generated-6 u3, generated-12 u1): units in loops of routes fed by correlated flows,
    /// where the exponential formula happens to be within 2% by two errors of opposite sign (docs/methods.md). They
    /// stay "not closer" also when judged beyond the simulation's 95% interval (every value in the interval is nearer
    /// the exponential formula than the two-moment one), so no looser rule is applied. Held at today's count so a
    /// regression fails. The variability-function option leaves the same two not closer (formula-only against the
    /// stored waits, <see cref="StoredSimulationAccuracyTests"/>).
    /// </summary>
    private const int MeasuredNotBetter = 2;

    private static readonly SimulationOptions Run = new() { Seed = 2026, Replications = 10, WarmupHours = 2_000, DurationHours = 50_000 };

    // Source: the project's simulator (seed 2026, 10 replications of 50,000 h after 2,000 h) against NetworkSolver;
    // the goal is issue 11's: two-moment waits within 15% of simulation for at least 90% of units, and closer than the
    // exponential formula wherever an arrival or service cv differs from 1. The first is met (116 of 125), the second
    // not quite (112 of 114, the same two units as with the earlier draws' 111 of 113): see MeasuredNotBetter.
    [Fact(Explicit = true)]
    public void Two_moment_waits_meet_the_accuracy_goal_against_the_simulator()
    {
        var rows = AccuracyStudy.Networks()
            .SelectMany(pair => Measure(pair.Name, pair.Network))
            .ToList();
        var (table, counted, within, notBetter) = AccuracyStudy.Summarise(rows);
        File.WriteAllText(Path.Combine(AppContext.BaseDirectory, "accuracy-table.md"), table);
        TestContext.Current.TestOutputHelper?.WriteLine(table);

        Assert.True(within >= MeasuredShare * counted, AccuracyTable.Invariant($"{within} of {counted} units within 15%"));
        Assert.True(notBetter.Count <= MeasuredNotBetter, "not closer than the exponential formula: " + string.Join(", ", notBetter.Select(row => row.Network + "/" + row.UnitId)));
    }

    private static IEnumerable<AccuracyRow> Measure(string name, Network network)
    {
        var simulated = Simulator.Run(network, Run, cancellation: TestContext.Current.CancellationToken);
        return AccuracyStudy.Rows(name, network, ArrivalVariabilityMethod.Decomposition, i => simulated.Units[i].MeanWaitHours);
    }
}
