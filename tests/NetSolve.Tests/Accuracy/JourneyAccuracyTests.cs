using System.Globalization;
using System.Text;
using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Simulation;
using NetSolve.Solving;

namespace NetSolve.Tests.Accuracy;

/// <summary>
/// The accuracy of the journey formula (<see cref="JourneyFormula"/>) against the simulator's exact per-patient
/// journey times, on the bundled networks and on generated ones. Minutes of simulation, so explicit and in the Long
/// category: <c>dotnet test -- --filter-trait "Category=Long" --filter-class '*JourneyAccuracyTests' --explicit only</c>.
/// The table it measures is in docs/methods.md, "Journeys".
/// </summary>
[Trait("Category", "Long")]
public sealed class JourneyAccuracyTests
{
    /// <summary>The share of journeys whose formula mean must be within 10% of the simulated mean: measured 25 of 25 (docs/methods.md, "Journeys").</summary>
    private const double MeanWithinTenPercent = 1.0;

    private static readonly SimulationOptions Run = new() { Seed = 2026, Replications = 10, WarmupHours = 2_000, DurationHours = 20_000 };

    // Source: the project's simulator (seed 2026, 10 replications of 20,000 h after 2,000 h), which measures each
    // patient's journey exactly, against the phase-type formula.
    [Fact(Explicit = true)]
    public void The_journey_formula_is_close_to_the_simulated_journey_times()
    {
        var networks = AccuracyStudy.Networks()
            .Select(pair => (pair.Name, Network: WithJourney(pair.Network)))
            .Where(pair => pair.Network is not null)
            .ToList();
        var rows = new List<string>();
        int counted = 0;
        int within = 0;
        foreach (var (name, network) in networks)
        {
            var formula = JourneyFormula.Estimate(NetworkSolver.Solve(network!)).Where(row => row.Group is null && row.MeanHours is not null).ToList();
            var simulated = Simulator.Run(network!, Run, cancellation: TestContext.Current.CancellationToken).Journeys.Where(row => row.Group is null).ToList();
            foreach (var f in formula)
            {
                var s = simulated.Single(row => row.Journey.Id == f.Journey.Id);
                double meanError = (f.MeanHours!.Value / s.MeanHours!.Value.Mean) - 1.0;
                double p90Error = (f.Percentiles[1].Hours / s.Percentiles[1].Hours!.Value.Mean) - 1.0;
                counted++;
                within += Math.Abs(meanError) <= 0.10 ? 1 : 0;
                rows.Add(AccuracyTable.Invariant($"| {name} | {string.Join(", ", f.Journey.UnitIds)} | {s.MeanHours.Value.Mean:0.###} | {Percent(meanError)} | {s.Percentiles[1].Hours!.Value.Mean:0.###} | {Percent(p90Error)} | {Over(f, s)} |"));
            }
        }

        var table = new StringBuilder()
            .Append("| network | journey units | simulated mean (h) | formula error | simulated p90 (h) | formula error | P(time > t): formula / simulated ± 95% |\n")
            .Append("|---|---|---|---|---|---|---|\n")
            .AppendJoin('\n', rows)
            .Append(AccuracyTable.Invariant($"\n\n{within} of {counted} journeys have the formula mean within 10% of the simulated mean.\n"))
            .ToString();
        File.WriteAllText(Path.Combine(AppContext.BaseDirectory, "journey-accuracy-table.md"), table);
        TestContext.Current.TestOutputHelper?.WriteLine(table);

        Assert.True(within >= MeanWithinTenPercent * counted, AccuracyTable.Invariant($"{within} of {counted} journey means within 10%"));
    }

    /// <summary>
    /// The network's own journeys, or else a journey over the unit with the most external arrivals and the units it
    /// sends patients to that send some back (an emergency department with its tests), or its next unit, with t at
    /// twice the formula mean so that P(time &gt; t) is a visible share.
    /// </summary>
    private static Network? WithJourney(Network network)
    {
        if (!network.Journeys.IsDefaultOrEmpty)
        {
            return network;
        }

        string first = network.Arrivals.MaxBy(arrival => arrival.PerHour)!.UnitId;
        var next = network.Routes.Where(route => route.From == first && route.To != first).Select(route => route.To).ToList();
        var back = next.Where(to => network.Routes.Any(route => route.From == to && route.To == first)).ToList();
        var units = back.Count > 0 ? back : next.Take(1).ToList();
        var draft = network with { Journeys = [new Journey("stay", "stay", [first, .. units], [])] };
        var estimate = JourneyFormula.Estimate(NetworkSolver.Solve(draft))[0];
        return estimate.MeanHours is double mean
            ? network with { Journeys = [new Journey("stay", "stay", [first, .. units], [Math.Round(2.0 * mean, 2)])] }
            : null;
    }

    private static string Over(JourneyEstimate formula, SimulatedJourney simulated) => string.Join("; ", formula.Over.Select((over, t) =>
        AccuracyTable.Invariant($"t = {over.Hours:0.##} h: {over.Probability:0.000} / {simulated.Over[t].Probability.Mean:0.000} ± {simulated.Over[t].Probability.HalfWidth ?? 0.0:0.000}")));

    private static string Percent(double error) => error.ToString("+0.0%;-0.0%;0.0%", CultureInfo.InvariantCulture);
}
