using System.Globalization;
using NetSolve.Analysis;
using NetSolve.Model;
using NetSolve.Parsing;
using NetSolve.Simulation;
using NetSolve.Solving;
using NetSolve.Tests.Core.TimeVarying;

namespace NetSolve.Tests.Roster;

/// <summary>
/// The accuracy goals of the hour-by-hour work measured against the simulator: rosters from the search meet their
/// target in simulation in at least 95% of hours, and the formulas' queue on a large unit near its servers follows the
/// simulated one. Long: many simulated weeks. Results go into docs/time-of-day.md with the commands below.
/// </summary>
public sealed class HourlyStaffingAccuracyTests
{
    private const string Command = "nice -n 10 dotnet test -- --filter-trait \"Category=Long\" --explicit only --filter-class '*HourlyStaffingAccuracyTests*'";

    private static readonly double[] MeanServiceHours = [0.25, 0.5, 1.0, 2.0];

    private static string ResultsFile => Path.Combine(Path.GetTempPath(), "netsolve-hourly-accuracy.txt");

    // Common practice: an hour meets the target in simulation when the simulated mean wait's 95% interval does not
    // lie wholly above it (HourlySimulationCheck); the goal is at least 95% of hours. Also counted: hours whose
    // simulated mean itself is within the target.
    [Fact(Explicit = true)]
    [Trait("Category", "Long")]
    public void Rosters_meet_their_target_in_simulation_in_at_least_95_percent_of_hours()
    {
        var options = HourlyStaffingOptions.Default with { Replications = 10, SimulatedDays = 56, Seed = 11 };
        var cases = new List<(string Name, Network Network, StaffingTargets Targets)>
        {
            ("wrenfield-emergency-roster, 10 min", Example("wrenfield-emergency-roster"), new StaffingTargets(MaxMeanWaitHours: 10.0 / 60.0)),
            ("wrenfield-emergency-roster, 30 min", Example("wrenfield-emergency-roster"), new StaffingTargets(MaxMeanWaitHours: 0.5)),
        };
        var random = new Random(2026);
        var day = TimeVaryingTestNetworks.EmergencyDay();
        for (int i = 0; i < 8; i++)
        {
            int servers = random.Next(2, 31);
            double service = MeanServiceHours[random.Next(MeanServiceHours.Length)];
            double arrivals = 0.85 * servers / service;
            cases.Add((string.Create(CultureInfo.InvariantCulture, $"single unit, load {arrivals * service:F1} erlangs, service {service} h, wait 20% of service"),
                TimeVaryingTestNetworks.SingleUnit(servers, service, arrivals, day), new StaffingTargets(MaxMeanWaitHours: 0.2 * service)));
        }

        int hours = 0, withinInterval = 0, meanWithin = 0;
        var lines = new List<string>();
        foreach (var (name, network, targets) in cases)
        {
            var plan = HourlyStaffingSearch.Find(network, targets, options, out var impossible);
            Assert.Null(impossible);
            foreach (var unit in plan!.Units)
            {
                int unitInterval = unit.SimulationMeetsByHour.Count(meets => meets);
                int unitMean = unit.SimulatedMeanWaitHoursByHour.Count(wait => wait.Mean <= targets.MaxMeanWaitHours!.Value * (1.0 + StaffingSearch.TargetTolerance));
                hours += unit.SimulationMeetsByHour.Length;
                withinInterval += unitInterval;
                meanWithin += unitMean;
                lines.Add(string.Create(CultureInfo.InvariantCulture,
                    $"{name}: {unit.UnitId} ({unit.Method}, {unit.StaffHours} staff-hours, {unit.Evaluations} solves): {unitInterval} of {unit.SimulationMeetsByHour.Length} hours within the interval, {unitMean} with the simulated mean within"));
            }
        }

        lines.Add(string.Create(CultureInfo.InvariantCulture, $"{withinInterval} of {hours} hours meet the target within the interval; {meanWithin} with the simulated mean itself within ({Command})"));
        File.AppendAllLines(ResultsFile, lines);
        Assert.True(withinInterval >= 0.95 * hours, string.Join('\n', lines));
    }

    // Source: the simulator (fixed seed, 6 replications of 12 weeks after 2 weeks). The acute assessment unit of the
    // Larkspur example (64 servers, stays near a day, loaded near its servers in the evening) once showed hundreds
    // waiting by the fluid fallback, then 3–10 times the simulated queue while the emergency department's diversions
    // were left in its load; the exact chain's queue, averaged by hour of day over the week, is compared with the
    // simulated one. Common practice: the goal is the simulated interval or 0.5 patients in most hours (20 of 24).
    [Fact(Explicit = true)]
    [Trait("Category", "Long")]
    public void The_large_assessment_unit_follows_the_simulated_queue_by_hour_of_day()
    {
        var network = Example("larkspur-simulation");
        int j = network.Units.ToList().FindIndex(unit => unit.Id == "assessment");
        var formulas = TimeVaryingSolver.Solve(network).Units[j];
        var simulated = Simulator.Run(network, new SimulationOptions { Seed = 3, Replications = 6, WarmupHours = 14 * 24, DurationHours = 84 * 24 }, cancellation: TestContext.Current.CancellationToken).Units[j];

        var lines = new List<string> { string.Create(CultureInfo.InvariantCulture, $"larkspur assessment ({formulas.Method}): hour, formulas (mean over the week's days), simulated ± half-width") };
        int within = 0;
        for (int h = 0; h < 24; h++)
        {
            double byFormula = Enumerable.Range(0, formulas.MeanQueueByHour.Length / 24).Average(d => formulas.MeanQueueByHour[(d * 24) + h]);
            var sim = simulated.MeanQueueByHour[h]!.Value;
            within += Math.Abs(byFormula - sim.Mean) <= Math.Max(sim.HalfWidth ?? 0.0, 0.5) ? 1 : 0;
            lines.Add(string.Create(CultureInfo.InvariantCulture, $"{h:00}: {byFormula:F2} against {sim.Mean:F2} ± {sim.HalfWidth ?? 0.0:F2}"));
        }

        lines.Add(string.Create(CultureInfo.InvariantCulture, $"{within} of 24 hours within the simulated interval or 0.5 patients ({Command})"));
        File.AppendAllLines(ResultsFile, lines);
        Assert.True(within >= 20, string.Join('\n', lines));
    }

    private static Network Example(string name) => NetworkReader.ReadFile(Support.TestFiles.Network(name)).Network!;
}
